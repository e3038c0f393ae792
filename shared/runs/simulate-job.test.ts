import { describe, expect, it } from 'vitest';
import type { SetupInput } from '../schemas/setup.ts';
import { runCorner } from '../sim/run-corner.ts';
import { simulateJob, transferablesOf } from './simulate-job.ts';

const setup: SetupInput = {
  name: 'Test corner',
  sprungMass: 300,
  unsprungMass: 40,
  springRate: 30000,
  tyreRate: 200000,
  damper: { compression: [[0.1, 120], [1, 600]], rebound: [[0.1, 300], [1, 1200]] },
};
const road = { kind: 'iso8608', class: 'C', seed: 3 } as const;

describe('simulateJob', () => {
  it('gives the figures runCorner gives, plus spectra and responses whose buffers can all be transferred', () => {
    const job = simulateJob({ setup, road, speed: 15, duration: 6 });
    const direct = runCorner({ setup, road, speed: 15, duration: 6 });
    expect(job.ok && direct.ok).toBe(true);
    if (!job.ok || !direct.ok) return;
    expect(job.result.metrics).toEqual(direct.result.metrics);
    expect(job.spectra?.freq.length).toBeGreaterThan(10);
    expect(job.response?.freq[0]).toBeCloseTo(0.1, 9);
    const buffers = transferablesOf(job);
    // 8 trace columns + 4 spectrum columns + 1 frequency grid + 3 × (gain, phase)
    expect(buffers.length).toBe(8 + 4 + 1 + 6);
    expect(new Set(buffers).size).toBe(buffers.length);
  });

  it('leaves out spectra and responses when asked', () => {
    const job = simulateJob({ setup, road, speed: 15, duration: 4 }, { spectra: false, response: false });
    expect(job.ok && job.spectra === null && job.response === null).toBe(true);
  });

  it('returns a bad request as a value naming the field', () => {
    const job = simulateJob({ setup: { ...setup, sprungMass: -1 }, road, speed: 15, duration: 4 });
    expect(job.ok).toBe(false);
    if (job.ok) return;
    expect(job.reason).toMatch(/^setup\.sprungMass/);
    expect(transferablesOf(job)).toEqual([]);
  });
});
