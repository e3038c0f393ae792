import { useEffect, useMemo, useState } from 'react';
import { Damper, type DamperCurve } from '../../../../shared/schemas/setup.ts';
import { Notice } from '../../../components/ui/notice.tsx';
import type { Problem } from '../../../lib/plain-issue.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { type DraftCurves, type DraftRow, type Direction, directions, draftFromCurve, draftFromDamper, draftMatches, draftProblems, readDraft, cellText } from '../model/draft.ts';
import { type CornerContext, dampingFigures } from '../model/figures.ts';
import { BuilderPanel } from './builder-panel.tsx';
import { chartSpanLabel, chartSpans, CurveChart, type PointMove } from './curve-chart.tsx';
import { DampingFiguresPanel } from './damping-figures.tsx';
import { GasEntry } from './gas-entry.tsx';
import { PointsTable } from './points-table.tsx';
import { ScaleSplit } from './scale-split.tsx';

export interface DamperCurveEditorProps extends CornerContext {
  /** The damper being edited (valid, SI). */
  value: Damper;
  /** Called with every valid change: a cell edit that makes the whole damper valid, a drag step, a builder fill, a scale. */
  onChange: (damper: Damper) => void;
  /** Shows the curve, tables and figures without edit controls. */
  readOnly?: boolean;
  /**
   * Told what in the tables does not read yet (empty once everything does): such text never
   * reaches `onChange`, but it is an edit all the same, and the page must not lose it quietly.
   */
  onProblemsChange?: (problems: Problem[]) => void;
}

/**
 * The damper curve editor: compression and rebound points as tables and as one signed chart
 * (compression positive, rebound negative) whose points can be dragged; a parametric builder,
 * scale and compression/rebound balance; the gas charge; and the equivalent damping and body
 * damping ratio, all following the edits live. Controlled: `value` in, `onChange` out.
 */
export function DamperCurveEditor({ value, onChange, readOnly = false, onProblemsChange, ...corner }: DamperCurveEditorProps) {
  const velocityUnit = useUnits().damperVelocity;
  const [draft, setDraft] = useState<DraftCurves>(() => draftFromDamper(value, velocityUnit));
  const [seededFrom, setSeededFrom] = useState(value);
  const [seededUnit, setSeededUnit] = useState(velocityUnit);
  const [span, setSpan] = useState(0);
  // A new value from outside (restore, load, builder through the parent) re-seeds the tables,
  // unless it is just our own last change echoed back.
  let shown = draft;
  if (seededUnit !== velocityUnit) {
    // another velocity unit chosen: the cells are re-expressed from the damper, never reinterpreted
    setSeededUnit(velocityUnit);
    setSeededFrom(value);
    shown = draftFromDamper(value, velocityUnit);
    setDraft(shown);
  } else if (seededFrom !== value) {
    setSeededFrom(value);
    if (!draftMatches(draft, value, velocityUnit)) {
      shown = draftFromDamper(value, velocityUnit);
      setDraft(shown);
    }
  }
  const read = useMemo(() => readDraft(shown, value, velocityUnit), [shown, value, velocityUnit]);
  const [gasProblems, setGasProblems] = useState<Problem[]>([]);
  const problems = useMemo(() => [...draftProblems(read), ...gasProblems], [read, gasProblems]);
  useEffect(() => {
    if (!readOnly) onProblemsChange?.(problems);
  }, [problems, readOnly, onProblemsChange]);
  const figures = useMemo(() => dampingFigures(value, corner), [value, corner.motionRatio, corner.sprungMass, corner.wheelRate, corner.unsprungMass, corner.tyreRate, corner.tyreDamping]);

  const editRows = (direction: Direction, rows: DraftRow[]) => {
    const next = { ...shown, [direction]: rows };
    setDraft(next);
    const out = readDraft(next, value, velocityUnit);
    if (out.ok) onChange(out.damper);
  };

  const moveTo = ({ direction, row, force }: PointMove) => {
    const curve = value[direction].map(([v, f], i) => [v, i === row ? force : f] as [number, number]);
    const parsed = Damper.safeParse({ ...value, [direction]: curve });
    if (!parsed.success) return;
    setDraft({ ...shown, [direction]: shown[direction].map((r, i) => (i === row ? { ...r, force: cellText(force) } : r)) });
    onChange(parsed.data);
  };

  const replace = (direction: Direction, curve: DamperCurve) => {
    const parsed = Damper.safeParse({ ...value, [direction]: curve.map(([v, f]) => [Number(v.toPrecision(6)), Math.round(f * 10) / 10]) });
    if (!parsed.success) return;
    setDraft({ ...shown, [direction]: draftFromCurve(parsed.data[direction], velocityUnit) });
    onChange(parsed.data);
  };

  return (
    <div className="@container grid gap-4" data-testid="damper-curve-editor">
      <div className="min-w-0 rounded border border-rule bg-paper-raised px-3 pt-2 pb-1">
        <div className="flex items-start justify-between gap-3 pr-20">
          <div className="min-w-0">
            <h3 className="text-sm font-semibold text-ink">Force against piston velocity</h3>
            <p className="text-2xs text-ink-faint">
              Signed velocity: compression to the right with positive force, rebound to the left with negative force. {readOnly ? '' : 'Drag a point up or down to change its force.'}
            </p>
          </div>
          <select aria-label="Velocity range shown" value={span} onChange={(e) => setSpan(Number(e.target.value))} className="h-6 shrink-0 rounded border border-rule bg-paper-raised px-1 text-xs text-ink-soft">
            {chartSpans.map((value) => (
              <option key={value} value={value}>
                {chartSpanLabel(value, velocityUnit)}
              </option>
            ))}
          </select>
        </div>
        <CurveChart damper={value} readOnly={readOnly} span={span} onMove={moveTo} />
      </div>

      {/* The tables grow with the problems beside their cells, so the figures get a row of their own
          rather than whatever width the tables leave. */}
      <div className="grid items-start gap-x-6 gap-y-4 @lg:grid-cols-2">
        {directions.map((d) => (
          <PointsTable key={d} direction={d} velocityUnit={velocityUnit.symbol} rows={shown[d]} errors={read.errors[d]} readOnly={readOnly} onChange={(rows) => editRows(d, rows)} />
        ))}
      </div>
      <DampingFiguresPanel figures={figures} motionRatio={corner.motionRatio} />
      {!read.ok && (read.general.length > 0 || directions.some((d) => read.errors[d].some((e) => e.velocity || e.force))) && (
        <Notice tone="signal">
          The tables have problems marked beside the cells; the chart and figures show the last valid curve until they are fixed.
          {read.general.length > 0 && <span className="block">{read.general.join(' · ')}</span>}
        </Notice>
      )}

      {!readOnly && (
        <details className="rounded border border-rule bg-paper-raised px-3 py-2">
          <summary className="cursor-pointer text-sm font-semibold text-ink">Build from parameters, scale, re-balance</summary>
          <div className="mt-3 grid gap-3 md:grid-cols-2">
            {directions.map((d) => (
              <BuilderPanel key={d} direction={d} damper={value} onFill={(curve) => replace(d, curve)} />
            ))}
          </div>
          <div className="mt-3">
            <ScaleSplit damper={value} currentSplit={figures.split} onChange={onChange} />
          </div>
        </details>
      )}

      <GasEntry gas={value.gas} readOnly={readOnly} onProblemsChange={setGasProblems} onChange={(gas) => onChange(Damper.parse({ compression: value.compression, rebound: value.rebound, ...(gas ? { gas } : {}) }))} />
    </div>
  );
}
