import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runStudyHere } from '../shared/study/run-all.ts';
import { studyBestCompromise, studyTradeOff } from '../shared/study/study-compromise.ts';
import { readStudyFile } from './study-input.ts';

const root = resolve(__dirname, '..');
const tmp = mkdtempSync(join(tmpdir(), 'ridewright-study-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

/** Runs the CLI as `npm run study` does (tsx), from the repository root. */
function study(...args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'cli/study.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 120_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}
const file = (name: string, value: unknown) => {
  const p = join(tmp, name);
  writeFileSync(p, typeof value === 'string' ? value : JSON.stringify(value, null, 2));
  return p;
};

const smallStudy = {
  baseSetup: resolve(root, 'examples/pipit-front.setup.json'),
  study: {
    name: 'Three by three',
    axes: [
      { parameter: 'damperScale', from: 0.7, to: 1.3, steps: 3 },
      { parameter: 'tyreRate', from: 200000, to: 300000, steps: 3 },
    ],
    roads: [{ source: 'file', path: resolve(root, 'examples/iso-c.road.json') }],
    speeds: [20],
    duration: 5,
    objectives: [
      { figure: 'bodyAccelWkRms', weight: 1 },
      { figure: 'tyreLoadRatio', weight: 2 },
    ],
    constraints: { maxStrokeUsed: 0.95 },
  },
};

// Each case starts a Node process with tsx and worker threads: allow for a slow, shared machine (no timing is asserted).
describe('npm run study', { timeout: 180_000 }, () => {
  it('gives every figure of a 3 × 3 study exactly as the shared study code run in-process', () => {
    const path = file('small.study.json', smallStudy);
    const outPath = join(tmp, 'results.json');
    const r = study('--study', path, '--out', outPath, '--threads', '2');
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(JSON.parse(readFileSync(outPath, 'utf8'))).toEqual(out);

    const input = readStudyFile(path);
    const here = runStudyHere(input.definition, input.baseSetup, input.roads);
    // Through JSON as the CLI's answer went, so both sides are compared as printed.
    const expected = JSON.parse(
      JSON.stringify({ points: here.points, base: here.base, front: studyTradeOff(input.definition, here.points, here.base), bestCompromise: studyBestCompromise(input.definition, here.points, undefined, here.base) }),
    );
    expect(out.points).toHaveLength(9);
    expect(out.runs).toBe(10); // 9 points and the base setup, one road, one speed
    expect(out.points.every((p: { runs: { figures: unknown }[] }) => p.runs.every((run) => run.figures !== null))).toBe(true);
    expect(out.points).toEqual(expected.points);
    expect(out.base).toEqual(expected.base);
    expect(out.front).toEqual(expected.front);
    expect(out.bestCompromise).toEqual(expected.bestCompromise);
    expect(out.bestCompromise.ok).toBe(true);
  });

  it('answers a bad definition with exit 2, naming the field', () => {
    const bad = { ...smallStudy, study: { ...smallStudy.study, axes: [{ parameter: 'damperScale', from: 0.7, to: 1.3, steps: 0 }] } };
    const r = study('--study', file('bad-steps.study.json', bad));
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/study\.axes\.0\.steps/);
  });

  it('answers broken JSON with exit 2, naming the line', () => {
    const r = study('--study', file('broken.study.json', '{\n  "baseSetup": "x.json",\n  "study": { "name": "oops", }\n}\n'));
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/line 3/);
  });

  it('names the road file and field of a bad road', () => {
    const roadPath = file('bad.road.json', { kind: 'iso8608', class: 'Z' });
    const bad = { ...smallStudy, study: { ...smallStudy.study, roads: [{ source: 'file', path: roadPath }] } };
    const r = study('--study', file('bad-road.study.json', bad));
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/study\.roads\.0 \(.*bad\.road\.json\)\.class/);
  });
});
