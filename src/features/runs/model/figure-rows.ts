import type { RunResult } from '../../../../shared/schemas/run.ts';
import { isEventRoad } from '../../../../shared/sim/metrics/rms-method.ts';
import { type DisplayUnit, units, type UnitName } from '../../../lib/format.ts';
import type { ChosenUnits } from '../../../lib/units/unit-table.ts';

/**
 * Every figure the run pages show, in one table: the dashboard groups them, the comparison
 * ranks them, the CSV export lists them. Values are SI; `unit` is the display unit.
 */

export type FigureGroup = 'comfort' | 'grip' | 'package' | 'damper' | 'modal';

/** How two runs are ranked on a row. */
export type Better = 'lower' | 'higher' | 'unranked';

export interface FigureRow {
  key: string;
  group: FigureGroup;
  label: string;
  unit?: UnitName;
  value: (r: RunResult) => number | undefined;
  better: Better;
}

export const groupTitles: Record<FigureGroup, string> = {
  comfort: 'Comfort',
  grip: 'Grip',
  package: 'Package',
  damper: 'Damper',
  modal: 'Modes',
};

/** Why a row is ranked the way it is, in the comparison table. */
export const betterRules: Record<Better, string> = {
  lower: 'lower is better',
  higher: 'higher is better',
  unranked: 'not ranked',
};

const m = (r: RunResult) => r.metrics;

export const figureRows: FigureRow[] = [
  { key: 'aw', group: 'comfort', label: 'Wk-weighted RMS (aw)', unit: 'mps2', value: (r) => m(r).bodyAccelWkRms, better: 'lower' },
  { key: 'vdv', group: 'comfort', label: 'VDV', unit: 'mps175', value: (r) => m(r).vdv, better: 'lower' },
  { key: 'mtvv', group: 'comfort', label: 'MTVV (1 s running RMS, weighted)', unit: 'mps2', value: (r) => m(r).mtvv, better: 'lower' },
  { key: 'accelRms', group: 'comfort', label: 'Body acceleration RMS', unit: 'mps2', value: (r) => m(r).bodyAccelRms, better: 'lower' },
  { key: 'accelPeak', group: 'comfort', label: 'Body acceleration peak', unit: 'mps2', value: (r) => m(r).bodyAccelPeak, better: 'lower' },
  { key: 'wkPeak', group: 'comfort', label: 'Weighted acceleration peak', unit: 'mps2', value: (r) => m(r).bodyAccelWkPeak, better: 'lower' },
  { key: 'settle', group: 'comfort', label: 'Settling time after the event', unit: 's', value: (r) => m(r).settling?.time ?? undefined, better: 'lower' },
  { key: 'wkCrest', group: 'comfort', label: 'Crest factor, weighted', value: (r) => m(r).bodyAccelWkCrest, better: 'lower' },
  { key: 'crest', group: 'comfort', label: 'Crest factor, unweighted', value: (r) => m(r).bodyAccelCrest, better: 'lower' },

  { key: 'loadRatio', group: 'grip', label: 'Tyre load variation (RMS / static)', unit: 'percent', value: (r) => m(r).tyreLoadRatio, better: 'lower' },
  { key: 'loadRms', group: 'grip', label: 'Dynamic tyre load RMS', unit: 'N', value: (r) => m(r).tyreLoadRms, better: 'lower' },
  { key: 'loadMin', group: 'grip', label: 'Minimum tyre load', unit: 'N', value: (r) => m(r).tyreLoadMin, better: 'higher' },
  { key: 'liftOff', group: 'grip', label: 'Time off the road (lift-off)', unit: 'percent', value: (r) => m(r).liftOffFraction, better: 'lower' },
  { key: 'loadStatic', group: 'grip', label: 'Static tyre load', unit: 'N', value: (r) => m(r).tyreLoadStatic, better: 'unranked' },

  { key: 'travelRms', group: 'package', label: 'Travel RMS', unit: 'mm', value: (r) => m(r).travelRms, better: 'unranked' },
  { key: 'travelComp', group: 'package', label: 'Deepest compression', unit: 'mm', value: (r) => m(r).travelMaxCompression, better: 'unranked' },
  { key: 'travelExt', group: 'package', label: 'Deepest extension', unit: 'mm', value: (r) => m(r).travelMaxExtension, better: 'unranked' },
  { key: 'strokeComp', group: 'package', label: 'Compression stroke used', unit: 'percent', value: (r) => m(r).strokeUsedCompression, better: 'lower' },
  { key: 'strokeExt', group: 'package', label: 'Extension stroke used', unit: 'percent', value: (r) => m(r).strokeUsedExtension, better: 'lower' },
  { key: 'bumpTime', group: 'package', label: 'Time on the bump stop', unit: 's', value: (r) => m(r).bumpStopTime, better: 'lower' },
  { key: 'reboundTime', group: 'package', label: 'Time on the rebound stop', unit: 's', value: (r) => m(r).reboundStopTime, better: 'lower' },

  { key: 'velRms', group: 'damper', label: 'Piston velocity RMS', unit: 'mmps', value: (r) => m(r).damperVelocityRms, better: 'unranked' },
  { key: 'bandLow', group: 'damper', label: 'Time in the low-speed band', unit: 'percent', value: (r) => m(r).damperVelocityBands.low, better: 'unranked' },
  { key: 'bandMid', group: 'damper', label: 'Time in the mid-speed band', unit: 'percent', value: (r) => m(r).damperVelocityBands.mid, better: 'unranked' },
  { key: 'bandHigh', group: 'damper', label: 'Time in the high-speed band', unit: 'percent', value: (r) => m(r).damperVelocityBands.high, better: 'unranked' },
  { key: 'compShare', group: 'damper', label: 'Time moving in compression', unit: 'percent', value: (r) => m(r).damperVelocityBands.compression, better: 'unranked' },
  { key: 'power', group: 'damper', label: 'Mean power dissipated', unit: 'W', value: (r) => m(r).damperPowerMean, better: 'unranked' },
  { key: 'energy', group: 'damper', label: 'Energy dissipated', unit: 'J', value: (r) => m(r).damperEnergy, better: 'unranked' },

  { key: 'bodyHz', group: 'modal', label: 'Body natural frequency', unit: 'Hz', value: (r) => r.modal.body.naturalHz, better: 'unranked' },
  { key: 'bodyZeta', group: 'modal', label: 'Body damping ratio', value: (r) => r.modal.body.dampingRatio, better: 'unranked' },
  { key: 'wheelHz', group: 'modal', label: 'Wheel-hop natural frequency', unit: 'Hz', value: (r) => r.modal.wheel.naturalHz, better: 'unranked' },
  { key: 'wheelZeta', group: 'modal', label: 'Wheel-hop damping ratio', value: (r) => r.modal.wheel.dampingRatio, better: 'unranked' },
];

