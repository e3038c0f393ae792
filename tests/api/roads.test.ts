import { afterAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER } from '../../server/auth/csrf.ts';
import { ErrorBody } from '../../shared/errors.ts';
import { RoadDetail, RoadsResponse } from '../../shared/schemas/road-record.ts';
import { signedIn } from './helpers/agents.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { measuredCsv } from './helpers/road-dyno-fixtures.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const workspaceId = await createWorkspace(t.db, 'Brume road lab');
const engineer = await createUser(t.db, { name: 'Maren Tolley' });
await addMember(t.db, workspaceId, engineer.id, 'engineer');
const eng = await signedIn(t.url, engineer.email, engineer.password);
const roads = `/api/workspaces/${workspaceId}/roads`;

const upload = (csv: string | Buffer, fields: Record<string, string> = {}, filename = 'profile.csv') => {
  let r = eng.agent.post(`${roads}/measured`).set(CSRF_HEADER, eng.csrf);
  for (const [k, v] of Object.entries(fields)) r = r.field(k, v);
  return r.attach('file', Buffer.isBuffer(csv) ? csv : Buffer.from(csv), filename);
};
const put = (path: string, body: object) => eng.agent.put(path).set(CSRF_HEADER, eng.csrf).send(body);
const roadCount = async () => Number((await t.db.selectFrom('road').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);
const auditActions = async (entityId: string) =>
  (await t.db.selectFrom('audit_log').select('action').where('entity_id', '=', entityId).orderBy('at').execute()).map((r) => r.action);

describe('road library', () => {
  it('saves a road of every kind with its figures, and lists them newest first without definitions', async () => {
    const definitions = [
      { kind: 'iso8608', class: 'C', seed: 9 },
      { kind: 'sine', amplitude: 0.01, wavelength: 8 },
      { kind: 'sweep', amplitude: 0.005, startFrequency: 0.5, endFrequency: 20, duration: 20 },
      { kind: 'bump', height: 0.05, length: 0.6, at: 12 },
      { kind: 'pothole', depth: 0.04, length: 0.5, at: 8 },
      { kind: 'kerb', height: 0.08, rampLength: 0.05, at: 5 },
      { kind: 'measured', points: [[0, 0], [1, 0.001], [2, -0.002], [3, 0]] },
    ];
    const made: RoadDetail[] = [];
    for (const [i, definition] of definitions.entries()) {
      t.clock.advance(1000);
      const res = await eng.post(roads, { name: `Road ${i}`, definition }).expect(201);
      made.push(RoadDetail.parse(res.body));
    }
    expect(made.map((r) => r.kind)).toEqual(definitions.map((d) => d.kind));
    expect(made.map((r) => r.source)).toEqual(['defined', 'defined', 'defined', 'defined', 'defined', 'defined', 'measured']);
    // the generated class C road reads back as class C (fitIso8608 over its own PSD)
    expect(made[0].figures.iso?.className).toBe('C');
    expect(made[0].figures.length).toBeCloseTo(1024, 6);
    expect(made[3].figures.iso).toBeNull();
    expect(made[0].definition).toMatchObject({ kind: 'iso8608', class: 'C', seed: 9, name: 'Road 0' });
    expect(made[0].createdBy.name).toBe('Maren Tolley');

    const list = RoadsResponse.parse((await eng.get(roads).expect(200)).body);
    expect(list.roads.map((r) => r.name)).toEqual(['Road 6', 'Road 5', 'Road 4', 'Road 3', 'Road 2', 'Road 1', 'Road 0']);
    expect(list.roads[0]).not.toHaveProperty('definition');
    expect(await auditActions(made[0].id)).toEqual(['road.created']);
  });

  it('refuses a definition the road schema refuses, naming the field, and saves nothing', async () => {
    const before = await roadCount();
    const res = await eng.post(roads, { name: 'Backwards band', definition: { kind: 'iso8608', class: 'B', seed: 1, nMin: 2, nMax: 1 } }).expect(400);
    const body = ErrorBody.parse(res.body);
    expect(body.error.fields?.map((f) => f.path)).toContain('definition.nMax');
    expect(await roadCount()).toBe(before);
  });

  it('refuses definitions that would expand a few bytes into millions of samples, naming the field', async () => {
    const before = await roadCount();
    // 100 bytes asking for 5 million samples from two points.
    const twoPoints = await eng.post(roads, { name: 'Two points', definition: { kind: 'measured', points: [[0, 0], [49999, 0.01]], spacing: 0.01 } }).expect(400);
    expect(ErrorBody.parse(twoPoints.body).error.fields?.map((f) => f.path)).toEqual(['definition.spacing']);
    // 100 km of road up to 100 cycle/m: 2 × 10⁷ samples.
    const longIso = await eng.post(roads, { name: 'Endless fine road', definition: { kind: 'iso8608', class: 'C', seed: 1, length: 100000, nMax: 100 } }).expect(400);
    expect(ErrorBody.parse(longIso.body).error.fields?.map((f) => f.path)).toEqual(['definition.length']);
    expect(await roadCount()).toBe(before);
    // The same lengths at ordinary detail are fine.
    await eng.post(roads, { name: 'Long ordinary road', definition: { kind: 'iso8608', class: 'C', seed: 1, length: 100000 } }).expect(201);
  });

  it('uploads a measured profile in mm, stores metres, and fits its ISO 8608 class', async () => {
    const res = await upload(measuredCsv(800), { name: 'Quarry lane', detrend: 'mean' }).expect(201);
    const road = RoadDetail.parse(res.body);
    expect(road.source).toBe('measured');
    if (road.definition.kind !== 'measured') throw new Error('expected a measured road');
    expect(road.definition.points).toHaveLength(800);
    // row 2 of the file: 0.25 m, elevation written in mm
    const second = road.definition.points[1];
    expect(second[0]).toBe(0.25);
    expect(second[1]).toBeCloseTo((3 * Math.sin(0.25 / 3) + 1.2 * Math.sin(0.25 * 1.7 + 1) + 0.4 * Math.sin(0.25 * 7.3)) / 1000, 6);
    expect(road.definition.detrend).toBe('mean');
    expect(road.figures).toMatchObject({ points: 800, spacing: 0.25 });
    expect(road.figures.length).toBeCloseTo(199.75, 9);
    expect(road.figures.iso?.className).toMatch(/^[A-H]$/);
    expect(await auditActions(road.id)).toEqual(['road.uploaded']);
  });

  it.each([
    ['text in a number column', 'distance [m],elevation [mm]\n0,0\n0.25,1.2\n0.5,bump\n', 4, /"bump" is not a number/],
    ['a line cut short', 'distance [m],elevation [mm]\n0,0\n0.25\n0.5,1\n', 3, /expected 2 columns, found 1/],
    ['wrong columns', 'time [s],force [N]\n0,0\n1,1\n', 1, /header must name a distance column/],
    ['distance going back', 'distance [m],elevation [mm]\n0,0\n0.5,1\n0.25,1\n', 4, /does not rise/],
  ])('refuses a measured CSV with %s, naming the line, and saves nothing', async (_what, csv, line, message) => {
    const before = await roadCount();
    const auditBefore = await t.db.selectFrom('audit_log').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow();
    const res = await upload(csv, { name: 'Bad profile' }).expect(400);
    const body = ErrorBody.parse(res.body);
    expect(body.error.message).toContain(`line ${line}`);
    expect(body.error.fields?.[0]).toMatchObject({ path: `line ${line}` });
    expect(body.error.fields?.[0].message).toMatch(message);
    expect(await roadCount()).toBe(before);
    const auditAfter = await t.db.selectFrom('audit_log').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow();
    expect(Number(auditAfter.n)).toBe(Number(auditBefore.n));
  });

  it('refuses a file over the size limit and one that is not text', async () => {
    const big = Buffer.alloc(8 * 1024 * 1024 + 10, 0x31);
    const tooBig = await upload(big, { name: 'Huge' }).expect(413);
    expect(ErrorBody.parse(tooBig.body).error.code).toBe('payload_too_large');
    const binary = await upload(Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x00, 0x00]), { name: 'Zip' }, 'profile.zip').expect(400);
    expect(ErrorBody.parse(binary.body).error.message).toMatch(/not a text file/);
  });

  it('renames and redefines a road, recomputing its figures; a measured road stays measured', async () => {
    const made = RoadDetail.parse((await eng.post(roads, { name: 'Estate lane', definition: { kind: 'iso8608', class: 'B', seed: 2 } }).expect(201)).body);
    t.clock.advance(60_000);
    const changed = RoadDetail.parse((await put(`${roads}/${made.id}`, { name: 'Estate lane, worn', definition: { kind: 'iso8608', class: 'D', seed: 2 } }).expect(200)).body);
    expect(changed.name).toBe('Estate lane, worn');
    expect(changed.figures.iso?.className).toBe('D');
    expect(changed.changedAt > made.changedAt).toBe(true);
    expect(changed.definition.name).toBe('Estate lane, worn');

    const measured = RoadDetail.parse((await upload(measuredCsv(300), { name: 'Short lane' }).expect(201)).body);
    const refused = await put(`${roads}/${measured.id}`, { definition: { kind: 'bump', height: 0.05, length: 0.5, at: 1 } }).expect(400);
    expect(ErrorBody.parse(refused.body).error.fields?.[0].path).toBe('definition.kind');
    expect(await auditActions(made.id)).toEqual(['road.created', 'road.updated']);
  });

  it('sends a road as its stored bytes with a version tag: unchanged it answers 304, changed it sends the new kind and definition', async () => {
    const measured = RoadDetail.parse((await upload(measuredCsv(400), { name: 'Tagged lane' }).expect(201)).body);
    // the worker's bytes are stored as text, as every other road is
    const stored = await t.db.selectFrom('road').select('definition').where('id', '=', measured.id).executeTakeFirstOrThrow();
    expect(typeof stored.definition).toBe('string');
    expect(JSON.parse(stored.definition)).toEqual(measured.definition);
    const first = await eng.get(`${roads}/${measured.id}`).expect(200);
    const tag = first.headers.etag as string;
    expect(tag).toMatch(/^W\/"road-/);
    expect(RoadDetail.parse(first.body)).toEqual(measured);
    await eng.get(`${roads}/${measured.id}`).set('If-None-Match', tag).expect(304);
    t.clock.advance(60_000);
    await put(`${roads}/${measured.id}`, { name: 'Tagged lane, renamed' }).expect(200);
    const after = await eng.get(`${roads}/${measured.id}`).set('If-None-Match', tag).expect(200);
    expect(RoadDetail.parse(after.body).definition.name).toBe('Tagged lane, renamed');
    const list = RoadsResponse.parse((await eng.get(roads).expect(200)).body);
    expect(list.roads.find((r) => r.id === measured.id)?.kind).toBe('measured');
  });

  it('deletes a road; it is gone from the library afterwards', async () => {
    const made = RoadDetail.parse((await eng.post(roads, { name: 'Temporary', definition: { kind: 'sine', amplitude: 0.01, wavelength: 4 } }).expect(201)).body);
    await eng.del(`${roads}/${made.id}`).expect(204);
    await eng.get(`${roads}/${made.id}`).expect(404);
    const list = RoadsResponse.parse((await eng.get(roads).expect(200)).body);
    expect(list.roads.some((r) => r.id === made.id)).toBe(false);
    expect(await auditActions(made.id)).toEqual(['road.created', 'road.deleted']);
  });
});
