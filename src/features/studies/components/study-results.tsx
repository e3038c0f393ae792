import { ChartExportProvider } from '../../../components/charts/export-context.tsx';
import { exportFileName } from '../../../lib/export-name.ts';
import { studyExportInfo } from '../model/export-info.ts';
import { type ReactNode, useMemo, useState } from 'react';
import { studyFigureKeys, type StudyFigureKey } from '../../../../shared/schemas/study.ts';
import { describePoint } from '../../../../shared/study/describe-point.ts';
import { sweepValues } from '../../../../shared/study/expand.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, Select } from '../../../components/ui/field.tsx';
import { Section } from '../../../components/ui/page-header.tsx';
import { useStudyDisplay } from '../model/display.ts';
import { pointsCsv } from '../model/points-csv.ts';
import { downloadText } from '../../../lib/download.ts';
import type { StudyView } from '../model/study-view.ts';
import { defaultSlice, type StudySlice } from '../model/chart-data.ts';
import { CompromiseCard } from './compromise-card.tsx';
import { FigureLinesChart } from './figure-lines-chart.tsx';
import { HeatMap } from './heat-map.tsx';
import { PointCard } from './point-card.tsx';
import { PointsTable } from './points-table.tsx';
import { TradeOffChart } from './trade-off-chart.tsx';

export interface StudyResultsProps {
  view: StudyView;
  roadNames: readonly string[];
  baselineIndex: number | null;
  /** Buttons for a point (open as setup, mark as baseline), as the caller's role allows. */
  pointActions?: (index: number) => ReactNode;
  /**
   * A run is going: only the trade-off chart fills in as points finish; the map, the lines and
   * the table wait for the end, so the page's own thread stays light while the workers run.
   */
  running?: boolean;
  /** The base setup and revision, named in exported files and images (a shared study hides it). */
  base?: { setupName: string; revisionNumber: number };
}

/**
 * Everything a study shows: the comfort/grip trade-off (the largest thing on the page) with the
 * best compromise beside it, the 2-D map of any figure, a figure along one parameter, and the
 * table of all points. Picking a point anywhere highlights it everywhere.
 */