/** Comfort rows an event road leads with: peak, VDV, MTVV, settling time; the RMS figures follow. */
const eventLead = ['accelPeak', 'wkPeak', 'vdv', 'mtvv', 'settle'];

/**
 * The rows in the order a set of runs is read: when every run is over a single event (bump,
 * pothole, kerb), the event figures come first in the comfort group.
 */
export function rowsFor(results: readonly RunResult[]): FigureRow[] {
  if (results.length === 0 || !results.every((r) => isEventRoad(r.road.kind))) return figureRows;
  const rank = (row: FigureRow) => (row.group !== 'comfort' ? 2 : eventLead.includes(row.key) ? 0 : 1);
  const first = figureRows.filter((row) => rank(row) === 0).sort((a, b) => eventLead.indexOf(a.key) - eventLead.indexOf(b.key));
  return [...first, ...figureRows.filter((row) => rank(row) === 1), ...figureRows.filter((row) => rank(row) === 2)];
}

export const rowByKey = (key: string): FigureRow => {
  const row = figureRows.find((r) => r.key === key);
  if (!row) throw new Error(`no figure row ${key}`);
  return row;
};

/**
 * How much better than every other run a figure must be to be called best: 1 % of the larger
 * of the two. Below that a difference is within what a change of road seed or step size moves
 * (common practice for comparing simulated figures), so naming a winner would mislead.
 */
export const BEST_MARGIN = 0.01;

/**
 * Index of the best value among runs for a ranked row; null when the row is unranked, fewer than
 * two values exist, or the best does not beat the runner-up by more than `BEST_MARGIN`.
 */
export function bestIndex(row: FigureRow, values: (number | undefined)[], margin = BEST_MARGIN): number | null {
  if (row.better === 'unranked') return null;
  const present = values.map((v, i) => [v, i] as const).filter((p): p is readonly [number, number] => p[0] !== undefined && Number.isFinite(p[0]));
  if (present.length < 2) return null;
  const sign = row.better === 'lower' ? 1 : -1;
  const ranked = [...present].sort((a, b) => sign * (a[0] - b[0]));
  const [best, runnerUp] = ranked as [readonly [number, number], readonly [number, number]];
  const scale = Math.max(Math.abs(best[0]), Math.abs(runnerUp[0]));
  if (!(Math.abs(runnerUp[0] - best[0]) > margin * scale)) return null;
  return best[1];
}

/** A row's display unit: piston velocities and travels follow the person's chosen units when given. */
export function displayUnitOf(row: Pick<FigureRow, 'unit'>, chosen?: ChosenUnits): DisplayUnit | undefined {
  if (!row.unit) return undefined;
  if (chosen && row.unit === 'mmps') return chosen.damperVelocity;
  if (chosen && row.unit === 'mm') return chosen.length;
  return units[row.unit];
}
