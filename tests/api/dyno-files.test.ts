import { afterAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER } from '../../server/auth/csrf.ts';
import { ErrorBody } from '../../shared/errors.ts';
import { ApplyDynoFitResult, DynoFileDetail, DynoFileItem, DynoFilesResponse } from '../../shared/schemas/dyno-file.ts';
import { SetupDetail } from '../../shared/schemas/setup-record.ts';
import { curveForce } from '../../shared/sim/damper-force.ts';
import { signedIn } from './helpers/agents.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { peaksCsv, seriesCsv } from './helpers/road-dyno-fixtures.ts';
import { freshSetup } from './helpers/setup-fixtures.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const workspaceId = await createWorkspace(t.db, 'Brume damper bench');
const engineer = await createUser(t.db, { name: 'Pell Ashgrove' });
const viewer = await createUser(t.db, { name: 'Juno Brack' });
await addMember(t.db, workspaceId, engineer.id, 'engineer');
await addMember(t.db, workspaceId, viewer.id, 'viewer');
const eng = await signedIn(t.url, engineer.email, engineer.password);
const view = await signedIn(t.url, viewer.email, viewer.password);
const ws = `/api/workspaces/${workspaceId}`;

const upload = (setupId: string, csv: string, fields: Record<string, string> = {}, filename = 'dyno.csv') => {
  let r = eng.agent.post(`${ws}/setups/${setupId}/dyno-files`).set(CSRF_HEADER, eng.csrf);
  for (const [k, v] of Object.entries(fields)) r = r.field(k, v);
  return r.attach('file', Buffer.from(csv), filename);
};

/** What the database holds for a setup: revision numbers and dyno files. */
async function stored(setupId: string) {
  const revisions = await t.db.selectFrom('setup_revision').select(['number', 'document']).where('setup_id', '=', setupId).orderBy('number').execute();
  const files = await t.db.selectFrom('dyno_file').select('id').where('setup_id', '=', setupId).execute();
  return { revisions, files: files.length };
}

