import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { StudyDefinition } from '../../../../shared/schemas/study.ts';
import type { StudyPointResult } from '../../../../shared/schemas/study-result.ts';
import { evaluatePoint } from '../../../../shared/study/evaluate-point.ts';
import { expandStudy, pointIndexOf } from '../../../../shared/study/expand.ts';
import { figureLines, heatGrid, tradeOffColumns } from './chart-data.ts';
import { chosenUnits } from '../../../lib/units/unit-table.ts';
import { savedPointName, studyDisplay } from './display.ts';
import { pointsCsv } from './points-csv.ts';
import { studyView } from './study-view.ts';

const def = StudyDefinition.parse({
  name: 'Grid',
  base: { setupId: 's', revisionId: 'r' },
  axes: [
    { parameter: 'damperScale', from: 0.5, to: 1.5, steps: 3 },
    { parameter: 'springRate', from: 20000, to: 30000, steps: 2 },
  ],
  roads: [{ source: 'inline', road: { kind: 'iso8608', class: 'C', seed: 7 } }],
  speeds: [20, 30],
  objectives: [
    { figure: 'bodyAccelWkRms', weight: 1 },
    { figure: 'tyreLoadRatio', weight: 1 },
  ],
});

/** Invented figures: comfort gets worse and grip better as damping rises; point 5 breaks a limit. */
function point(index: number, values: StudyPointResult['values']): StudyPointResult {
  const d = values.damperScale ?? 1;
  const s = (values.springRate ?? 25000) / 25000;
  const figures = { bodyAccelWkRms: 0.5 + 0.3 * d + 0.1 * s, tyreLoadRatio: 0.3 - 0.1 * d + 0.02 * s, liftOffFraction: 0.001 };
  const runs = [20, 30].map((speed) => ({ roadIndex: 0, speed, figures: { ...figures, bodyAccelWkRms: figures.bodyAccelWkRms * (speed / 25) } }));
  const feasible = index !== 5;
  return {
    index,
    values,
    runs,
    figures,
    objectives: [figures.bodyAccelWkRms, figures.tyreLoadRatio],
    feasible,
    violations: feasible ? [] : [{ kind: 'maxStrokeUsed', limit: 0.9, value: 0.95, roadIndex: 0, speed: 30, message: 'uses 95.0 % of the stroke on road 1 at 30 m/s (limit 90.0 %)' }],
  };
}

const points = expandStudy(def).points.map((p) => point(p.index, p.values));
const base = point(-1, {});

