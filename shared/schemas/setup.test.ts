import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Road } from './road.ts';
import { Setup } from './setup.ts';

const dir = new URL('../../examples/', import.meta.url);
const read = (name: string) => JSON.parse(readFileSync(new URL(name, dir), 'utf8'));
const paths = (r: { success: boolean; error?: { issues: Array<{ path: PropertyKey[]; message: string }> } }) =>
  r.error?.issues.map((i) => `${i.path.join('.')}: ${i.message}`) ?? [];

describe('setup and road documents', () => {
  it('every example file parses', () => {
    const files = readdirSync(dir).filter((f) => f.endsWith('.json'));
    expect(files.length).toBeGreaterThanOrEqual(4);
    for (const f of files) {
      const doc = read(f);
      // A measured road may name a CSV file instead of holding its points: that form is read
      // by the command-line runner (cli/sim.ts), which turns it into points first.
      if ('csv' in doc) continue;
      const schema = f.endsWith('.setup.json') ? Setup : f.endsWith('.road.json') ? Road : null;
      if (!schema) continue;
      expect(paths(schema.safeParse(doc)), f).toEqual([]);
    }
  });

  it('fills the defaults: motion ratio 1 and no tyre damping', () => {
    const s = Setup.parse({ name: 'bare', sprungMass: 300, unsprungMass: 40, springRate: 25000, tyreRate: 200000, damper: { compression: [[1, 1500]], rebound: [[1, 3000]] } });
    expect(s.motionRatio).toBe(1);
    expect(s.tyreDamping).toBe(0);
  });

  it('names the field of each mistake', () => {
    const base = read('pipit-front.setup.json');
    const cases: Array<[object, string]> = [
      [{ ...base, sprungMass: 0 }, 'sprungMass'],
      [{ ...base, sprungmass: 300 }, ''],
      [{ ...base, damper: { ...base.damper, compression: [[0, 10], [0.1, 100]] } }, 'damper.compression.0.1'],
      [{ ...base, damper: { ...base.damper, rebound: [[0.1, 300], [0.2, 250]] } }, 'damper.rebound.1.1'],
      // an empty table is a field error, not a crash in the table checks (found by tests/fuzz)
      [{ ...base, damper: { ...base.damper, rebound: [] } }, 'damper.rebound'],
      [{ ...base, damper: { ...base.damper, gas: { pressure: 1e6 } } }, 'damper.gas.rodArea'],
      [{ ...base, damper: { ...base.damper, gas: { force: 200, polytropic: { volume: 1e-4, exponent: 1.6 } } } }, 'damper.gas.polytropic.exponent'],
      [{ ...base, bumpStop: { clearance: -0.01, law: { kind: 'polynomial', coefficients: [1e4] } } }, 'bumpStop.clearance'],
      [{ ...base, reboundStop: { clearance: 0.05, law: { kind: 'table', points: [[0.01, 500], [0.005, 900]] } } }, 'reboundStop.law.points.1.0'],
      [{ ...base, tyreRate: Number.NaN }, 'tyreRate'],
    ];
    for (const [doc, path] of cases) {
      const r = Setup.safeParse(doc);
      expect(r.success, path).toBe(false);
      expect(r.error!.issues.map((i) => i.path.join('.')), path).toContain(path);
    }
  });

  it('roads are told apart by kind and checked field by field', () => {
    expect(Road.parse({ kind: 'kerb', height: -0.1, rampLength: 0.05, at: 10 }).kind).toBe('kerb');
    const bad: Array<[object, string]> = [
      [{ kind: 'iso8608', class: 'J', seed: 1 }, 'class'],
      [{ kind: 'iso8608', class: 'C', seed: 1.5 }, 'seed'],
      [{ kind: 'iso8608', class: 'C', seed: 1, nMin: 2, nMax: 1 }, 'nMax'],
      [{ kind: 'sweep', amplitude: 0.01, velocityAmplitude: 0.1, startFrequency: 1, endFrequency: 20, duration: 10 }, 'amplitude'],
      [{ kind: 'measured', points: [[0, 0], [0, 1]] }, 'points.1.0'],
      [{ kind: 'bump', height: 0.05, length: 0, at: 3 }, 'length'],
      [{ kind: 'ramp' }, 'kind'],
    ];
    for (const [doc, path] of bad) {
      const r = Road.safeParse(doc);
      expect(r.success, path).toBe(false);
      expect(r.error!.issues.map((i) => i.path.join('.')), path).toContain(path);
    }
  });

  it('a top mount without damping needs rising damper tables', () => {
    const base = { name: 'm', sprungMass: 300, unsprungMass: 40, springRate: 25000, tyreRate: 200000, topMount: { rate: 1e6 } };
    const flat = Setup.safeParse({ ...base, damper: { compression: [[0.1, 500], [1, 500]], rebound: [[1, 3000]] } });
    expect(paths(flat)).toEqual([expect.stringMatching(/^topMount\.damping: a top mount without damping needs every damper table to rise/)]);
    expect(Setup.safeParse({ ...base, topMount: { rate: 1e6, damping: 300 }, damper: { compression: [[0.1, 500], [1, 500]], rebound: [[1, 3000]] } }).success).toBe(true);
  });
});
