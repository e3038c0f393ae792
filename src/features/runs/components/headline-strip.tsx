import type { RunResult } from '../../../../shared/schemas/run.ts';
import { Figure } from '../../../components/ui/figure.tsx';
import type { UnitRef } from '../../../lib/format.ts';
import { STROKE_WARNING_SHARE } from '../model/warnings.ts';

interface Cell {
  name: string;
  title: string;
  value: number | undefined;
  unit?: UnitRef;
  hue?: 'comfort' | 'grip';
  sub?: string;
  warn?: boolean;
}

/** The five figures read first, large: comfort, grip, stroke, body mode. */
export function HeadlineStrip({ result }: { result: RunResult }) {
  const m = result.metrics;
  const stroke = m.strokeUsedCompression === undefined ? undefined : Math.max(m.strokeUsedCompression, m.strokeUsedExtension ?? 0);
  const cells: Cell[] = [
    { name: 'aw', title: 'Wk-weighted RMS', value: m.bodyAccelWkRms, unit: 'mps2', hue: 'comfort', sub: m.comfort.bands.join(' / ') },
    { name: 'loadRatio', title: 'Tyre load variation', value: m.tyreLoadRatio, unit: 'percent', hue: 'grip', sub: 'RMS over static load' },
    { name: 'liftOff', title: 'Time off the road', value: m.liftOffFraction, unit: 'percent', hue: 'grip', sub: m.liftOffFraction > 0 ? 'the wheel lifted' : 'always in contact', warn: m.liftOffFraction > 0 },
    { name: 'stroke', title: 'Stroke used, worst side', value: stroke, unit: 'percent', sub: stroke === undefined ? 'no stroke in the setup' : m.bumpStopTime + m.reboundStopTime > 0 ? 'touched a stop' : 'clear of the stops', warn: (stroke ?? 0) > STROKE_WARNING_SHARE || m.bumpStopTime + m.reboundStopTime > 0 },
    { name: 'bodyHz', title: 'Body mode', value: result.modal.body.naturalHz, unit: 'Hz', sub: `damping ratio ${result.modal.body.dampingRatio.toFixed(2)}` },
  ];
  return (
    <div className="mb-3 grid grid-cols-2 divide-rule rounded border border-rule bg-paper-raised sm:grid-cols-3 lg:grid-cols-5 lg:divide-x" aria-label="Headline figures" role="group">
      {cells.map((c) => (
        <div key={c.name} className="px-3 py-2" data-headline={c.name}>
          <p className={`text-xs font-medium ${c.hue === 'comfort' ? 'text-comfort' : c.hue === 'grip' ? 'text-grip' : 'text-ink-soft'}`}>{c.title}</p>
          <p className={`mt-0.5 text-xl leading-tight ${c.warn ? '[&_*]:!text-signal-ink' : ''}`}>
            {c.value === undefined ? <span className="text-ink-faint">—</span> : <Figure value={c.value} unit={c.unit} label={c.title} />}
          </p>
          {c.sub && <p className={`truncate text-2xs ${c.warn ? 'text-signal-ink' : 'text-ink-faint'}`}>{c.sub}</p>}
        </div>
      ))}
    </div>
  );
}
