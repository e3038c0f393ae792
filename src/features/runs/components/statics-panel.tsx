import type { RunResult } from '../../../../shared/schemas/run.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { FigureList, FigurePanel } from './figure-list.tsx';

/** The corner at rest and what the run cost: context for the figures beside it. */
export function StaticsPanel({ result, roadName }: { result: RunResult; roadName: string }) {
  const s = result.statics;
  const t = result.timing;
  const { length } = useUnits();
  return (
    <FigurePanel title="At rest, and the run">
      <FigureList
        items={[
          { name: 'staticLoad', label: 'Static tyre load', value: s.tyreLoad, unit: 'N' },
          { name: 'bodySag', label: 'Body sag under gravity', value: s.bodySag, unit: length },
          { name: 'springDeflection', label: 'Spring deflection at the wheel', value: s.springDeflection, unit: length },
          { name: 'gasForce', label: 'Gas force at rest', value: s.gasForce, unit: 'N' },
          { name: 'distance', label: 'Distance driven', value: result.road.distance, unit: 'm', note: roadName },
          { name: 'runTime', label: 'Computing time', value: t.totalMs / 1000, unit: 'ms', note: `${t.steps} integrator steps, ${t.rejectedSteps} rejected · tolerance ${result.tolerance}` },
        ]}
      />
    </FigurePanel>
  );
}
