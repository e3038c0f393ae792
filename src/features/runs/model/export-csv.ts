import { writeCsv } from '../../../../shared/csv/write-csv.ts';
import type { RunResult } from '../../../../shared/schemas/run.ts';
import type { ChosenUnits } from '../../../lib/units/unit-table.ts';
import { betterRules, displayUnitOf, figureRows } from './figure-rows.ts';
import type { RunView } from './run-view.ts';

/**
 * CSV files of a run. Figures are written in display units with full precision (the page
 * rounds, the file does not); the unit is in its own column so a spreadsheet can read numbers.
 */

export interface NamedResult {
  name: string;
  result: RunResult;
}

/** One row per figure, one value column per run. */
export function figuresCsv(runs: NamedResult[], chosen?: ChosenUnits): string {
  const header = ['group', 'figure', 'unit', ...runs.map((r) => r.name), 'ranking'];
  const rows = figureRows.map((row) => {
    const unit = displayUnitOf(row, chosen);
    return [
      row.group,
      row.label,
      unit?.symbol ?? '',
      ...runs.map(({ result }) => {
        const v = row.value(result);
        return v === undefined ? '' : unit ? unit.fromSI(v) : v;
      }),
      betterRules[row.better],
    ];
  });
  return writeCsv([header, ...rows]);
}

/**
 * Time histories in SI, one row per sample. A fresh run exports every sample; a saved run
 * exports what was stored (thinned to bucket extremes for long runs, which the header says).
 */
export function tracesCsv(view: RunView): string {
  const source = view.full;
  const header = ['time_s', 'body_accel_m_s2', 'travel_m', 'tyre_load_N', 'damper_velocity_m_s', 'damper_force_N', 'road_m'];
  const rows: (string | number)[][] = [];
  if (source) {
    for (let i = 0; i < source.bodyAccel.length; i++) {
      rows.push([+(i * source.dt).toFixed(6), source.bodyAccel[i], source.travel[i], source.tyreLoad[i], source.damperVelocity[i], source.damperForce[i], source.road[i]]);
    }
  } else {
    const t = view.traces;
    for (let i = 0; i < t.time.length; i++) rows.push([t.time[i], t.bodyAccel[i], t.travel[i], t.tyreLoad[i], t.damperVelocity[i], t.damperForce[i], t.road[i]]);
  }
  const note = source || view.thinned === 'all-samples' ? [] : [['# stored trace: each time bucket keeps its minimum and maximum (extremes exact, times within half a bucket)']];
  return writeCsv([...note, header, ...rows]);
}

/** File-name stem from a run's name ("Pipit front r3 – class C 60 km/h" → "pipit-front-r3-class-c-60-km-h"). */
export function fileStem(name: string): string {
  const stem = name
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, ' ')
    .trim()
    .toLowerCase()
    .replace(/[\s_-]+/g, '-')
    .slice(0, 80);
  return stem || 'run';
}