export function StudyResults({ view, roadNames, baselineIndex, pointActions, running = false, base }: StudyResultsProps) {
  const def = view.definition;
  const d = useStudyDisplay();
  const { figureLabel, parameterLabel } = d;
  const about = studyExportInfo(def.name, roadNames, def.speeds, base);
  const [selected, setSelected] = useState<number | null>(null);
  const present = useMemo(() => studyFigureKeys.filter((k) => view.points.some((p) => p.figures[k] !== undefined)), [view.points]);
  const [mapFigure, setMapFigure] = useState<StudyFigureKey>(def.objectives[0]?.figure ?? def.comfortFigure);
  const [lineFigure, setLineFigure] = useState<StudyFigureKey>(def.comfortFigure);
  const [slice, setSlice] = useState<StudySlice>(() => defaultSlice(def.axes.length));
  const setHold = (axis: number, at: number) => setSlice((s) => ({ ...s, holdAt: s.holdAt.map((v, k) => (k === axis ? at : v)) }));
  const many = def.axes.length > 2;
  const seeded = (def.seeds ?? 1) > 1;
  const c = view.compromise;
  const noFront = c && !c.ok && c.reason === 'no-feasible-point' ? c.explanation.slice(0, 2).join(' ') : null;
  const describe = (index: number) => (index === -1 ? 'the base setup' : describePoint(def.axes, view.points.find((p) => p.index === index)?.values ?? {}, d.parameterWords));

  return (
    <ChartExportProvider value={about}>
    <div className="space-y-6">
      <div className="grid gap-4 xl:grid-cols-[minmax(0,2fr)_minmax(20rem,1fr)]">
        <section aria-label="Comfort against grip" className="rounded border border-rule bg-paper-raised p-3">
          <div className="mb-1 flex items-baseline justify-between gap-3 pr-20">
            <h2 className="text-lg font-semibold">
              <span className="text-comfort">Comfort</span> against <span className="text-grip">grip</span>
            </h2>
            <span className="text-xs text-ink-faint">{view.points.length} points</span>
          </div>
          {noFront && (
            <p className="mb-2 rounded-sm border-l-2 border-signal bg-signal-wash/60 px-2 py-1.5 text-sm text-ink" data-testid="no-front" role="note">
              No trade-off front: {noFront}
            </p>
          )}
          <TradeOffChart view={view} baselineIndex={baselineIndex} selected={selected} onSelect={setSelected} describe={describe} />
        </section>
        <div className="space-y-3">
          <CompromiseCard view={view} actions={pointActions} />
          {selected !== null && <PointCard view={view} index={selected} actions={selected >= 0 ? pointActions?.(selected) : undefined} />}
          {!view.compromise && <p className="rounded border border-dashed border-rule px-3 py-2 text-sm text-ink-soft">The best compromise is worked out when the run ends.</p>}
        </div>
      </div>

      {running ? (
        <p className="rounded border border-dashed border-rule px-3 py-2 text-sm text-ink-soft">The map, the figures along each parameter and the table of points appear when the run ends.</p>
      ) : (
        <>
          {seeded && (
            <p className="text-sm text-ink-soft" data-testid="seed-note">
              Every point ran over {def.seeds} ISO 8608 road seeds: figures are the mean over the seeds, and the spread is their standard deviation (event and measured roads are the same for every seed).
            </p>
          )}
          <div className={`grid gap-4 ${def.axes.length >= 2 ? 'xl:grid-cols-2' : ''}`}>
            {def.axes.length >= 2 && (
              <section aria-label="Map of a figure" className="rounded border border-rule bg-paper-raised p-3">
                <div className="mb-2 flex flex-wrap items-end gap-3 pr-20">
                  <h2 className="text-base font-semibold">{many ? 'Map over two parameters' : 'Map over both parameters'}</h2>
                  <Field label="Figure" className="w-80 max-w-full">
                    <Select value={mapFigure} onChange={(e) => setMapFigure(e.target.value as StudyFigureKey)}>
                      {present.map((k) => (
                        <option key={k} value={k}>
                          {figureLabel(k)}
                        </option>
                      ))}
                    </Select>
                  </Field>
                  {many && (
                    <>
                      {([0, 1] as const).map((side) => (
                        <Field key={side} label={side === 0 ? 'Across' : 'Up'} className="w-44">
                          <Select
                            value={slice.mapAxes[side]}
                            onChange={(e) => {
                              const pick = Number(e.target.value);
                              setSlice((s) => {
                                const mapAxes: [number, number] = [...s.mapAxes];
                                // Choosing the axis the other side shows swaps them.
                                if (mapAxes[1 - side] === pick) mapAxes[1 - side] = mapAxes[side];
                                mapAxes[side] = pick;
                                return { ...s, mapAxes };
                              });
                            }}
                          >
                            {def.axes.map((a, i) => (
                              <option key={a.parameter} value={i}>
                                {parameterLabel(a.parameter, false)}
                              </option>
                            ))}
                          </Select>
                        </Field>
                      ))}
                      <HoldFields axes={def.axes} skip={slice.mapAxes} holdAt={slice.holdAt} onHold={setHold} />
                    </>
                  )}
                </div>
                <HeatMap view={view} figure={mapFigure} baselineIndex={baselineIndex} selected={selected} onSelect={setSelected} slice={slice} />
                <p className="mt-1 text-xs text-ink-soft">Hatched cells break a limit. Outlined: best compromise (violet), baseline (olive).</p>
              </section>
            )}
            <section aria-label="Figure along a parameter" className="rounded border border-rule bg-paper-raised p-3">
              <div className="mb-2 flex flex-wrap items-end gap-3 pr-20">
                <h2 className="text-base font-semibold">Along one parameter, per road and speed</h2>
                <Field label="Figure" className="w-80 max-w-full">
                  <Select value={lineFigure} onChange={(e) => setLineFigure(e.target.value as StudyFigureKey)}>
                    {present.map((k) => (
                      <option key={k} value={k}>
                        {figureLabel(k)}
                      </option>
                    ))}
                  </Select>
                </Field>
                {def.axes.length >= 2 && (
                  <>
                    <Field label="Across" className="w-44">
                      <Select value={slice.along} onChange={(e) => setSlice((sl) => ({ ...sl, along: Number(e.target.value) }))}>
                        {def.axes.map((a, i) => (
                          <option key={a.parameter} value={i}>
                            {parameterLabel(a.parameter, false)}
                          </option>
                        ))}
                      </Select>
                    </Field>
                    <HoldFields axes={def.axes} skip={[slice.along]} holdAt={slice.holdAt} onHold={setHold} />
                  </>
                )}
              </div>
              <FigureLinesChart view={view} figure={lineFigure} along={slice.along} holdAt={slice.holdAt} roadNames={roadNames} />
              {seeded && <p className="mt-1 text-xs text-ink-soft">Lines: the mean over the seeds; shaded: ±1 standard deviation.</p>}
            </section>
          </div>

          <Section
            title="All points"
            actions={
              <Button size="sm" onClick={() => downloadText(pointsCsv(view, d), exportFileName(about.stem, 'points', 'csv'))}>
                Export CSV
              </Button>
            }
          >
            <PointsTable view={view} selected={selected} onSelect={setSelected} />
          </Section>
        </>
      )}
    </div>
    </ChartExportProvider>
  );
}

/** The value each swept parameter not on a chart is held at (a slice of the sweep). */
function HoldFields({ axes, skip, holdAt, onHold }: { axes: StudyView['definition']['axes']; skip: readonly number[]; holdAt: readonly number[]; onHold: (axis: number, at: number) => void }) {
  const { parameterLabel, parameterText } = useStudyDisplay();
  return (
    <>
      {axes.map((a, i) =>
        skip.includes(i) ? null : (
          <Field key={a.parameter} label={`At ${parameterLabel(a.parameter)}`} className="w-36">
            <Select value={holdAt[i] ?? 0} onChange={(e) => onHold(i, Number(e.target.value))}>
              {sweepValues(a).map((v, k) => (
                <option key={k} value={k}>
                  {parameterText(a.parameter, v)}
                </option>
              ))}
            </Select>
          </Field>
        ),
      )}
    </>
  );
}
