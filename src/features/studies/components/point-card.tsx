import type { ReactNode } from 'react';
import type { StudyFigureKey } from '../../../../shared/schemas/study.ts';
import { describePoint } from '../../../../shared/study/describe-point.ts';
import { Tag } from '../../../components/ui/tag.tsx';
import { useStudyDisplay } from '../model/display.ts';
import type { StudyView } from '../model/study-view.ts';

/** The point picked on a chart or in the table: its values, whether it meets the limits (and why not), its main figures. */
export function PointCard({ view, index, actions }: { view: StudyView; index: number; actions?: ReactNode }) {
  const point = index === -1 ? view.base : view.points.find((p) => p.index === index);
  const d = useStudyDisplay();
  if (!point) return null;
  const { figureLabel, figureText } = d;
  const def = view.definition;
  const sweepsDampingRatio = def.axes.some((a) => a.parameter === 'targetBodyDampingRatio');
  const keys: StudyFigureKey[] = [
    ...new Set<StudyFigureKey>([
      def.comfortFigure,
      def.gripFigure,
      ...def.objectives.map((o) => o.figure),
      'strokeUsed',
      'liftOffFraction',
      ...(sweepsDampingRatio ? (['bodyDampingRatioOnRoad'] as const) : []),
    ]),
  ];
  const pastEnd = point.figures.endOfStrokeDepth ?? 0;
  return (
    <section aria-label="Picked point" className="rounded border border-rule bg-paper-raised px-4 py-3">
      <p className="text-xs font-medium tracking-wide text-ink-faint uppercase">Picked point {index >= 0 ? `#${index}` : ''}</p>
      <h2 className="text-base font-semibold">{index === -1 ? 'The base setup, unchanged' : describePoint(def.axes, point.values, d.parameterWords)}</h2>
      <p className="mt-1 text-sm">{point.feasible ? <span className="text-ok">Meets every limit.</span> : <Tag tone="signal">breaks a limit</Tag>}</p>
      {!point.feasible && (
        <ul className="mt-1 list-disc pl-5 text-sm text-signal-ink">
          {point.violations.slice(0, 4).map((v, i) => (
            <li key={i}>{v.message}</li>
          ))}
          {point.violations.length > 4 && <li>and {point.violations.length - 4} more</li>}
        </ul>
      )}
      {pastEnd > 0 && (
        <p className="mt-1 text-sm text-signal-ink">
          Reaches the end of the stroke: travel went {d.figureWithUnit('endOfStrokeDepth', pastEnd)} past it into the hard limit on at least one road. Figures
          past that point depend on the limit's assumed stiffness.
        </p>
      )}
      {sweepsDampingRatio && (
        <p className="mt-1 text-xs text-ink-faint">
          The swept damping ratio is set from each table's slope over 0–0.3 m/s; "body damping ratio on the road" is what the damper gave on the road
          (ΣF·v / Σv²).
        </p>
      )}
      <dl className="mt-2 grid grid-cols-[1fr_auto] gap-x-4 gap-y-0.5 text-sm">
        {keys
          .filter((k) => point.figures[k] !== undefined)
          .map((k) => (
            <div key={k} className="contents">
              <dt className="text-ink-soft">{figureLabel(k)}</dt>
              <dd className="figures text-right">{figureText(k, point.figures[k])}</dd>
            </div>
          ))}
      </dl>
      {actions && <div className="mt-3 flex flex-wrap gap-2">{actions}</div>}
    </section>
  );
}
