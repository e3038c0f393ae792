import { Damper, type DamperCurve } from '../../../../shared/schemas/setup.ts';
import { type DisplayUnit, units } from '../../../lib/format.ts';
import { plainIssue, type Problem } from '../../../lib/plain-issue.ts';
import { siFromShown } from '../../../lib/units/unit-table.ts';

/**
 * What the points tables hold while someone types: text per cell, so "0." or an empty cell can
 * sit there without being thrown away. The damper is emitted only when every cell parses and
 * the whole damper passes the setup schema; until then the cells show what is wrong. Velocity
 * cells hold the person's chosen unit (`unit`, m/s when not given); the damper is always SI.
 */

export type Direction = 'compression' | 'rebound';
export const directions: readonly Direction[] = ['compression', 'rebound'];

export interface DraftRow {
  /** Stable key for React while rows are added and removed. */
  key: number;
  velocity: string;
  force: string;
}

export type DraftCurves = Record<Direction, DraftRow[]>;

/** Problems by cell: `errors[direction][row]` has a message per column. */
export type CellErrors = Record<Direction, Array<{ velocity?: string; force?: string }>>;

let nextKey = 1;
const newKey = () => nextKey++;

/** Short text for a number in a cell: enough digits to round-trip what a person would type. */
export function cellText(x: number): string {
  return Number(x.toPrecision(6)).toString();
}

export function draftFromCurve(curve: DamperCurve, unit: DisplayUnit = units.mps): DraftRow[] {
  return curve.map(([v, f]) => ({ key: newKey(), velocity: cellText(unit.fromSI(v)), force: cellText(f) }));
}

export function draftFromDamper(damper: Damper, unit: DisplayUnit = units.mps): DraftCurves {
  return { compression: draftFromCurve(damper.compression, unit), rebound: draftFromCurve(damper.rebound, unit) };
}

export function emptyRow(after?: DraftRow): DraftRow {
  if (!after) return { key: newKey(), velocity: '', force: '' };
  const v = Number(after.velocity);
  return { key: newKey(), velocity: Number.isFinite(v) ? cellText(v * 2) : '', force: after.force };
}

const readCell = (text: string): number | undefined => {
  const t = text.trim().replace(',', '.');
  if (t === '' || !/^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/.test(t)) return undefined;
  const x = Number(t);
  return Number.isFinite(x) ? x : undefined;
};

export type DraftOutcome = { ok: true; damper: Damper; errors: CellErrors } | { ok: false; errors: CellErrors; general: string[] };

const title = { compression: 'Compression', rebound: 'Rebound' } as const;

/** How a cell is named in messages: by the speed on its row when that reads ("Rebound force at 0.52 m/s"). */
function cellLabel(d: Direction, row: number, column: 'velocity' | 'force', speed: number | undefined): string {
  if (column === 'force' && speed !== undefined) return `${title[d]} force at ${Number(speed.toPrecision(4))} m/s`;
  return `${title[d]} ${column === 'force' ? 'force' : 'speed'}, point ${row + 1}`;
}

/** Every problem of the tables, one line each, for the save bar (the cells show the same words). */
export function draftProblems(outcome: DraftOutcome): Problem[] {
  if (outcome.ok) return [];
  const cells = directions.flatMap((d) =>
    outcome.errors[d].flatMap((e, row) =>
      (['velocity', 'force'] as const).flatMap((column) => {
        const message = e[column];
        return message ? [{ path: `damper.${d}.${row}.${column === 'velocity' ? 0 : 1}`, label: `${title[d]} point ${row + 1}`, message }] : [];
      }),
    ),
  );
  return [...cells, ...outcome.general.map((message, i) => ({ path: `damper.general.${i}`, label: 'Damper tables', message }))];
}

/**
 * Reads the tables into a damper (gas charge from `base`), with every problem placed on its
 * cell: text that is not a number, then the setup schema's own rules (speeds rising, force not
 * falling, nothing at rest).
 */
export function readDraft(draft: DraftCurves, base: Pick<Damper, 'gas'>, unit: DisplayUnit = units.mps): DraftOutcome {
  const errors: CellErrors = { compression: draft.compression.map(() => ({})), rebound: draft.rebound.map(() => ({})) };
  const general: string[] = [];
  const curves = {} as Record<Direction, [number, number][]>;
  let unreadable = false;
  for (const d of directions) {
    if (draft[d].length === 0) general.push(`${title[d]} table needs at least one point`);
    curves[d] = draft[d].map((row, i) => {
      const v = readCell(row.velocity);
      const f = readCell(row.force);
      const speedLabel = cellLabel(d, i, 'velocity', undefined);
      const forceLabel = cellLabel(d, i, 'force', v);
      if (v === undefined) errors[d][i].velocity = row.velocity.trim() === '' ? `${speedLabel} is empty: enter a speed in m/s` : `${speedLabel} must be a number in m/s`;
      if (f === undefined) errors[d][i].force = row.force.trim() === '' ? `${forceLabel} is empty: enter a force in N` : `${forceLabel} must be a number in N`;
      if (v === undefined || f === undefined) unreadable = true;
      return [v === undefined ? 0 : siFromShown(unit, v), f ?? 0];
    });
  }
  if (unreadable || general.length) return { ok: false, errors, general };
  const parsed = Damper.safeParse({ compression: curves.compression, rebound: curves.rebound, ...(base.gas ? { gas: base.gas } : {}) });
  if (parsed.success) return { ok: true, damper: parsed.data, errors };
  for (const issue of parsed.error.issues) {
    const [d, row, col] = issue.path;
    if ((d === 'compression' || d === 'rebound') && typeof row === 'number' && errors[d][row]) {
      const key = col === 0 ? 'velocity' : 'force';
      const label = cellLabel(d, row, key, curves[d][row][0]);
      errors[d][row][key] ??= plainIssue(issue, { label, unit: key === 'velocity' ? unit : units.N });
    } else {
      const label = d === 'compression' || d === 'rebound' ? `${title[d]} table` : 'Damper';
      general.push(plainIssue(issue, { label }));
    }
  }
  return { ok: false, errors, general };
}

/** True when the draft, read, is exactly `damper` (no re-seeding needed when the parent echoes our value). */
export function draftMatches(draft: DraftCurves, damper: Damper, unit: DisplayUnit = units.mps): boolean {
  const velocityOf = (text: string) => {
    const v = readCell(text);
    return v === undefined ? undefined : siFromShown(unit, v);
  };
  return directions.every(
    (d) => draft[d].length === damper[d].length && draft[d].every((row, i) => velocityOf(row.velocity) === damper[d][i][0] && readCell(row.force) === damper[d][i][1]),
  );
}
