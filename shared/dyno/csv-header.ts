import type { DisplacementUnit, ForceUnit, TimeUnit, VelocityUnit } from '../schemas/dyno.ts';

/** What a header cell can mean. */
export type ColumnRole =
  | 'time'
  | 'displacement'
  | 'velocity'
  | 'force'
  | 'direction'
  | 'compressionForce'
  | 'reboundForce';

/** The unit families a role accepts (direction takes none). */
type UnitOf = {
  time: TimeUnit;
  displacement: DisplacementUnit;
  velocity: VelocityUnit;
  force: ForceUnit;
  compressionForce: ForceUnit;
  reboundForce: ForceUnit;
};

/** One header cell, read. */
export interface HeaderCell {
  /** As written, trimmed. */
  raw: string;
  /** Lower case, separators folded to single spaces, unit removed. */
  name: string;
  /** Unit token as written in the header (trimmed), if any. */
  unitText?: string;
  role?: ColumnRole;
}

const unitTokens: Record<string, string> = {
  's': 's', 'sec': 's', 'ms': 'ms',
  'm': 'm', 'mm': 'mm',
  'in': 'in', 'inch': 'in',
  'm/s': 'm/s', 'mm/s': 'mm/s', 'm s-1': 'm/s', 'mm s-1': 'mm/s',
  'in/s': 'in/s', 'in s-1': 'in/s', 'inch/s': 'in/s',
  'n': 'N', 'kn': 'kN', 'lbf': 'lbf',
};

const allowed: { [R in keyof UnitOf]: readonly UnitOf[R][] } = {
  time: ['s', 'ms'],
  displacement: ['m', 'mm', 'in'],
  velocity: ['m/s', 'mm/s', 'in/s'],
  force: ['N', 'kN', 'lbf'],
  compressionForce: ['N', 'kN', 'lbf'],
  reboundForce: ['N', 'kN', 'lbf'],
};

const compressionWords = ['compression', 'comp', 'bump'];
const reboundWords = ['rebound', 'reb', 'extension', 'ext'];

function roleOf(name: string): ColumnRole | undefined {
  const words = name.split(' ');
  const has = (list: string[]) => words.some((w) => list.includes(w));
  if (['time', 't'].includes(name)) return 'time';
  if (['displacement', 'disp', 'position', 'pos', 'stroke', 'travel', 'x', 'rod position'].includes(name)) return 'displacement';
  if (['direction', 'dir'].includes(name)) return 'direction';
  const velocityish = has(['velocity', 'vel', 'speed']) || name === 'v';
  const forceish = has(['force', 'load']) || name === 'f';
  if (velocityish && !forceish) return 'velocity';
  if (has(compressionWords) && (forceish || words.length === 1)) return 'compressionForce';
  if (has(reboundWords) && (forceish || words.length === 1)) return 'reboundForce';
  if (forceish) return 'force';
  return undefined;
}

/**
 * Splits `velocity [mm/s]`, `force (kN)`, `time_ms`, `Force N` into a name and a unit token.
 * Brackets win; otherwise a known unit as the last word.
 */
export function readHeaderCell(raw: string): HeaderCell {
  const text = raw.trim().replace(/^\uFEFF/, '');
  let unitText: string | undefined;
  let rest = text;
  const bracket = /^(.*?)[[(]([^\])]*)[\])]\s*$/.exec(text);
  if (bracket) {
    rest = bracket[1];
    unitText = bracket[2].trim();
  }
  let name = rest.toLowerCase().replace(/[_\-.:]+/g, ' ').replace(/\s+/g, ' ').trim();
  if (unitText === undefined) {
    // Without brackets, only a trailing token that is certainly a unit (so "x" stays a name);
    // `velocity_mm_s` is read as mm/s, the underscore standing for the slash.
    const perSecond = /^(.*\S) (mm|m|in) s$/.exec(name);
    const last = /^(.*\S)\s+(\S+)$/.exec(name);
    if (perSecond && roleOf(perSecond[1]) === 'velocity') {
      name = perSecond[1];
      unitText = `${perSecond[2]}/s`;
    } else if (last && unitTokens[last[2]] !== undefined && roleOf(last[1]) !== undefined) {
      name = last[1];
      unitText = rest.trim().slice(rest.trim().length - last[2].length);
    }
  }
  return { raw: text, name, unitText, role: roleOf(name) };
}

/**
 * The unit a header token names for a role, `undefined` when the header gives none, or an error
 * message when the token is not a unit this role accepts.
 */
export function unitForRole<R extends keyof UnitOf>(role: R, unitText: string | undefined): UnitOf[R] | undefined | { error: string } {
  if (unitText === undefined || unitText === '') return undefined;
  const token = unitTokens[unitText.toLowerCase().replace(/\s+/g, ' ')];
  const ok = allowed[role] as readonly string[];
  if (token !== undefined && ok.includes(token)) return token as UnitOf[R];
  return { error: `unit '${unitText}' is not accepted here; use ${ok.join(' or ')}` };
}
