import type { ReactNode } from 'react';
import { baseVerdict } from '../../../../shared/study/base-verdict.ts';
import { describePoint } from '../../../../shared/study/describe-point.ts';
import { gridEdges } from '../../../../shared/study/grid-edge.ts';
import { useStudyDisplay } from '../model/display.ts';
import type { StudyView } from '../model/study-view.ts';

/**
 * The best compromise in plain words: which point, why it wins (its weighted score among the
 * points within the limits) and what it gives up against its neighbours on the front.
 */
export function CompromiseCard({ view, actions }: { view: StudyView; actions?: (index: number) => ReactNode }) {
  const d = useStudyDisplay();
  const c = view.compromise;
  if (!c) return null;
  if (!c.ok) {
    return (
      <section aria-label="Best compromise" className="rounded border border-signal/40 bg-signal-wash px-4 py-3">
        <h2 className="text-base font-semibold text-signal-ink">No best compromise</h2>
        {c.explanation.map((s) => (
          <p key={s} className="mt-1 text-sm text-signal-ink">
            {s}
          </p>
        ))}
      </section>
    );
  }
  const winner = view.points[c.winner];
  const neighbourSentences = new Set(c.neighbours.map((n) => n.sentence));
  const why = c.explanation.filter((s) => !neighbourSentences.has(s));
  const def = view.definition;
  const { figureLabel, figureText } = d;
  const base = baseVerdict(def, view.points, view.base, c, d.figureWithUnit);
  const edges = gridEdges(def.axes, winner.values, Object.fromEntries(def.axes.map((a) => [a.parameter, (x: number) => d.parameterWithUnit(a.parameter, x)])));
  return (
    <section aria-label="Best compromise" className="rounded border-2 border-comfort/50 bg-paper-raised px-4 py-3 shadow-lift">
      {base?.beatsBestOnBoth && (
        <p className="mb-2 rounded-sm border-l-2 border-signal bg-signal-wash/60 px-2 py-1.5 text-sm font-medium text-ink" data-testid="base-beats-best" role="note">
          {base.sentences[0]}
        </p>
      )}
      <p className="text-xs font-medium tracking-wide text-comfort uppercase">{base?.beatsBestOnBoth ? 'Best compromise among the swept points' : 'Best compromise'}</p>
      <h2 className="text-lg font-semibold" data-testid="best-compromise-point">
        {describePoint(def.axes, winner.values, d.parameterWords)}
      </h2>
      <dl className="mt-1 flex flex-wrap gap-x-5 gap-y-1 text-sm">
        {[def.comfortFigure, def.gripFigure].map((k) => (
          <div key={k} className="flex gap-1.5">
            <dt className="text-ink-soft">{figureLabel(k)}</dt>
            <dd className="figures">
              {figureText(k, winner.figures[k])}
              {winner.spread?.[k] && <span className="text-ink-soft"> ± {figureText(k, winner.spread[k].sd)}</span>}
            </dd>
          </div>
        ))}
        <div className="flex gap-1.5">
          <dt className="text-ink-soft">weighted score</dt>
          <dd className="figures">{c.score.toFixed(3)}</dd>
        </div>
      </dl>
      {winner.spread && (
        <p className="mt-2 text-sm text-ink" data-testid="compromise-spread">
          Chosen on the mean over {def.seeds} road seeds. Across them,{' '}
          {[def.comfortFigure, def.gripFigure]
            .flatMap((k) => {
              const r = winner.spread?.[k];
              return r ? [`${d.figureLabel(k, false)} runs from ${d.figureWithUnit(k, r.min)} to ${d.figureWithUnit(k, r.max)} (standard deviation ${d.figureWithUnit(k, r.sd)})`] : [];
            })
            .join(', and ')}
          .
        </p>
      )}
      <div className="mt-2 space-y-1 text-sm text-ink">
        {why.map((s) => (
          <p key={s}>{s}</p>
        ))}
        {base && !base.beatsBestOnBoth && base.sentences.map((s) => <p key={s}>{s}</p>)}
      </div>
      {edges.length > 0 && (
        <ul className="mt-2 space-y-0.5 text-sm font-medium text-signal-ink" data-testid="grid-edges">
          {edges.map((e) => (
            <li key={e.parameter}>{e.sentence}</li>
          ))}
        </ul>
      )}
      {c.neighbours.length > 0 && (
        <div className="mt-2">
          <h3 className="text-sm font-semibold text-ink-soft">What it gives up against its neighbours on the front</h3>
          <ul className="mt-1 list-disc space-y-0.5 pl-5 text-sm">
            {c.neighbours.map((n) => (
              <li key={n.index}>{n.sentence}</li>
            ))}
          </ul>
        </div>
      )}
      {actions && <div className="mt-3 flex flex-wrap gap-2">{actions(winner.index)}</div>}
    </section>
  );
}
