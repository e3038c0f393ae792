/**
 * Headless runner: one corner, or a whole vehicle in the pitch plane, over one road, the same
 * code the browser workers run.
 *
 *   npm run --silent sim -- --setup S.json --road R.json --speed 20 --duration 60
 *                           [--seed 7] [--traces out.csv] [--rate 500]
 *                           [--integrator rk4|odex] [--tolerance 1e-4 (odex)]
 *   npm run --silent sim -- --vehicle V.json --road R.json --speed 20 --duration 60
 *                           [--seed 7] [--rate 500]
 *
 * A vehicle file may name its front and rear setup files instead of holding them
 * ("front": "pipit-front.setup.json"); paths are relative to the vehicle file.
 *
 * Prints exactly one JSON object on stdout (modal figures, metrics, road, timing). Exit status:
 * 0 done, 2 bad input (the message on stderr names the field, file or CSV line), 1 the
 * simulation itself failed.
 *
 * A measured road file may name a CSV file instead of listing points:
 *   { "kind": "measured", "csv": "lane.csv", "elevationUnit": "mm", "detrend": "linear" }
 * The path is relative to the road file; units come from the CSV header or these keys.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { parseArgs } from 'node:util';
import { IntegratorName } from '../shared/schemas/run.ts';
import { parseMeasuredCsv, type LengthUnit } from '../shared/sim/roads/measured-csv.ts';
import { runCorner } from '../shared/sim/run-corner.ts';
import { runVehicle } from '../shared/sim/vehicle/run-vehicle.ts';
import type { TraceColumns } from '../shared/sim/trace.ts';

class InputError extends Error {}

function readJson(path: string, what: string): unknown {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch {
    throw new InputError(`--${what}: cannot read ${path}`);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new InputError(`--${what}: ${path} is not valid JSON (${(e as Error).message})`);
  }
}

function numberArg(value: string | undefined, name: string, required: boolean): number | undefined {
  if (value === undefined) {
    if (required) throw new InputError(`--${name} is required`);
    return undefined;
  }
  const n = Number(value);
  if (value.trim() === '' || !Number.isFinite(n)) throw new InputError(`--${name}: "${value}" is not a number`);
  return n;
}

/** Replaces a measured road's `csv` reference by the points read from that file. */
function resolveCsvRoad(road: unknown, roadPath: string): unknown {
  if (typeof road !== 'object' || road === null || !('csv' in road)) return road;
  const { csv, elevationUnit, distanceUnit, ...rest } = road as Record<string, unknown>;
  if (typeof csv !== 'string') throw new InputError('road.csv: must be a file path');
  const unit = (u: unknown, field: string): LengthUnit | undefined => {
    if (u === undefined) return undefined;
    if (u === 'm' || u === 'mm') return u;
    throw new InputError(`road.${field}: must be "m" or "mm"`);
  };
  const csvPath = resolve(dirname(roadPath), csv);
  let text: string;
  try {
    text = readFileSync(csvPath, 'utf8');
  } catch {
    throw new InputError(`road.csv: cannot read ${csvPath}`);
  }
  const parsed = parseMeasuredCsv(text, { elevationUnit: unit(elevationUnit, 'elevationUnit'), distanceUnit: unit(distanceUnit, 'distanceUnit') });
  if (!parsed.ok) throw new InputError(`road.csv ${csv}: ${parsed.reason}`);
  return { ...rest, points: parsed.profile.points };
}

function writeTraces(path: string, trace: TraceColumns) {
  const cols: Array<[string, Float64Array]> = [
    ['road_m', trace.road],
    ['body_accel_m_s2', trace.bodyAccel],
    ['travel_m', trace.travel],
    ['tyre_load_N', trace.tyreLoad],
    ['damper_velocity_m_s', trace.damperVelocity],
    ['damper_force_N', trace.damperForce],
    ['bump_stop_force_N', trace.bumpStopForce],
    ['rebound_stop_force_N', trace.reboundStopForce],
  ];
  const lines = [['time_s', ...cols.map(([n]) => n)].join(',')];
  for (let i = 0; i < trace.bodyAccel.length; i++) {
    lines.push([(i * trace.dt).toFixed(6), ...cols.map(([, c]) => c[i].toPrecision(9))].join(','));
  }
  writeFileSync(path, lines.join('\n') + '\n');
}