describe('study chart data', () => {
  it('trade-off columns: one x per point sorted by comfort, each point in exactly one of the limit series, the front joined', () => {
    const view = studyView(def, points, base, true);
    const c = tradeOffColumns(view, 2);
    expect(c.x).toHaveLength(7);
    expect([...c.x].sort((a, b) => a - b)).toEqual(c.x);
    c.x.forEach((_, i) => {
      const inFeasible = c.feasible[i] !== null;
      const inInfeasible = c.infeasible[i] !== null;
      const isBase = c.base[i] !== null;
      expect(Number(inFeasible) + Number(inInfeasible) + Number(isBase)).toBe(1);
    });
    expect(c.pointAt.filter((_, i) => c.infeasible[i] !== null)).toEqual([5]);
    expect(c.pointAt.filter((_, i) => c.base[i] !== null)).toEqual([-1]);
    expect(c.pointAt.filter((_, i) => c.baseline[i] !== null)).toEqual([2]);
    // the winner is on the front, and the front holds only feasible points
    const best = c.pointAt.find((_, i) => c.best[i] !== null);
    expect(c.pointAt.filter((_, i) => c.front[i] !== null)).toContain(best);
    expect(c.pointAt.filter((_, i) => c.front[i] !== null)).not.toContain(5);
  });

  it('a running study has no front or winner yet', () => {
    const c = tradeOffColumns(studyView(def, points.slice(0, 3), null, false), null);
    expect(c.front.every((v) => v === null)).toBe(true);
    expect(c.best.every((v) => v === null)).toBe(true);
  });

  it('heat grid: first axis by row, second by column, springs in N/mm, limits marked, gaps for missing points', () => {
    const g = heatGrid(studyView(def, points.filter((p) => p.index !== 3), base, true), 'bodyAccelWkRms');
    if (!g) throw new Error('expected a grid');
    expect(g.xs).toEqual([0.5, 1, 1.5]);
    expect(g.ys).toEqual([20, 30]);
    expect(g.index).toEqual([[0, 1], [2, 3], [4, 5]]);
    expect(g.cells[1][1]).toBeNull();
    expect(g.cells[0][0]).toBeCloseTo(0.5 + 0.15 + 0.08, 12);
    expect(g.infeasible[2][1]).toBe(true);
    expect(g.min).toBeCloseTo(0.73, 12);
  });

  it('figure lines: one line per road and speed from the runs, the other axis held', () => {
    const l = figureLines(studyView(def, points, base, true), 'bodyAccelWkRms', 0, [0, 1], ['Class C lane']);
    expect(l.x).toEqual([0.5, 1, 1.5]);
    expect(l.lines.map((x) => x.label)).toEqual(['Class C lane · 72 km/h', 'Class C lane · 108 km/h']);
    expect(l.lines[1].y[2]).toBeCloseTo((0.5 + 0.45 + 0.12) * 1.2, 12);
  });

  it('CSV: a header naming units, the base first, one row per point with its verdict', () => {
    const rows = Papa.parse<string[]>(pointsCsv(studyView(def, points, base, true)).trim()).data;
    expect(rows[0].slice(0, 4)).toEqual(['point', 'description', 'damper scale [×]', 'spring rate [N/mm]']);
    expect(rows[0]).toContain('Wk-weighted body acceleration [m/s²]');
    expect(rows[0]).toContain('time off the road [%]');
    expect(rows).toHaveLength(1 + 7);
    expect(rows[1][0]).toBe('base');
    expect(rows[7].slice(0, 6)).toEqual(['5', 'damper ×1.50, spring rate 30.0\u2009N/mm', '1.5', '30', 'no', 'uses 95.0 % of the stroke on road 1 at 30 m/s (limit 90.0 %)']);
    const lift = rows[0].indexOf('time off the road [%]');
    expect(Number(rows[2][lift])).toBeCloseTo(0.1, 12);
    expect(rows.slice(2).filter((r) => r[rows[0].indexOf('best compromise')] === 'yes')).toHaveLength(1);
  });

  describe('over seeds and more than two parameters', () => {
    const def3 = StudyDefinition.parse({ ...def, axes: [...def.axes, { parameter: 'tyreRate', from: 2e5, to: 3e5, steps: 2 }], speeds: [20], seeds: 3 });
    /** Invented per-seed figures: seed k adds k·0.1 to comfort, so the mean is +0.1 and the sd 0.1 (sample sd of 0, 0.1, 0.2). */
    const seeded = expandStudy(def3).points.map((p) => {
      const d = p.values.damperScale ?? 1;
      const t = (p.values.tyreRate ?? 2e5) / 2e5;
      const runs = [0, 1, 2].map((k) => ({ roadIndex: 0, speed: 20, seedIndex: k, figures: { bodyAccelWkRms: d + t + 0.1 * k, tyreLoadRatio: 0.3 - 0.1 * d } }));
      return evaluatePoint(def3, p, runs);
    });
    const view = studyView(def3, seeded, null, true);

    it('trade-off ranges span ±1 sd around each mean', () => {
      const c = tradeOffColumns(view, null);
      const i = c.pointAt.indexOf(0);
      expect(c.x[i]).toBeCloseTo(0.5 + 1 + 0.1, 12);
      expect(c.range?.xLo[i]).toBeCloseTo(0.5 + 1 + 0.1 - 0.1, 12);
      expect(c.range?.xHi[i]).toBeCloseTo(0.5 + 1 + 0.1 + 0.1, 12);
      // Grip does not scatter here: no range, shown in % as the page shows it.
      expect(c.range?.yHi[i]).toBeCloseTo(25, 10);
    });

    it('figure lines are the mean over seeds in a ±1 sd band, the third axis held where asked', () => {
      const l = figureLines(view, 'bodyAccelWkRms', 0, [0, 1, 1], ['lane']);
      expect(l.lines).toHaveLength(1);
      // damper 1.5, tyre 3e5 (held at position 1): 1.5 + 1.5 + 0.1
      expect(l.lines[0].y[2]).toBeCloseTo(3.1, 12);
      expect(l.lines[0].lo?.[2]).toBeCloseTo(3.0, 12);
      expect(l.lines[0].hi?.[2]).toBeCloseTo(3.2, 12);
    });

    it('the map shows the two chosen axes with the third held', () => {
      const g = heatGrid(view, 'bodyAccelWkRms', { mapAxes: [0, 2], along: 0, holdAt: [0, 1, 0] });
      expect(g?.ys).toEqual([200, 300]);
      expect(g?.index[1][1]).toBe(pointIndexOf(def3.axes, [1, 1, 1]));
      expect(g?.cells[1][1]).toBeCloseTo(1 + 1.5 + 0.1, 12);
    });

    it('CSV: each figure as mean, sd, least and greatest over the seeds', () => {
      const rows = Papa.parse<string[]>(pointsCsv(view).trim()).data;
      const at = rows[0].indexOf('Wk-weighted body acceleration, mean over seeds [m/s²]');
      expect(at).toBeGreaterThan(0);
      expect(rows[0].slice(at + 1, at + 4)).toEqual(['Wk-weighted body acceleration, sd over seeds [m/s²]', 'Wk-weighted body acceleration, min over seeds [m/s²]', 'Wk-weighted body acceleration, max over seeds [m/s²]']);
      expect(rows[1].slice(at, at + 4).map(Number).map((x) => +x.toFixed(9))).toEqual([1.6, 0.1, 1.5, 1.7]);
    });
  });

  // 1 lbf/in = 4.4482216152605 N / 0.0254 m = 175.126835 N/m, 1 in = 0.0254 m, 1 mph = 0.44704 m/s (NIST SP 811, B.8)
  const imperial = studyDisplay(chosenUnits({ damperVelocity: 'mm/s', rate: 'lbf/in', speed: 'mph', length: 'in' }));

  it('in the chosen units: rates in lbf/in, travel and sag in in, damper speed in mm/s, road speed in mph; others unchanged', () => {
    expect(imperial.parameterLabel('springRate')).toBe('spring rate [lbf/in]');
    expect(imperial.parameterToDisplay('springRate', 17512.6835)).toBeCloseTo(100, 5);
    expect(imperial.parameterToSI('tyreRate', 1000)).toBeCloseTo(175126.835, 2);
    expect(imperial.parameterLabel('speed')).toBe('speed [mph]');
    expect(imperial.parameterText('speed', 26.8224)).toBe('60.0');
    expect(imperial.figureLabel('travelRms')).toBe('suspension travel RMS [in]');
    expect(imperial.figureText('staticSag', 0.127)).toBe('5.00');
    expect(imperial.figureLabel('damperVelocityRms')).toBe('damper speed RMS [mm/s]');
    expect(imperial.figureToDisplay('damperVelocityRms', 0.25)).toBe(250);
    expect(imperial.figureLabel('tyreLoadMin')).toBe('minimum tyre load [N]');
    expect(imperial.parameterLabel('damperScale')).toBe('damper scale [×]');
    expect(imperial.parameterWithUnit('reboundScale', 1.2)).toBe('×1.20');
  });

  it('names points, chart lines, heat-map axes and CSV headers in the chosen units, from the same SI results', () => {
    const view = studyView(def, points, base, true, imperial);
    const rows = Papa.parse<string[]>(pointsCsv(view, imperial).trim()).data;
    expect(rows[0].slice(0, 4)).toEqual(['point', 'description', 'damper scale [×]', 'spring rate [lbf/in]']);
    // 30 000 N/m ÷ 175.126835 N/m per lbf/in = 171.304 lbf/in
    expect(rows[7][1]).toBe('damper ×1.50, spring rate 171\u2009lbf/in');
    expect(Number(rows[7][3])).toBeCloseTo(171.30441, 4);
    const grid = heatGrid(view, 'bodyAccelWkRms', undefined, imperial)!;
    expect(grid.ys.map((y) => Number(y.toFixed(3)))).toEqual([114.203, 171.304]);
    // 20 m/s ÷ 0.44704 = 44.7387 mph
    expect(figureLines(view, 'bodyAccelWkRms', 0, [0, 1], ['Class C lane'], imperial).lines.map((l) => l.label)).toEqual(['Class C lane · 44.7 mph', 'Class C lane · 67.1 mph']);
    expect(view.compromise?.ok && view.compromise.explanation.join(' ')).toMatch(/lbf\/in/);
  });

  it('names a saved point (baseline, best) from its sweep index in the chosen units, the stored words when the index is unknown', () => {
    // point 5 of the 3 × 2 grid: damper ×1.50, spring 30 000 N/m
    expect(savedPointName(imperial, def.axes, { pointIndex: 5, label: 'damper ×1.50, spring rate 30 000 N/m' })).toBe('damper ×1.50, spring rate 171\u2009lbf/in');
    expect(savedPointName(imperial, def.axes, { pointIndex: 99, label: 'as stored' })).toBe('as stored');
  });
});
