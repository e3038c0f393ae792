import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { RoadInput } from '../../../../shared/schemas/road.ts';
import type { RunRequestInput } from '../../../../shared/schemas/run.ts';
import type { SetupInput } from '../../../../shared/schemas/setup.ts';
import { simulateJob } from '../../../../shared/runs/simulate-job.ts';
import { fromStoredTraces, toStoredTraces } from '../../../../shared/runs/stored-run.ts';
import { tracesCsv } from './export-csv.ts';
import { rerunNote } from './full-rate-trace.ts';

const example = <T>(name: string): T => JSON.parse(readFileSync(new URL(`../../../../examples/${name}`, import.meta.url), 'utf8'));

// What a saved run keeps: its request; traces thinned to bucket extremes for storage.
const request: RunRequestInput = { setup: example<SetupInput>('pipit-front.setup.json'), road: example<RoadInput>('iso-c.road.json'), speed: 60 / 3.6, duration: 12, seed: 7 };

const steps = (times: number[]) => times.slice(1).map((t, i) => t - times[i]);

describe('full-rate trace export', () => {
  const first = simulateJob(request, { spectra: false, response: false });
  if (!first.ok) throw new Error(first.reason);

  it('the stored traces alone are not evenly spaced (why a saved run is run again)', () => {
    const stored = toStoredTraces(first.trace, first.result.settleTime);
    expect(stored.method).toBe('bucket-extremes');
    const read = fromStoredTraces(stored);
    if (!read.ok) throw new Error(read.reason);
    const dts = steps([...read.columns.time]);
    expect(Math.max(...dts) - Math.min(...dts)).toBeGreaterThan(1e-4);
  });

  it('runs the stored inputs again at the asked rate: every sample, evenly spaced, rate in the header, same figures', () => {
    const again = simulateJob({ ...request, outputRate: 1000 }, { spectra: false, response: false });
    if (!again.ok) throw new Error(again.reason);
    const csv = tracesCsv(again.trace, 'Pipit front r3 · class C · 60 km/h');
    const lines = csv.split('\n');
    expect(lines[0]).toBe('# Pipit front r3 · class C · 60 km/h');
    expect(lines[1]).toMatch(/^# sample rate 1000 Hz: every computed sample, evenly spaced 0\.001 s apart$/);
    const rows = Papa.parse<string[]>(lines.slice(2).join('\n'), { header: false, skipEmptyLines: true }).data;
    expect(rows[0][0]).toBe('time_s');
    const times = rows.slice(1).map((r) => Number(r[0]));
    expect(times).toHaveLength(again.trace.bodyAccel.length);
    expect(times.length).toBeGreaterThanOrEqual(12 * 1000);
    for (const dt of steps(times)) expect(dt).toBeCloseTo(0.001, 12);
    // each time stamp is written as a plain multiple of the step, no float noise
    expect(rows[4][0]).toBe('0.003');
  });

  it('a run of the stored inputs gives back exactly the stored figures (the simulation is deterministic)', () => {
    const again = simulateJob(request, { spectra: false, response: false });
    if (!again.ok) throw new Error(again.reason);
    expect(again.result.metrics).toEqual(first.result.metrics);
    expect(rerunNote(first.result, again.result)).toMatch(/^computed again from the stored inputs: .* m\/s² \(stored run .* m\/s², the same\)$/);
  });
});