/** Replaces a vehicle file's front/rear setup paths by the setups read from them. */
function resolveVehicleSetups(vehicle: unknown, vehiclePath: string): unknown {
  if (typeof vehicle !== 'object' || vehicle === null) return vehicle;
  const out: Record<string, unknown> = { ...(vehicle as Record<string, unknown>) };
  for (const end of ['front', 'rear']) {
    if (typeof out[end] === 'string') out[end] = readJson(resolve(dirname(vehiclePath), out[end] as string), 'vehicle');
  }
  return out;
}

function mainVehicle(values: Record<string, string | undefined>): number {
  if (values.setup) throw new InputError('give --setup or --vehicle, not both');
  if (values.traces || values.integrator || values.tolerance) throw new InputError('--traces, --integrator and --tolerance apply to corner runs only');
  if (!values.road) throw new InputError('--road is required');
  const vehicle = resolveVehicleSetups(readJson(values.vehicle!, 'vehicle'), values.vehicle!);
  const road = resolveCsvRoad(readJson(values.road, 'road'), values.road);
  const outcome = runVehicle({
    vehicle: vehicle as never,
    road: road as never,
    speed: numberArg(values.speed, 'speed', true)!,
    duration: numberArg(values.duration, 'duration', true)!,
    seed: numberArg(values.seed, 'seed', false),
    outputRate: numberArg(values.rate, 'rate', false),
  });
  if (!outcome.ok) {
    process.stderr.write(`sim: ${outcome.reason}\n`);
    return outcome.stage === 'input' ? 2 : 1;
  }
  const { result } = outcome;
  const report = {
    vehicle: result.vehicleName,
    speed: result.speed,
    duration: result.duration,
    settleTime: result.settleTime,
    wheelbaseDelay: result.wheelbaseDelay,
    road: result.road,
    linear: result.linear,
    figures: result.figures,
    timing: result.timing,
  };
  process.stdout.write(JSON.stringify(report, null, 2) + '\n');
  return 0;
}

function main(argv: string[]): number {
  const { values } = parseArgs({
    args: argv,
    options: {
      setup: { type: 'string' },
      vehicle: { type: 'string' },
      road: { type: 'string' },
      speed: { type: 'string' },
      duration: { type: 'string' },
      seed: { type: 'string' },
      traces: { type: 'string' },
      tolerance: { type: 'string' },
      integrator: { type: 'string' },
      rate: { type: 'string' },
    },
    strict: true,
    allowPositionals: false,
  });
  if (values.vehicle) return mainVehicle(values);
  if (!values.setup) throw new InputError('--setup is required (or --vehicle for a whole vehicle)');
  if (!values.road) throw new InputError('--road is required');
  const setup = readJson(values.setup, 'setup');
  const road = resolveCsvRoad(readJson(values.road, 'road'), values.road);

  const integrator = values.integrator;
  if (integrator !== undefined && !IntegratorName.options.includes(integrator as IntegratorName)) {
    throw new InputError(`--integrator: "${integrator}" is not one of ${IntegratorName.options.join(', ')}`);
  }
  const outcome = runCorner({
    // Shapes are checked inside runCorner, which names the offending field.
    setup: setup as never,
    road: road as never,
    speed: numberArg(values.speed, 'speed', true)!,
    duration: numberArg(values.duration, 'duration', true)!,
    seed: numberArg(values.seed, 'seed', false),
    integrator: integrator as IntegratorName | undefined,
    tolerance: numberArg(values.tolerance, 'tolerance', false),
    outputRate: numberArg(values.rate, 'rate', false),
  });
  if (!outcome.ok) {
    process.stderr.write(`sim: ${outcome.reason}\n`);
    return outcome.stage === 'input' ? 2 : 1;
  }
  const { result, trace } = outcome;
  if (values.traces) writeTraces(values.traces, trace);
  const report = {
    setup: result.setupName,
    speed: result.speed,
    duration: result.duration,
    settleTime: result.settleTime,
    integrator: result.integrator,
    road: result.road,
    statics: result.statics,
    modal: result.modal,
    metrics: result.metrics,
    timing: result.timing,
  };
  process.stdout.write(JSON.stringify(report, null, 2) + '\n');
  return 0;
}

try {
  process.exitCode = main(process.argv.slice(2));
} catch (e) {
  if (e instanceof InputError || (e as { code?: string }).code?.startsWith('ERR_PARSE_ARGS')) {
    process.stderr.write(`sim: ${(e as Error).message}\n`);
    process.exitCode = 2;
  } else {
    throw e;
  }
}
