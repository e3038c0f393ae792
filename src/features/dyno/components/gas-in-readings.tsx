import type { DynoFileItem } from '../../../../shared/schemas/dyno-file.ts';
import { formatSig } from '../../../lib/format.ts';

/** What the file's header says about gas force, in words, with the line it says it on. */
export function headerWords(declaration: DynoFileItem['summary']['gasDeclaration']): string {
  if (!declaration) return 'the file’s header does not say whether the readings include it';
  return `the file’s header says the readings ${declaration.says === 'included' ? 'include it' : 'have it removed'} (line ${declaration.line}: “${declaration.text}”)`;
}

/**
 * The gas force choice a kept file was read with, shown beside its fit: how much was taken out
 * and what the file itself declares. A header that says "included" with nothing taken out is
 * flagged, since every fitted force then carries the gas offset.
 */
export function GasInReadings({ file }: { file: Pick<DynoFileItem, 'options' | 'summary'> }) {
  const taken = file.options.gasForce;
  const declaration = file.summary.gasDeclaration;
  const offset = declaration?.says === 'included' && taken === 0;
  return (
    <p
      data-testid="gas-in-readings"
      className={`rounded border px-3 py-1.5 text-sm ${offset ? 'border-signal/60 bg-signal-wash text-ink' : 'border-rule bg-paper-raised text-ink-soft'}`}
    >
      <strong className="font-semibold text-ink">
        Gas force taken out of the readings: <span className="figures">{formatSig(taken, 3)}</span> N
      </strong>
      {' — '}
      {headerWords(declaration)}.
      {offset && ' Nothing was taken out, so the fitted forces include the gas force; upload the file again with the gas force to remove it.'}
    </p>
  );
}