describe('dyno files', () => {
  it('keeps a peak-point file with what the parser found: units from the header, points in SI', async () => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const res = await upload(setup.id, peaksCsv, {}, 'pipit-front-peaks.csv').expect(201);
    const item = DynoFileItem.parse(res.body);
    expect(item).toMatchObject({ setupId: setup.id, filename: 'pipit-front-peaks.csv', producedRevision: null, uploadedBy: { name: 'Pell Ashgrove' } });
    expect(item.summary.kind).toBe('peaks');
    expect(item.summary.layout).toBe('force-per-direction');
    expect(item.summary.units.velocity).toEqual({ unit: 'mm/s', source: 'header' });
    // first data row of the example: 25 mm/s, 129 N compression, 291 N rebound
    expect(item.summary.peaks.compression[0]).toEqual({ velocity: 0.025, force: 129 });
    expect(item.summary.peaks.rebound[0]).toEqual({ velocity: 0.025, force: 291 });
    const row = await t.db.selectFrom('dyno_file').select(['content', 'bytes']).where('id', '=', item.id).executeTakeFirstOrThrow();
    expect(row.content).toBe(peaksCsv);
    expect(row.bytes).toBe(Buffer.byteLength(peaksCsv));

    const list = DynoFilesResponse.parse((await view.get(`${ws}/setups/${setup.id}/dyno-files`).expect(200)).body);
    expect(list.files.map((f) => f.id)).toEqual([item.id]);
  });

  it('reads a raw record into its force-velocity loop and peak points, taking out the gas force given', async () => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const item = DynoFileItem.parse((await upload(setup.id, seriesCsv, { gasForce: '150' }).expect(201)).body);
    expect(item.summary.kind).toBe('series');
    expect(item.options.gasForce).toBe(150);
    expect(item.summary.series?.halfCycles).toBeGreaterThanOrEqual(8);
    expect(item.summary.peaks.compression.length).toBeGreaterThan(2);
    expect(item.summary.peaks.rebound.length).toBeGreaterThan(2);
    const detail = DynoFileDetail.parse((await view.get(`${ws}/setups/${setup.id}/dyno-files/${item.id}`).expect(200)).body);
    expect(detail.loop?.velocity.length).toBeGreaterThan(100);
    expect(detail.loop?.velocity.length).toBe(detail.loop?.force.length);
  });

  it('takes the setup\'s gas force out by default when the file\'s header says the readings include it; an explicit choice wins', async () => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    // The fixture corner's damper states a 240 N static gas force; the example record's second line says "gas force included".
    const byDefault = DynoFileItem.parse((await upload(setup.id, seriesCsv).expect(201)).body);
    expect(byDefault.summary.gasDeclaration).toMatchObject({ says: 'included', line: 2 });
    expect(byDefault.options.gasForce).toBe(240);
    // The same subtraction asked for explicitly reads the same peaks: the default is that subtraction, not something else.
    const explicit = DynoFileItem.parse((await upload(setup.id, seriesCsv, { gasForce: '240' }).expect(201)).body);
    expect(byDefault.summary.peaks).toEqual(explicit.summary.peaks);
    // Kept on purpose (0 sent): nothing is taken out, and every compression peak reads higher (the gas pushes the rod out).
    const kept = DynoFileItem.parse((await upload(setup.id, seriesCsv, { gasForce: '0' }).expect(201)).body);
    expect(kept.options.gasForce).toBe(0);
    expect(kept.summary.peaks.compression[0].force).toBeGreaterThan(byDefault.summary.peaks.compression[0].force);
    // A peak table whose header says the gas force was removed: nothing is taken out.
    const removed = DynoFileItem.parse((await upload(setup.id, peaksCsv).expect(201)).body);
    expect(removed.summary.gasDeclaration).toMatchObject({ says: 'removed' });
    expect(removed.options.gasForce).toBe(0);
  });

  it.each([
    ['wrong columns', 'speed of light,colour\n1,red\n2,blue\n', 1, /columns not recognised/],
    ['text in a number column', 'velocity [m/s],compression force [N],rebound force [N]\n0.05,120,300\n0.1,lots,520\n0.2,330,800\n', 3, /'lots' in column 'compression force \[N\]' is not a number/],
    ['a line cut short', 'velocity [m/s],compression force [N],rebound force [N]\n0.05,120,300\n0.1,200\n0.2,330,800\n', 3, /cut short/],
  ])('refuses a dyno CSV with %s, naming the line, and leaves the setup unchanged', async (_what, csv, line, message) => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const before = await stored(setup.id);
    const res = await upload(setup.id, csv).expect(400);
    const body = ErrorBody.parse(res.body);
    expect(body.error.message).toContain(`line ${line}`);
    const issue = body.error.fields?.find((f) => f.path === `line ${line}`);
    expect(issue?.message).toMatch(message);
    const after = await stored(setup.id);
    expect(after).toEqual(before);
    expect(after.files).toBe(0);
    expect(after.revisions.map((r) => r.number)).toEqual([1]);
  });

  it('applies a fit as a new revision with the fitted curves, linked to the file; older revisions unchanged', async () => {
    const setup = SetupDetail.parse(await freshSetup(t.db, workspaceId, engineer));
    const item = DynoFileItem.parse((await upload(setup.id, peaksCsv).expect(201)).body);
    const before = await stored(setup.id);
    t.clock.advance(5000);
    const knots = [0.05, 0.1, 0.2, 0.4, 0.8];
    const res = await eng.post(`${ws}/setups/${setup.id}/dyno-files/${item.id}/apply`, { knots, directions: ['compression', 'rebound'], message: 'Fitted to unit PF-0143', basedOn: 1 }).expect(201);
    const result = ApplyDynoFitResult.parse(res.body);
    expect(result.revision.number).toBe(2);
    expect(result.file.producedRevision).toEqual(result.revision);

    const revision = await t.db.selectFrom('setup_revision').selectAll().where('id', '=', result.revision.id).executeTakeFirstOrThrow();
    expect(revision.source).toBe(`dyno-fit:${item.id}`);
    expect(revision.message).toBe('Fitted to unit PF-0143');
    const document = JSON.parse(revision.document);
    expect(document.damper.compression.map(([v]: [number, number]) => v)).toEqual(knots);
    // the stored table is the fit (forces rounded to 0.1 N): it reads back the fitted force at
    // every measured speed, and the example file is smooth enough to sit within 5 % RMS of it
    if (!result.fit.rebound.ok) throw new Error(result.fit.rebound.message);
    for (const r of result.fit.rebound.residuals) expect(Math.abs(curveForce(document.damper.rebound, r.velocity) - r.fitted)).toBeLessThan(0.06);
    expect(result.fit.rebound.rmsResidualPct).toBeLessThan(5);
    if (!result.fit.compression.ok) throw new Error(result.fit.compression.message);
    expect(result.fit.compression.residuals).toHaveLength(item.summary.peaks.compression.length);
    // the gas charge and everything else of the setup is carried over
    expect(document.damper.gas).toEqual(setup.revision.document.damper.gas);
    expect(document.sprungMass).toBe(setup.revision.document.sprungMass);

    const after = await stored(setup.id);
    expect(after.revisions[0]).toEqual(before.revisions[0]);
    // the fixture setup is made with the wall clock, so compare the entries as a set
    const actions = (await t.db.selectFrom('audit_log').select('action').where('entity_id', 'in', [item.id, setup.id]).execute()).map((r) => r.action);
    expect(actions.sort()).toEqual(['dyno_file.applied', 'dyno_file.uploaded', 'setup.created', 'setup.revised']);
  });

  it('fits one direction only and keeps the other curve as it was', async () => {
    const setup = SetupDetail.parse(await freshSetup(t.db, workspaceId, engineer));
    const item = DynoFileItem.parse((await upload(setup.id, peaksCsv).expect(201)).body);
    const result = ApplyDynoFitResult.parse(
      (await eng.post(`${ws}/setups/${setup.id}/dyno-files/${item.id}/apply`, { knots: [0.05, 0.2, 0.6], directions: ['rebound'], message: 'Rebound from the dyno' }).expect(201)).body,
    );
    const revision = await t.db.selectFrom('setup_revision').select('document').where('id', '=', result.revision.id).executeTakeFirstOrThrow();
    const document = JSON.parse(revision.document);
    expect(document.damper.compression).toEqual(setup.revision.document.damper.compression);
    expect(document.damper.rebound.map(([v]: [number, number]) => v)).toEqual([0.05, 0.2, 0.6]);
  });

  it('refuses a fit at speeds with no measured point near them and saves no revision', async () => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const item = DynoFileItem.parse((await upload(setup.id, peaksCsv).expect(201)).body);
    const before = await stored(setup.id);
    const res = await eng.post(`${ws}/setups/${setup.id}/dyno-files/${item.id}/apply`, { knots: [0.05, 5, 6, 7], directions: ['compression'], message: 'Too far' }).expect(400);
    expect(ErrorBody.parse(res.body).error.fields?.[0].path).toBe('knots.compression');
    expect(await stored(setup.id)).toEqual(before);
  });

  it('refuses to stack a fit on a revision saved in between (409)', async () => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const item = DynoFileItem.parse((await upload(setup.id, peaksCsv).expect(201)).body);
    const body = { knots: [0.05, 0.2, 0.6], directions: ['compression'], message: 'First', basedOn: 1 };
    await eng.post(`${ws}/setups/${setup.id}/dyno-files/${item.id}/apply`, body).expect(201);
    const res = await eng.post(`${ws}/setups/${setup.id}/dyno-files/${item.id}/apply`, { ...body, message: 'Second' }).expect(409);
    expect(ErrorBody.parse(res.body).error.code).toBe('conflict');
  });

  it('answers 404 for a file of another setup', async () => {
    const a = await freshSetup(t.db, workspaceId, engineer);
    const b = await freshSetup(t.db, workspaceId, engineer);
    const item = DynoFileItem.parse((await upload(a.id, peaksCsv).expect(201)).body);
    await view.get(`${ws}/setups/${b.id}/dyno-files/${item.id}`).expect(404);
  });
});
