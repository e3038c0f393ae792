import type { RunResult } from '../../../../shared/schemas/run.ts';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import { DEFAULT_FIT_MAX_SPEED } from '../../../../shared/sim/damper-equivalent.ts';
import { formatQuantityText } from '../../../lib/format.ts';
import { listText } from '../../../lib/units/unit-table.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { STROKE_WARNING_SHARE } from '../model/warnings.ts';
import { rideJudgement } from '../../../../shared/sim/metrics/rms-method.ts';
import { ComfortScale } from './comfort-scale.tsx';
import { FigureList, FigurePanel, type FigureItem } from './figure-list.tsx';
import { ModalTable } from './modal-table.tsx';
import { StaticsPanel } from './statics-panel.tsx';
import { StrokeGauge } from './stroke-gauge.tsx';

/** The figures of one run, grouped as the team judges a setup: comfort, grip, package, damper, modes. */
export function FigurePanels({ result, setup, roadName }: { result: RunResult; setup: Setup; roadName: string }) {
  const { damperVelocity: vu, length } = useUnits();
  const m = result.metrics;
  const bands = m.damperVelocityBands;
  const analysed = `over ${formatQuantityText(m.analysedTime, 's')} after ${formatQuantityText(result.settleTime, 's')} settling`;
  const judged = rideJudgement(result.road.kind, m);
  const settle = m.settling;
  const rmsItems: FigureItem[] = [
    { name: 'aw', label: 'Wk-weighted RMS, aw', value: m.bodyAccelWkRms, unit: 'mps2', note: judged.lead === 'event' ? 'over the whole run: falls as the run gets longer' : 'ISO 2631-1 vertical weighting' },
    { name: 'accelRms', label: 'Body accel. RMS', value: m.bodyAccelRms, unit: 'mps2' },
  ];
  const eventItems: FigureItem[] = [
    { name: 'accelPeak', label: 'Body accel. peak', value: m.bodyAccelPeak, unit: 'mps2', note: 'unweighted' },
    { name: 'wkPeak', label: 'Weighted accel. peak', value: m.bodyAccelWkPeak, unit: 'mps2', note: 'Wk-weighted' },
    { name: 'vdv', label: 'VDV', value: m.vdv, unit: 'mps175', note: 'vibration dose value, Wk-weighted' },
    { name: 'mtvv', label: 'MTVV', value: m.mtvv, unit: 'mps2', note: 'largest 1 s running RMS, Wk-weighted (ISO 2631-1 §6.3.1)' },
  ];
  const settleItem: FigureItem[] = settle
    ? [
        {
          name: 'settle',
          label: 'Settling time',
          value: settle.time ?? undefined,
          unit: 's',
          warn: settle.time === null,
          note: settle.time === null ? 'still outside the band when the run ended' : `from the end of the event until |body accel.| stays within ±${formatQuantityText(settle.band, 'mps2')} (5 % of the peak, at least 0.05 m/s²)`,
        },
      ]
    : [];
  const crestItems: FigureItem[] = [
    { name: 'wkCrest', label: 'Crest factor, weighted', value: m.bodyAccelWkCrest, note: 'weighted peak / aw; above 9 the RMS method is not sufficient', warn: judged.crestAboveLimit },
    { name: 'crest', label: 'Crest factor, unweighted', value: m.bodyAccelCrest, note: 'peak / RMS' },
  ];
  const comfortItems = judged.lead === 'event' ? [...eventItems, ...settleItem, ...crestItems, ...rmsItems] : [rmsItems[0], eventItems[2], eventItems[3], rmsItems[1], eventItems[0], ...crestItems];
  return (
    <div className="grid gap-3 md:grid-cols-2" data-testid="figure-panels">
      <FigurePanel title="Comfort" hue="comfort">
        <FigureList items={comfortItems} />
        {judged.verdict ? (
          <ComfortScale aw={m.bodyAccelWkRms} grading={judged.verdict} />
        ) : (
          <p className="mt-2 rounded-sm border-l-2 border-signal bg-signal-wash/50 px-2 py-1.5 text-xs leading-snug text-ink" data-testid="rms-verdict-withheld" role="note">
            {judged.why}
          </p>
        )}
      </FigurePanel>

      <FigurePanel title="Grip" hue="grip">
        <FigureList
          items={[
            { name: 'loadRatio', label: 'Tyre load variation', value: m.tyreLoadRatio, unit: 'percent', note: 'RMS of Fz − Fz0, over Fz0' },
            { name: 'loadRms', label: 'Dynamic load RMS', value: m.tyreLoadRms, unit: 'N' },
            { name: 'loadMin', label: 'Minimum tyre load', value: m.tyreLoadMin, unit: 'N', warn: m.tyreLoadMin <= 0 },
            { name: 'liftOff', label: 'Time off the road', value: m.liftOffFraction, unit: 'percent', warn: m.liftOffFraction > 0, note: 'lift-off share' },
            { name: 'loadStatic', label: 'Static load Fz0', value: m.tyreLoadStatic, unit: 'N' },
          ]}
        />
      </FigurePanel>

      <FigurePanel title="Package">
        <FigureList
          items={[
            { name: 'travelRms', label: 'Travel RMS', value: m.travelRms, unit: length },
            { name: 'travelComp', label: 'Deepest compression', value: m.travelMaxCompression, unit: length },
            { name: 'travelExt', label: 'Deepest extension', value: m.travelMaxExtension, unit: length },
            { name: 'strokeComp', label: 'Compression stroke used', value: m.strokeUsedCompression, unit: 'percent', warn: (m.strokeUsedCompression ?? 0) > STROKE_WARNING_SHARE },
            { name: 'strokeExt', label: 'Extension stroke used', value: m.strokeUsedExtension, unit: 'percent', warn: (m.strokeUsedExtension ?? 0) > STROKE_WARNING_SHARE },
            { name: 'bumpTime', label: 'On the bump stop', value: m.bumpStopTime, unit: 's', warn: m.bumpStopTime > 0 },
            { name: 'reboundTime', label: 'On the rebound stop', value: m.reboundStopTime, unit: 's', warn: m.reboundStopTime > 0 },
          ]}
        />
        <StrokeGauge metrics={m} setup={setup} />
      </FigurePanel>

      <FigurePanel title="Damper">
        <FigureList
          items={[
            { name: 'velRms', label: 'Piston velocity RMS', value: m.damperVelocityRms, unit: vu },
            { name: 'bandLow', label: `Low speed, below ${formatQuantityText(bands.lowEdge, vu)}`, value: bands.low, unit: 'percent' },
            { name: 'bandMid', label: 'Mid speed', value: bands.mid, unit: 'percent' },
            { name: 'bandHigh', label: `High speed, above ${formatQuantityText(bands.highEdge, vu)}`, value: bands.high, unit: 'percent' },
            { name: 'compShare', label: 'Moving in compression', value: bands.compression, unit: 'percent' },
            { name: 'power', label: 'Mean power dissipated', value: m.damperPowerMean, unit: 'W' },
            { name: 'energy', label: 'Energy dissipated', value: m.damperEnergy, unit: 'J' },
            { name: 'eqRoad', label: 'Equivalent damping on this road (ΣF·v / Σv²)', value: m.damperEquivalentOnRoad, unit: 'Nspm' },
            { name: 'eqFit', label: `Equivalent damping the modes use (least squares, 0–${listText([DEFAULT_FIT_MAX_SPEED], vu)})`, value: result.modal.equivalentDamping.wheelDamping / setup.motionRatio ** 2, unit: 'Nspm' },
            { name: 'travelMean', label: 'Mean travel (shift from static, + compression)', value: m.travelMean, unit: length },
          ]}
        />
        <p className="mt-1.5 text-2xs leading-snug text-ink-faint">
          Band shares are of time, on |piston velocity|. Equivalent damping at the damper: the first depends on this road and speed, the second is the road-free fit the modes and linear figures use. Figures {analysed}.
        </p>
      </FigurePanel>

      <FigurePanel title="Modes of the linearised corner">
        <ModalTable modal={result.modal} />
      </FigurePanel>
      <StaticsPanel result={result} roadName={roadName} />
    </div>
  );
}
