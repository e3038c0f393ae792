import type { RunResult } from '../../../../shared/schemas/run.ts';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import { formatQuantityText } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { STROKE_WARNING_SHARE } from '../model/warnings.ts';
import { ComfortScale } from './comfort-scale.tsx';
import { FigureList, FigurePanel } from './figure-list.tsx';
import { ModalTable } from './modal-table.tsx';
import { StaticsPanel } from './statics-panel.tsx';
import { StrokeGauge } from './stroke-gauge.tsx';

/** The figures of one run, grouped as the team judges a setup: comfort, grip, package, damper, modes. */
export function FigurePanels({ result, setup, roadName }: { result: RunResult; setup: Setup; roadName: string }) {
  const { damperVelocity: vu, length } = useUnits();
  const m = result.metrics;
  const bands = m.damperVelocityBands;
  const analysed = `over ${formatQuantityText(m.analysedTime, 's')} after ${formatQuantityText(result.settleTime, 's')} settling`;
  return (
    <div className="grid gap-3 md:grid-cols-2" data-testid="figure-panels">
      <FigurePanel title="Comfort" hue="comfort">
        <FigureList
          items={[
            { name: 'aw', label: 'Wk-weighted RMS, aw', value: m.bodyAccelWkRms, unit: 'mps2', note: 'ISO 2631-1 vertical weighting' },
            { name: 'vdv', label: 'VDV', value: m.vdv, unit: 'mps175', note: 'vibration dose value, Wk-weighted' },
            { name: 'accelRms', label: 'Body accel. RMS', value: m.bodyAccelRms, unit: 'mps2' },
            { name: 'accelPeak', label: 'Body accel. peak', value: m.bodyAccelPeak, unit: 'mps2' },
            { name: 'crest', label: 'Crest factor', value: m.bodyAccelCrest, note: 'peak / RMS' },
          ]}
        />
        <ComfortScale aw={m.bodyAccelWkRms} grading={m.comfort} />
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
          ]}
        />
        <p className="mt-1.5 text-2xs leading-snug text-ink-faint">Band shares are of time, on |piston velocity|. Figures {analysed}.</p>
      </FigurePanel>

      <FigurePanel title="Modes of the linearised corner">
        <ModalTable modal={result.modal} />
      </FigurePanel>
      <StaticsPanel result={result} roadName={roadName} />
    </div>
  );
}
