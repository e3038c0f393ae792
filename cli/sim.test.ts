import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

const root = resolve(__dirname, '..');
const tmp = mkdtempSync(join(tmpdir(), 'ridewright-sim-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

/** Runs the CLI as `npm run sim` does (tsx), from the repository root. */
function sim(...args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'cli/sim.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}
const file = (name: string, text: string) => {
  const p = join(tmp, name);
  writeFileSync(p, text);
  return p;
};

// Each case starts a Node process with tsx: allow for a slow, shared machine (no timing is asserted).
describe('npm run sim', { timeout: 60_000 }, () => {
  it('prints one JSON object with modal figures, metrics, road band and timing', () => {
    const r = sim('--setup', 'examples/pipit-front.setup.json', '--road', 'examples/iso-c.road.json', '--speed', '20', '--duration', '4', '--seed', '9', '--traces', join(tmp, 't.csv'));
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    for (const mode of ['body', 'wheel']) {
      expect(Object.keys(out.modal[mode]).sort()).toEqual(['dampedHz', 'dampingRatio', 'naturalHz']);
    }
    expect(out.modal.bodyUndampedHz).toBeGreaterThan(1);
    expect(out.modal.wheelUndampedHz).toBeGreaterThan(10);
    const needed = ['bodyAccelRms', 'bodyAccelWkRms', 'vdv', 'bodyAccelPeak', 'tyreLoadStatic', 'tyreLoadRms', 'tyreLoadRatio', 'tyreLoadMin', 'liftOffFraction', 'travelRms', 'travelMaxCompression', 'travelMaxExtension', 'damperVelocityRms', 'damperPowerMean'];
    for (const k of needed) expect(typeof out.metrics[k], k).toBe('number');
    expect(out.road).toMatchObject({ kind: 'iso8608', seed: 9 });
    expect(out.road.nMin).toBeCloseTo(12 / 1024, 12);
    expect(out.road.nMax).toBeLessThanOrEqual(2.83);
    expect(out.timing.steps).toBeGreaterThan(0);
    expect(out.timing.rhsEvaluations).toBeGreaterThan(out.timing.steps);
    expect(out.timing.integrateMs).toBeGreaterThan(0);
    const csv = readFileSync(join(tmp, 't.csv'), 'utf8').trim().split('\n');
    expect(csv[0]).toMatch(/^time_s,road_m,body_accel_m_s2,travel_m,tyre_load_N/);
    expect(csv.length).toBe(1 + 4 * 500 + 1);
  });

  it('reads a measured road from the CSV its road file names', () => {
    const r = sim('--setup', 'examples/pipit-front.setup.json', '--road', 'examples/tallis-lane.road.json', '--speed', '15', '--duration', '3');
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).road).toMatchObject({ kind: 'measured', length: 300 });
  });

  it.each([
    [['--road', 'examples/iso-c.road.json', '--speed', '20', '--duration', '3'], /--setup is required/],
    [['--setup', 'examples/pipit-front.setup.json', '--road', 'examples/iso-c.road.json', '--speed', 'fast', '--duration', '3'], /--speed: "fast" is not a number/],
    [['--setup', 'examples/pipit-front.setup.json', '--road', 'examples/iso-c.road.json', '--speed', '20', '--duration', '3', '--colour', 'red'], /Unknown option '--colour'/],
    [['--setup', 'examples/missing.json', '--road', 'examples/iso-c.road.json', '--speed', '20', '--duration', '3'], /--setup: cannot read examples\/missing.json/],
  ])('bad arguments exit with 2 and say which (%#)', (args, message) => {
    const r = sim(...(args as string[]));
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(message);
  });

  it('a bad setup field exits with 2 and names the field', () => {
    const setup = JSON.parse(readFileSync(join(root, 'examples/pipit-front.setup.json'), 'utf8'));
    setup.unsprungMass = -38;
    const r = sim('--setup', file('s.json', JSON.stringify(setup)), '--road', 'examples/iso-c.road.json', '--speed', '20', '--duration', '3');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^sim: setup\.unsprungMass: /);
  });

  it('a file that is not JSON exits with 2', () => {
    const r = sim('--setup', 'examples/pipit-front.setup.json', '--road', file('r.json', '{ kind: iso'), '--speed', '20', '--duration', '3');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--road: .*r\.json is not valid JSON/);
  });

  it('a bad CSV line exits with 2 and names the line', () => {
    file('lane.csv', 'distance_m,elevation_mm\n0,1\n0.1,2\n0.2,oops\n0.3,1\n');
    const road = file('lane.road.json', JSON.stringify({ kind: 'measured', csv: 'lane.csv' }));
    const r = sim('--setup', 'examples/pipit-front.setup.json', '--road', road, '--speed', '20', '--duration', '3');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/road\.csv lane\.csv: line 4: elevation "oops" is not a number/);
  });

  it('--vehicle prints the vehicle families: modes, flat-ride checks, seat and axle figures, timing', () => {
    const r = sim('--vehicle', 'examples/pipit.vehicle.json', '--road', 'examples/speed-bump.road.json', '--speed', '10', '--duration', '5');
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(Object.keys(out.linear.modes).sort()).toEqual(['frontHop', 'heave', 'pitch', 'rearHop']);
    expect(out.linear.flatRide.frontBelowRear).toBe(true);
    expect(out.wheelbaseDelay).toBeCloseTo(0.255, 12);
    expect(out.figures.seats.map((s: { name: string }) => s.name)).toEqual(['driver', 'rear passenger']);
    for (const end of ['front', 'rear']) expect(out.figures[end].travelMaxCompression).toBeGreaterThan(0);
    expect(out.timing.rhsEvaluations).toBeGreaterThan(0);
  });

  it('a bad vehicle field exits with 2 and names it', () => {
    const vehicle = { ...JSON.parse(readFileSync(join(root, 'examples/pipit.vehicle.json'), 'utf8')), front: join(root, 'examples/pipit-front.setup.json'), rear: join(root, 'examples/pipit-rear.setup.json') };
    delete vehicle.pitchRadiusOfGyration;
    const r = sim('--vehicle', file('v.json', JSON.stringify(vehicle)), '--road', 'examples/iso-c.road.json', '--speed', '20', '--duration', '3');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^sim: vehicle\.pitchInertia: give exactly one of pitchInertia and pitchRadiusOfGyration/);
  });
});
