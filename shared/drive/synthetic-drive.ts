import seedrandom from 'seedrandom';
import { commentText, writeCsv } from '../csv/write-csv.ts';
import type { DriveData } from '../schemas/drive.ts';
import type { Setup } from '../schemas/setup.ts';
import { generateIso8608Profile } from '../sim/roads/iso8608.ts';
import { type IsoClass, Iso8608Road, type MeasuredRoad } from '../schemas/road.ts';
import { elevationExcitation, roadFromProfile } from './drive-road.ts';
import { rms } from './fit-figures.ts';
import { simulateDrive } from './simulate-drive.ts';

/** An invented measured profile: an ISO 8608 road of a class and seed written out as points every `spacing` m. */
export function syntheticProfile(name: string, isoClass: IsoClass, seed: number, length = 1024, spacing = 0.05): MeasuredRoad {
  const iso = generateIso8608Profile(Iso8608Road.parse({ kind: 'iso8608', name, class: isoClass, seed, length }));
  const every = Math.max(1, Math.round(spacing / iso.dx));
  const points: [number, number][] = [];
  for (let i = 0; i < iso.z.length; i += every) points.push([i * iso.dx, iso.z[i]]);
  return { kind: 'measured', name, points: points as MeasuredRoad['points'], detrend: 'none' };
}

export interface SyntheticDriveOptions {
  setup: Setup;
  road: MeasuredRoad;
  duration: number;
  /** Samples per second, Hz. */
  rate: number;
  /** Mean speed and the swing about it (a slow sine over the drive), m/s. */
  speed: number;
  speedSwing?: number;
  /** Noise added to each signal, as a fraction of its RMS (Gaussian, seeded). */
  noise: number;
  seed: number;
}

export type SyntheticOutcome = { ok: true; data: DriveData } | { ok: false; reason: string };

/**
 * A drive made by the model itself: the corner over the profile at a varying speed, integrated
 * with the reference integrator (odex at 1e-8, so the fit's own integrator is not simply run
 * backwards), with seeded Gaussian noise on every signal. Used by the checks and the example.
 */
export function syntheticDrive(o: SyntheticDriveOptions): SyntheticOutcome {
  const dt = 1 / o.rate;
  const n = Math.floor(o.duration * o.rate + 1e-9) + 1;
  const swing = o.speedSwing ?? 0;
  const speed = Array.from({ length: n }, (_, i) => o.speed + swing * Math.sin((2 * Math.PI * i * dt) / o.duration));
  const skeleton: DriveData = { dt, speed, channels: {} };
  const road = roadFromProfile(skeleton, o.road, o.setup.tyreFootprint);
  if (!road.ok) return road;
  const sim = simulateDrive(o.setup, elevationExcitation(road.elevation, dt, road.method), n, dt, 'odex', 1e-8);
  if (!sim.ok) return sim;
  const random = seedrandom(`drive-noise:${String(o.seed)}`);
  const gauss = () => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
  const channels: DriveData['channels'] = {};
  for (const [key, clean] of Object.entries(sim.channels) as [keyof typeof sim.channels, Float64Array][]) {
    const sd = o.noise * rms(clean);
    channels[key] = Array.from(clean, (v) => v + sd * gauss());
  }
  return { ok: true, data: { dt, speed, channels } };
}

/** A drive as a log file: speed in km/h, body acceleration in g, wheel acceleration in m/s², travels in mm. */
export function driveCsv(data: DriveData, comment: string): string {
  const c = data.channels;
  const cols: { header: string; values: number[] | undefined; factor: number; digits: number }[] = [
    { header: 'speed [km/h]', values: data.speed, factor: 3.6, digits: 2 },
    { header: 'body accel [g]', values: c.bodyAccel, factor: 1 / 9.81, digits: 5 },
    { header: 'wheel accel [m/s^2]', values: c.wheelAccel, factor: 1, digits: 3 },
    { header: 'damper travel [mm]', values: c.damperTravel, factor: 1000, digits: 3 },
    { header: 'wheel travel [mm]', values: c.wheelTravel, factor: 1000, digits: 3 },
  ];
  const kept = cols.filter((col) => col.values);
  const rows = data.speed.map((_, i) => [Number((i * data.dt).toFixed(6)), ...kept.map((col) => Number(((col.values as number[])[i] * col.factor).toFixed(col.digits)))]);
  return `# ${commentText(comment)}\n${writeCsv(rows, ['time [s]', ...kept.map((col) => col.header)])}\n`;
}
