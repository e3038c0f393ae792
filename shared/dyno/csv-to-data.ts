import type {
  DynoIssue,
  DynoLayout,
  DynoParseOptions,
  DynoPeakPoints,
  DynoPoint,
  DynoTimeSeries,
  DynoUnitsUsed,
} from '../schemas/dyno.ts';
import { METERS_PER_INCH, NEWTONS_PER_POUND_FORCE } from '../units.ts';
import type { ColumnRole } from './csv-header.ts';
import { directionSanityWarning } from './peak-points.ts';

/** Numbers read from the used columns, row by row (NaN for an allowed blank). */
export interface Columns {
  lines: number[];
  values: Map<ColumnRole, number[]>;
  directions: ('compression' | 'rebound')[];
}

/** Factor from each unit a file may use to SI. */
const toSi = { 'm/s': 1, 'mm/s': 1e-3, 'in/s': METERS_PER_INCH, N: 1, kN: 1e3, lbf: NEWTONS_PER_POUND_FORCE, m: 1, mm: 1e-3, in: METERS_PER_INCH, s: 1, ms: 1e-3 } as const;
const signOf = (c: DynoParseOptions['motionSign']) => (c === 'extension-positive' ? -1 : 1);

/** Converts the columns of a raw record to SI, compression positive, gas force removed; checks time. */
export function buildSeries(cols: Columns, units: DynoUnitsUsed, opts: DynoParseOptions, errors: DynoIssue[]): DynoTimeSeries {
  const ts = toSi[units.time!.unit];
  const xs = toSi[units.displacement!.unit] * signOf(opts.motionSign);
  const fs = toSi[units.force.unit] * signOf(opts.forceSign);
  const time = cols.values.get('time')!.map((t) => t * ts);
  const displacement = cols.values.get('displacement')!.map((x) => x * xs);
  const force = cols.values.get('force')!.map((f) => f * fs - opts.gasForce);
  const vRaw = cols.values.get('velocity');
  const velocity = vRaw && units.velocity ? vRaw.map((v) => v * toSi[units.velocity!.unit] * signOf(opts.motionSign)) : undefined;
  for (let i = 1; i < time.length; i++) {
    if (!(time[i] > time[i - 1])) {
      const unit = units.time!.unit;
      errors.push({
        line: cols.lines[i],
        message: `time ${time[i] / ts} ${unit} is not after the previous row's ${time[i - 1] / ts} ${unit}; time must rise from row to row`,
      });
      if (errors.length > 40) break;
    }
  }
  return velocity ? { time, displacement, force, velocity } : { time, displacement, force };
}

/** The sign most non-zero readings of a column carry (+1 on a tie): the file's own convention for it. */
function usualSign(values: readonly number[]): 1 | -1 {
  let positive = 0;
  let negative = 0;
  for (const x of values) {
    if (x > 0) positive++;
    else if (x < 0) negative++;
  }
  return negative > positive ? -1 : 1;
}

/** Wrong-sign readings listed one by one before the rest are counted. */
const MAX_SIGN_WARNINGS = 5;

/**
 * Splits peak rows into directions. Signed rows use the sign conventions. Rows with an explicit
 * direction or per-direction force columns are read in the sign most of that direction's
 * readings carry (some files write rebound negative); a reading against that sign is kept as
 * measured (a force helping the motion) and reported with its line, never turned round quietly.
 * Gas force: the reading is damping + gas in compression and damping − gas in rebound, so it is
 * taken off and added back.
 */
