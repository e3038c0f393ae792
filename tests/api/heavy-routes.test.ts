// Every heavy step of the dyno, target-sheet and study routes runs in the worker-thread pool
// (server/jobs/heavy-pool.ts): with a time budget no worker can meet, each of them answers
// "busy" and saves nothing, and with the usual budget the same call succeeds. A dyno file's loop
// is read once at upload and kept, so opening the file never parses the upload again.
import { afterAll, describe, expect, it } from 'vitest';
import { applyDynoFit, getDynoFile, uploadDynoFile } from '../../server/dyno/dyno-files.service.ts';
import { configureHeavyPool } from '../../server/jobs/heavy-pool.ts';
import { finishStudyRun, saveStudyPoints } from '../../server/studies/study-results.service.ts';
import { runSheetCheck } from '../../server/target-sheets/checks.service.ts';
import { DynoUploadFields } from '../../shared/schemas/dyno-file.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { freshDynoFile, peaksCsv, seriesCsv } from './helpers/road-dyno-fixtures.ts';
import { freshSetup } from './helpers/setup-fixtures.ts';
import { createStudyFixture, uploadsFor } from './helpers/study-fixtures.ts';
import { freshSheet } from './helpers/target-sheet-fixtures.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(async () => {
  await configureHeavyPool({});
  await t.close();
});
const workspaceName = 'Pool bench';
const workspaceId = await createWorkspace(t.db, workspaceName);
const engineer = await createUser(t.db, { name: 'Tamsin Oakhurst' });
const lead = await createUser(t.db, { name: 'Rafe Dunmore' });
await addMember(t.db, workspaceId, engineer.id, 'engineer');
await addMember(t.db, workspaceId, lead.id, 'lead');
const ws = { workspaceId };
const actor = { id: engineer.id, name: engineer.name };
const now = () => new Date();
const count = async (table: 'dyno_file' | 'dyno_check' | 'setup_revision') =>
  Number((await t.db.selectFrom(table).select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);

/** No worker thread can start and finish within a millisecond: every pooled task runs over. */
const starve = () => configureHeavyPool({ budgetMs: 1 });
const restore = () => configureHeavyPool({});

describe('heavy steps of dyno, sheet and study routes run in the pool', () => {
  it('a dyno upload is read in a worker: over budget it is refused and nothing is kept', async () => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const file = { text: seriesCsv, filename: 'record.csv', bytes: seriesCsv.length };
    await starve();
    const before = await count('dyno_file');
    const refused = await uploadDynoFile(t.db, ws, actor, setup.id, file, DynoUploadFields.parse({}), now());
    expect(refused.ok ? 'saved' : refused.code).toBe('busy');
    expect(await count('dyno_file')).toBe(before);
    await restore();
    const saved = await uploadDynoFile(t.db, ws, actor, setup.id, file, DynoUploadFields.parse({}), now());
    expect(saved.ok).toBe(true);
  });

  it('a dyno fit runs in a worker: over budget no revision is added', async () => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const item = await freshDynoFile(t.db, workspaceId, setup.id, engineer, peaksCsv);
    const input = { knots: [0.05, 0.1, 0.2, 0.4, 0.8], directions: ['compression', 'rebound'] as const, message: 'Fit', basedOn: 1, weighting: 'absolute' as const };
    await starve();
    const revisions = await count('setup_revision');
    const refused = await applyDynoFit(t.db, ws, actor, setup.id, item.id, { ...input, directions: [...input.directions] }, now());
    expect(refused.ok ? 'saved' : refused.code).toBe('busy');
    expect(await count('setup_revision')).toBe(revisions);
    await restore();
    expect((await applyDynoFit(t.db, ws, actor, setup.id, item.id, { ...input, directions: [...input.directions] }, now())).ok).toBe(true);
  });

  it('a target-sheet check reads its files in a worker: over budget nothing is kept', async () => {
    const sheet = await freshSheet(t, { workspaceId, workspaceName, engineer, lead });
    const files = [{ content: Buffer.from(peaksCsv), filename: 'unit-1.csv', bytes: peaksCsv.length }];
    await starve();
    const before = await count('dyno_check');
    const refused = await runSheetCheck(t.db, ws, actor, sheet.sheet.id, files, { label: [] }, now());
    expect(refused.ok ? 'saved' : refused.code).toBe('busy');
    expect(await count('dyno_check')).toBe(before);
    await restore();
    expect((await runSheetCheck(t.db, ws, actor, sheet.sheet.id, files, { label: [] }, now())).ok).toBe(true);
  });

  it('finishing a study ranks its points in a worker: over budget the study stays a draft', async () => {
    const fixture = await createStudyFixture(t.db, workspaceId, actor);
    const saved = await saveStudyPoints(t.db, ws, fixture.studyId, { points: uploadsFor(fixture.detail) }, now());
    expect(saved.ok).toBe(true);
    await starve();
    const refused = await finishStudyRun(t.db, ws, actor, fixture.studyId, { status: 'complete', elapsedMs: 10 }, now());
    expect(refused.ok ? 'saved' : refused.code).toBe('busy');
    const row = await t.db.selectFrom('study').select(['status', 'results']).where('id', '=', fixture.studyId).executeTakeFirstOrThrow();
    expect(row).toEqual({ status: 'draft', results: null });
    await restore();
    const done = await finishStudyRun(t.db, ws, actor, fixture.studyId, { status: 'complete', elapsedMs: 10 }, now());
    expect(done.ok && done.value.status).toBe('complete');
  });
});

describe('a dyno file is read once', () => {
  it('opening a raw record serves the loop kept at upload, without reading the upload again', async () => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const item = await freshDynoFile(t.db, workspaceId, setup.id, engineer, seriesCsv);
    const first = await getDynoFile(t.db, ws, setup.id, item.id);
    if (!first.ok) throw new Error(first.message);
    expect(first.value.loop?.velocity.length).toBeGreaterThan(10);
    // Were the upload parsed on this read, this text would make it fail.
    await t.db.updateTable('dyno_file').set({ content: 'not a dyno record' }).where('id', '=', item.id).execute();
    const again = await getDynoFile(t.db, ws, setup.id, item.id);
    expect(again.ok && again.value.loop).toEqual(first.value.loop);
  });

  it('a file kept before loops were stored is read once in a worker, and its loop kept from then on', async () => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const item = await freshDynoFile(t.db, workspaceId, setup.id, engineer, seriesCsv);
    const kept = await t.db.selectFrom('dyno_file').select('loop').where('id', '=', item.id).executeTakeFirstOrThrow();
    await t.db.updateTable('dyno_file').set({ loop: null }).where('id', '=', item.id).execute();
    const opened = await getDynoFile(t.db, ws, setup.id, item.id);
    expect(opened.ok).toBe(true);
    const after = await t.db.selectFrom('dyno_file').select('loop').where('id', '=', item.id).executeTakeFirstOrThrow();
    expect(after.loop).toBe(kept.loop);
  });
});
