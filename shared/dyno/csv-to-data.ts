import type {
  DynoIssue,
  DynoLayout,
  DynoParseOptions,
  DynoPeakPoints,
  DynoPoint,
  DynoTimeSeries,
  DynoUnitsUsed,
} from '../schemas/dyno.ts';
import type { ColumnRole } from './csv-header.ts';
import { directionSanityWarning } from './peak-points.ts';

/** Numbers read from the used columns, row by row (NaN for an allowed blank). */
export interface Columns {
  lines: number[];
  values: Map<ColumnRole, number[]>;
  directions: ('compression' | 'rebound')[];
}

const toSi = { 'm/s': 1, 'mm/s': 1e-3, N: 1, kN: 1e3, m: 1, mm: 1e-3, s: 1, ms: 1e-3 } as const;
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

/**
 * Splits peak rows into directions as magnitudes. Signed rows use the sign conventions; rows with
 * an explicit direction or per-direction force columns take magnitudes. Gas force: the reading is
 * damping + gas in compression and damping − gas in rebound, so it is taken off and added back.
 */
export function buildPeaks(cols: Columns, layout: DynoLayout, units: DynoUnitsUsed, opts: DynoParseOptions, warnings: DynoIssue[]): DynoPeakPoints {
  const vs = toSi[units.velocity!.unit];
  const fs = toSi[units.force.unit];
  const gas = opts.gasForce;
  const out: DynoPeakPoints = { compression: [], rebound: [] };
  const lineOf = new Map<DynoPoint, number>();
  const add = (dir: 'compression' | 'rebound', p: DynoPoint, line: number) => {
    out[dir].push(p);
    lineOf.set(p, line);
  };
  const vel = cols.values.get('velocity')!;
  let zeroRows = 0;
  cols.lines.forEach((line, i) => {
    const v = Math.abs(vel[i]) * vs;
    if (layout === 'direction-column') {
      const f = Math.abs(cols.values.get('force')![i]) * fs;
      const dir = cols.directions[i];
      add(dir, { velocity: v, force: dir === 'compression' ? f - gas : f + gas }, line);
    } else if (layout === 'force-per-direction') {
      const fc = cols.values.get('compressionForce')?.[i];
      const fr = cols.values.get('reboundForce')?.[i];
      if (fc !== undefined && !Number.isNaN(fc)) add('compression', { velocity: v, force: Math.abs(fc) * fs - gas }, line);
      if (fr !== undefined && !Number.isNaN(fr)) add('rebound', { velocity: v, force: Math.abs(fr) * fs + gas }, line);
    } else {
      const sv = vel[i] * vs * signOf(opts.motionSign);
      const sf = cols.values.get('force')![i] * fs * signOf(opts.forceSign) - gas;
      if (sv > 0) add('compression', { velocity: sv, force: sf }, line);
      else if (sv < 0) add('rebound', { velocity: -sv, force: -sf }, line);
      else zeroRows++;
    }
  });
  if (zeroRows) warnings.push({ message: `${zeroRows} row${zeroRows === 1 ? '' : 's'} at zero velocity skipped (no direction)` });
  for (const dir of ['compression', 'rebound'] as const) {
    out[dir].sort((a, b) => a.velocity - b.velocity);
    const against = out[dir].filter((p) => p.force < 0);
    if (layout === 'signed' && against.length > out[dir].length / 2) {
      warnings.push({ message: `most ${dir} points have the force helping the motion; force and velocity seem to use opposite sign conventions` });
    } else {
      for (const p of against.slice(0, 5)) {
        warnings.push({ line: lineOf.get(p), message: `${dir} force ${fmt(p.force)} N at ${fmt(p.velocity)} m/s is below zero${gas ? ' after removing the gas force' : ''}` });
      }
    }
  }
  if (layout === 'signed') {
    const w = directionSanityWarning(out.compression, out.rebound);
    if (w) warnings.push({ message: w });
  }
  return out;
}

const fmt = (x: number) => Number(x.toPrecision(4)).toString();
