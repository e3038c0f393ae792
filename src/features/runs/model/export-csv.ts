import { csvNumber, FIGURE_DIGITS } from '../../../../shared/csv/csv-number.ts';
import { commentText, writeCsv } from '../../../../shared/csv/write-csv.ts';
import type { RunResult } from '../../../../shared/schemas/run.ts';
import type { ChosenUnits } from '../../../lib/units/unit-table.ts';
import { betterRules, displayUnitOf, figureRows } from './figure-rows.ts';
import type { TraceColumns } from '../../../../shared/sim/trace.ts';

/**
 * CSV files of a run. Figures are written in display units to their meaningful digits
 * (`FIGURE_DIGITS`); the unit is in its own column so a spreadsheet can read numbers.
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
        return v === undefined ? '' : csvNumber(unit ? unit.fromSI(v) : v, FIGURE_DIGITS);
      }),
      betterRules[row.better],
    ];
  });
  return writeCsv([header, ...rows]);
}

/**
 * Time histories in SI, one row per computed sample: evenly spaced at the run's output rate,
 * which the header states (`# sample rate 1000 Hz …`) so an outside FFT can take it as it is.
 * `about` names the run (setup, revision, road, speed) on the first `#` line; `notes` follow as `#` lines.
 */
export function tracesCsv(trace: TraceColumns, about: string, notes: readonly string[] = []): string {
  const rate = csvNumber(1 / trace.dt) ?? 0;
  const header = ['time_s', 'body_accel_m_s2', 'travel_m', 'tyre_load_N', 'damper_velocity_m_s', 'damper_force_N', 'road_m'];
  const f = (x: number) => csvNumber(x, FIGURE_DIGITS);
  const rows: (string | number | null)[][] = [];
  for (let i = 0; i < trace.bodyAccel.length; i++) {
    rows.push([i * trace.dt, f(trace.bodyAccel[i]), f(trace.travel[i]), f(trace.tyreLoad[i]), f(trace.damperVelocity[i]), f(trace.damperForce[i]), f(trace.road[i])]);
  }
  const head = [`# ${commentText(about)}`, `# sample rate ${rate} Hz: every computed sample, evenly spaced ${csvNumber(trace.dt)} s apart`, ...notes.map((n) => `# ${commentText(n)}`)];
  return `${head.join('\n')}\n${writeCsv([header, ...rows])}\n`;
}