export function buildPeaks(cols: Columns, layout: DynoLayout, units: DynoUnitsUsed, opts: DynoParseOptions, warnings: DynoIssue[]): DynoPeakPoints {
  const vs = toSi[units.velocity!.unit];
  const fs = toSi[units.force.unit];
  const gas = opts.gasForce;
  const out: DynoPeakPoints = { compression: [], rebound: [] };
  const lineOf = new Map<DynoPoint, number>();
  const wrongSign = new Map<DynoPoint, { raw: number; speed: number }>();
  const add = (dir: 'compression' | 'rebound', p: DynoPoint, line: number) => {
    out[dir].push(p);
    lineOf.set(p, line);
    return p;
  };
  const vel = cols.values.get('velocity')!;
  const force = cols.values.get('force');
  const fc = cols.values.get('compressionForce');
  const fr = cols.values.get('reboundForce');
  const signOfColumn = (values: number[] | undefined, keep: (i: number) => boolean = () => true) =>
    usualSign((values ?? []).filter((x, i) => keep(i) && !Number.isNaN(x)));
  const usual = {
    compression: layout === 'direction-column' ? signOfColumn(force, (i) => cols.directions[i] === 'compression') : signOfColumn(fc),
    rebound: layout === 'direction-column' ? signOfColumn(force, (i) => cols.directions[i] === 'rebound') : signOfColumn(fr),
  };
  /** A reading of a direction's own column, in that direction's sense; flagged when its sign is not the column's. */
  const addReading = (dir: 'compression' | 'rebound', raw: number, i: number) => {
    const v = Math.abs(vel[i]) * vs;
    const f = raw * usual[dir] * fs;
    const p = add(dir, { velocity: v, force: dir === 'compression' ? f - gas : f + gas }, cols.lines[i]);
    if (f < 0) wrongSign.set(p, { raw, speed: vel[i] });
  };
  let zeroRows = 0;
  cols.lines.forEach((line, i) => {
    if (layout === 'direction-column') addReading(cols.directions[i], force![i], i);
    else if (layout === 'force-per-direction') {
      if (fc !== undefined && !Number.isNaN(fc[i])) addReading('compression', fc[i], i);
      if (fr !== undefined && !Number.isNaN(fr[i])) addReading('rebound', fr[i], i);
    } else {
      const sv = vel[i] * vs * signOf(opts.motionSign);
      const raw = force![i];
      const sf = raw * fs * signOf(opts.forceSign);
      if (sv > 0) {
        const p = add('compression', { velocity: sv, force: sf - gas }, line);
        if (sf < 0) wrongSign.set(p, { raw, speed: vel[i] });
      } else if (sv < 0) {
        const p = add('rebound', { velocity: -sv, force: -sf + gas }, line);
        if (sf > 0) wrongSign.set(p, { raw, speed: vel[i] });
      } else zeroRows++;
    }
  });
  if (zeroRows) warnings.push({ message: `${zeroRows} row${zeroRows === 1 ? '' : 's'} at zero velocity skipped (no direction)` });
  const fu = units.force.unit;
  const vu = units.velocity!.unit;
  for (const dir of ['compression', 'rebound'] as const) {
    out[dir].sort((a, b) => a.velocity - b.velocity);
    const wrong = out[dir].filter((p) => wrongSign.has(p));
    if (layout === 'signed' && wrong.length > out[dir].length / 2) {
      warnings.push({ message: `most ${dir} points have the force helping the motion; force and velocity seem to use opposite sign conventions` });
      continue;
    }
    const others = layout === 'signed' ? '' : ` (the other ${dir} readings are ${usual[dir] > 0 ? 'positive' : 'negative'})`;
    for (const p of wrong.slice(0, MAX_SIGN_WARNINGS)) {
      const { raw, speed } = wrongSign.get(p)!;
      warnings.push({ line: lineOf.get(p), message: `${dir} force ${fmt(raw)} ${fu} at ${fmt(speed)} ${vu} has the wrong sign for its direction${others}; check this reading` });
    }
    if (wrong.length > MAX_SIGN_WARNINGS) warnings.push({ message: `… and ${wrong.length - MAX_SIGN_WARNINGS} more ${dir} readings with the wrong sign` });
    // a reading of the right sign that the gas force takes below zero
    for (const p of out[dir].filter((q) => q.force < 0 && !wrongSign.has(q)).slice(0, MAX_SIGN_WARNINGS)) {
      warnings.push({ line: lineOf.get(p), message: `${dir} force ${fmt(p.force)} N at ${fmt(p.velocity)} m/s is below zero after removing the gas force` });
    }
  }
  if (layout === 'signed') {
    const w = directionSanityWarning(out.compression, out.rebound);
    if (w) warnings.push({ message: w });
  }
  return out;
}

const fmt = (x: number) => Number(x.toPrecision(4)).toString();
