import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Setup } from '../../../../shared/schemas/setup.ts';
import { runCorner } from '../../../../shared/sim/run-corner.ts';
import { runWarnings } from './warnings.ts';

const front = Setup.parse(JSON.parse(readFileSync(new URL('../../../../examples/pipit-front.setup.json', import.meta.url), 'utf8')));
const metricsOf = (speed: number, height: number) => {
  const run = runCorner({ setup: front, road: { kind: 'kerb', name: 'kerb', height, rampLength: 0.02, at: 2 }, speed, duration: 2 });
  if (!run.ok) throw new Error(run.reason);
  return run.result.metrics;
};

describe('run warnings', () => {
  it('say when the suspension hit the end of its stroke and when the damper ran past its table', () => {
    const warnings = runWarnings(metricsOf(10, 0.1));
    const keys = warnings.map((w) => w.key);
    expect(keys).toContain('end-of-stroke');
    expect(keys).toContain('beyond-table-compression');
    expect(warnings.find((w) => w.key === 'end-of-stroke')!.text).toMatch(/end of its stroke in compression: the hard limit took up to [\d.]+\s?kN and [\d.]+\s?J/);
    expect(warnings.find((w) => w.key === 'beyond-table-compression')!.text).toMatch(/the table ends at 1(\.0+)?\s?m\/s, so forces above it are extrapolated/);
  });

  it('stay quiet on a gentle kerb that keeps inside the stroke and the table', () => {
    const keys = runWarnings(metricsOf(2, 0.01)).map((w) => w.key);
    expect(keys).not.toContain('end-of-stroke');
    expect(keys).not.toContain('beyond-table-compression');
    expect(keys).not.toContain('beyond-table-rebound');
  });
});
