import { describe, expect, it } from 'vitest';
import type { FleetRunView } from './fleet.repository.ts';
import { progressOf, withSample } from './fleet-progress.ts';

const t0 = Date.parse('2026-03-02T10:00:00Z');
const row = (over: Partial<FleetRunView> = {}): FleetRunView => ({
  study_id: 's',
  workspace_id: 'w',
  generation: 1,
  state: 'running',
  chunk_units: 10,
  chunks: 10,
  units_total: 100,
  units_done: 40,
  runs_total: 1000,
  runs_done: 400,
  runs_at_start: 0,
  error: null,
  started_by: 'u',
  started_by_name: 'Ines Okafor',
  started_at: new Date(t0).toISOString(),
  updated_at: new Date(t0).toISOString(),
  finished_at: null,
  ...over,
});

describe('fleet progress', () => {
  it('takes the rate over the last seconds of readings, and the time left from it', () => {
    const samples = [0, 5000, 10_000].map((dt, i) => ({ at: t0 + 10_000 + dt, runs: 250 + 250 * i }));
    const p = progressOf(row(), t0 + 20_000, samples);
    expect(p.runsPerSecond).toBe(50);
    expect(p.secondsLeft).toBe(600 / 50);
  });

  it('falls back to the whole start when the readings span under five seconds, counting only runs of this start', () => {
    const p = progressOf(row({ runs_at_start: 200 }), t0 + 10_000, []);
    expect(p.runsPerSecond).toBe(20);
    expect(p.secondsLeft).toBe(30);
  });

  it('gives no time left once the run is over', () => {
    const p = progressOf(row({ state: 'cancelled', finished_at: new Date(t0 + 4000).toISOString() }), t0 + 60_000, []);
    expect(p.runsPerSecond).toBe(100);
    expect(p.secondsLeft).toBeNull();
  });

  it('keeps only the readings of the last window', () => {
    const kept = withSample([{ at: 0, runs: 0 }, { at: 10_000, runs: 10 }], { at: 25_000, runs: 20 });
    expect(kept.map((s) => s.at)).toEqual([10_000, 25_000]);
  });
});
