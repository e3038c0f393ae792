import type { PointVerdict } from '../../../../shared/schemas/target-sheet.ts';

const detail: Record<PointVerdict, string> = {
  within: 'within band',
  below: 'below band',
  above: 'above band',
  'not-measured': 'speed not measured',
};

/**
 * Pass or fail, said in words with a mark, and coloured: the colour is never the only cue
 * (colour-blind readers, black-and-white print).
 */
export function VerdictMark({ pass, verdict, compact = false }: { pass: boolean; verdict?: PointVerdict; compact?: boolean }) {
  return (
    <span className={`inline-flex items-baseline gap-1 font-semibold whitespace-nowrap ${pass ? 'text-ok' : 'text-danger'}`}>
      <span aria-hidden="true">{pass ? '✓' : '✗'}</span>
      <span>{pass ? 'Pass' : 'Fail'}</span>
      {verdict && !compact && !pass && <span className="font-normal text-ink-soft">({detail[verdict]})</span>}
    </span>
  );
}
