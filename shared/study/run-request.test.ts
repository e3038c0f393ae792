import { describe, expect, it } from 'vitest';
import { RunRequest } from '../schemas/run.ts';
import { Setup } from '../schemas/setup.ts';
import { Road } from '../schemas/road.ts';
import { resolveStudyRoads, studyRunRequest } from './run-request.ts';

const setup = Setup.parse({
  name: 'Brume Skerry front',
  sprungMass: 260,
  unsprungMass: 32,
  springRate: 45000,
  tyreRate: 240000,
  damper: { compression: [[0.1, 300]], rebound: [[0.1, 700]] },
});
const bump = Road.parse({ kind: 'bump', height: 0.05, length: 0.5, at: 5 });
const iso = Road.parse({ kind: 'iso8608', class: 'B', seed: 4 });

describe('study run requests', () => {
  it('resolves library roads and names the missing ones', () => {
    const def = { roads: [{ source: 'inline' as const, road: iso }, { source: 'library' as const, roadId: 'r-bump' }, { source: 'library' as const, roadId: 'gone' }] };
    expect(resolveStudyRoads(def, (id) => (id === 'r-bump' ? bump : undefined))).toEqual({ ok: false, missing: ['gone'] });
    expect(resolveStudyRoads({ roads: def.roads.slice(0, 2) }, () => bump)).toEqual({ ok: true, roads: [iso, bump] });
  });

  it('builds a valid run request carrying the job’s road, speed and seed', () => {
    const req = studyRunRequest({ duration: 30, settleTime: 3 }, { id: 0, pointIndex: 0, roadIndex: 1, speed: 22, seed: 8 }, setup, [bump, iso]);
    expect(RunRequest.safeParse(req).success).toBe(true);
    expect(req).toMatchObject({ road: iso, speed: 22, duration: 30, settleTime: 3, seed: 8 });
  });
});
