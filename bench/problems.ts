import { readFileSync } from 'node:fs';
import { Road, type RoadInput } from '../shared/schemas/road.ts';
import type { RunRequestInput } from '../shared/schemas/run.ts';
import { Setup, type SetupInput } from '../shared/schemas/setup.ts';
import type { VehicleSetupInput } from '../shared/schemas/vehicle-setup.ts';
import type { StudyRunContext, StudyRunJob } from '../shared/study/run-jobs.ts';

/** The reference problems: the Pipit front corner on ISO 8608 class C, seed 7, at 20 m/s. */
const example = <T>(name: string): T => JSON.parse(readFileSync(new URL(`../examples/${name}`, import.meta.url), 'utf8'));

export const nonLinearSetup = example<SetupInput>('pipit-front.setup.json');
export const linearSetup = example<SetupInput>('pipit-front-linear.setup.json');
export const isoC = example<RoadInput>('iso-c.road.json');
export const SPEED = 20;
export const DURATION = 60;

export const request = (setup: SetupInput, extra: Partial<RunRequestInput> = {}): RunRequestInput => ({
  setup,
  road: isoC,
  speed: SPEED,
  duration: DURATION,
  ...extra,
});

/** Damper scale × spring scale grid for the sweep benchmark (20 × 20 = 400 runs). */
export function sweepRequests(): RunRequestInput[] {
  const out: RunRequestInput[] = [];
  for (let i = 0; i < 20; i++) {
    for (let j = 0; j < 20; j++) {
      const damperScale = 0.6 + (1.4 * i) / 19;
      const springScale = 0.7 + (0.6 * j) / 19;
      const d = nonLinearSetup.damper;
      const scale = (c: typeof d.compression) => c.map(([v, f]) => [v, f * damperScale] as [number, number]);
      out.push(
        request({
          ...nonLinearSetup,
          name: `sweep ${i}/${j}`,
          springRate: (nonLinearSetup.springRate as number) * springScale,
          damper: { ...d, compression: scale(d.compression), rebound: scale(d.rebound) },
        }),
      );
    }
  }
  return out;
}

/** What every job of the study-path sweep shares (shared/study/run-jobs.ts): the corner, the road, the duration. */
export const studyContext = (): StudyRunContext => ({ base: Setup.parse(nonLinearSetup), roads: [Road.parse(isoC)], duration: DURATION });

/** The same 20 × 20 grid as study jobs (damper scale, spring rate at the spring), one road, one speed. */
export function sweepJobs(): StudyRunJob[] {
  const out: StudyRunJob[] = [];
  for (let i = 0; i < 20; i++) {
    for (let j = 0; j < 20; j++) {
      const damperScale = 0.6 + (1.4 * i) / 19;
      const springRate = (nonLinearSetup.springRate as number) * (0.7 + (0.6 * j) / 19);
      out.push({ pointIndex: i * 20 + j, values: { damperScale, springRate }, roadIndex: 0, speed: SPEED });
    }
  }
  return out;
}

/** The Pipit hatchback example with its corner files read in. */
export const vehicleRun = (): { vehicle: VehicleSetupInput } => ({
  vehicle: { ...example<VehicleSetupInput>('pipit.vehicle.json'), front: nonLinearSetup, rear: example<SetupInput>('pipit-rear.setup.json') },
});
