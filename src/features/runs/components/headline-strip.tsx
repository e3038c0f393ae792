import type { RunResult } from '../../../../shared/schemas/run.ts';
import { Figure } from '../../../components/ui/figure.tsx';
import { formatQuantityText, type UnitRef } from '../../../lib/format.ts';
import { rideJudgement } from '../../../../shared/sim/metrics/rms-method.ts';
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

/**
 * The figures read first, large. A random or measured road leads with the weighted RMS and its
 * comfort reaction (or why there is none); a single event leads with peak, VDV, MTVV and settling.
 */
export function HeadlineStrip({ result }: { result: RunResult }) {
  const m = result.metrics;
  const judged = rideJudgement(result.road.kind, m);
  const stroke = m.strokeUsedCompression === undefined ? undefined : Math.max(m.strokeUsedCompression, m.strokeUsedExtension ?? 0);
  const strokeCell: Cell = { name: 'stroke', title: 'Stroke used, worst side', value: stroke, unit: 'percent', sub: stroke === undefined ? 'no stroke in the setup' : m.bumpStopTime + m.reboundStopTime > 0 ? 'touched a stop' : 'clear of the stops', warn: (stroke ?? 0) > STROKE_WARNING_SHARE || m.bumpStopTime + m.reboundStopTime > 0 };
  if (judged.lead === 'event') {
    const settle = m.settling;
    const eventCells: Cell[] = [
      { name: 'accelPeak', title: 'Peak body acceleration', value: m.bodyAccelPeak, unit: 'mps2', hue: 'comfort', sub: m.bodyAccelWkPeak === undefined ? 'unweighted' : `weighted ${formatQuantityText(m.bodyAccelWkPeak, 'mps2')}` },
      { name: 'vdv', title: 'VDV', value: m.vdv, unit: 'mps175', hue: 'comfort', sub: 'dose, Wk-weighted' },
      { name: 'mtvv', title: 'MTVV', value: m.mtvv, unit: 'mps2', hue: 'comfort', sub: 'largest 1 s RMS' },
      { name: 'settle', title: 'Settling time', value: settle?.time ?? undefined, unit: 's', sub: !settle ? 'not worked out for this run' : settle.time === null ? 'still moving when the run ended' : `to within ±${formatQuantityText(settle.band, 'mps2')}`, warn: settle?.time === null },
      { name: 'liftOff', title: 'Time off the road', value: m.liftOffFraction, unit: 'percent', hue: 'grip', sub: m.liftOffFraction > 0 ? 'the wheel lifted' : 'always in contact', warn: m.liftOffFraction > 0 },
      strokeCell,
    ];
    return <Strip cells={eventCells} label="Headline figures, single event" />;
  }
  const awSub = judged.verdict ? judged.verdict.bands.join(' / ') : `no RMS verdict: crest factor ${judged.crest.toFixed(1)} > 9`;
  const cells: Cell[] = [
    { name: 'aw', title: 'Wk-weighted RMS', value: m.bodyAccelWkRms, unit: 'mps2', hue: 'comfort', sub: awSub, warn: judged.verdict === null },
    { name: 'loadRatio', title: 'Tyre load variation', value: m.tyreLoadRatio, unit: 'percent', hue: 'grip', sub: 'RMS over static load' },
    { name: 'liftOff', title: 'Time off the road', value: m.liftOffFraction, unit: 'percent', hue: 'grip', sub: m.liftOffFraction > 0 ? 'the wheel lifted' : 'always in contact', warn: m.liftOffFraction > 0 },
    strokeCell,
    { name: 'bodyHz', title: 'Body mode', value: result.modal.body.naturalHz, unit: 'Hz', sub: `damping ratio ${result.modal.body.dampingRatio.toFixed(2)}` },
  ];
  return <Strip cells={cells} label="Headline figures" />;
}

function Strip({ cells, label }: { cells: Cell[]; label: string }) {
  const columns = cells.length === 6 ? 'lg:grid-cols-6' : 'lg:grid-cols-5';
  return (
    <div className={`mb-3 grid grid-cols-2 divide-rule rounded border border-rule bg-paper-raised sm:grid-cols-3 ${columns} lg:divide-x`} aria-label={label} role="group">
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
