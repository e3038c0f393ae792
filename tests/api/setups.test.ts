import { insertionOrder } from '../../server/db/dialect.ts';
import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { RevisionsResponse, SetupDetail, SetupRevision, SetupsResponse } from '../../shared/schemas/setup-record.ts';
import { Setup } from '../../shared/schemas/setup.ts';
import { signedIn } from './helpers/agents.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { cornerDocument, parsed } from './helpers/setup-fixtures.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const workspaceId = await createWorkspace(t.db, 'Brume chassis bench');
const otherWorkspaceId = await createWorkspace(t.db, 'Somebody else');
const engineer = await createUser(t.db, { name: 'Ines Marrow' });
const lead = await createUser(t.db, { name: 'Tomas Reed' });
const outsider = await createUser(t.db, { name: 'Other bench engineer' });
await addMember(t.db, workspaceId, engineer.id, 'engineer');
await addMember(t.db, workspaceId, lead.id, 'lead');
await addMember(t.db, otherWorkspaceId, outsider.id, 'engineer');
const eng = await signedIn(t.url, engineer.email, engineer.password);
const ld = await signedIn(t.url, lead.email, lead.password);
const out = await signedIn(t.url, outsider.email, outsider.password);

const setups = `/api/workspaces/${workspaceId}/setups`;

async function create(name: string, extra: object = {}): Promise<SetupDetail> {
  return SetupDetail.parse((await eng.post(setups, { setup: cornerDocument(name), ...extra }).expect(201)).body);
}
const revisionRows = (setupId: string) => t.db.selectFrom('setup_revision').selectAll().where('setup_id', '=', setupId).orderBy('number').execute();
const count = async (table: 'setup' | 'setup_revision' | 'audit_log') => Number((await t.db.selectFrom(table).select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);
const auditActions = async (entityId: string) =>
  (await t.db.selectFrom('audit_log').select('action').where('entity_id', '=', entityId).orderBy(insertionOrder(t.db, 'audit_log')).execute()).map((r) => r.action);

describe('setups and their revisions', () => {
  it('creates a setup as revision 1 and lists it with its revision, author and figures', async () => {
    const created = await create('Pipit front, baseline', { corner: 'front', message: 'Starting point from the rig' });
    expect(created).toMatchObject({ name: 'Pipit front, baseline', corner: 'front', vehicle: null, latestRevision: 1, latestMessage: 'Starting point from the rig' });
    expect(created.revision).toMatchObject({ number: 1, source: null, author: { id: engineer.id, name: 'Ines Marrow' } });
    expect(created.revision.document).toEqual(parsed(cornerDocument('Pipit front, baseline')));
    // figures of a small-car corner sit in the usual passenger-car range (common practice: body 1.0–1.5 Hz, wheel hop 10–15 Hz)
    expect(created.figures?.bodyHz).toBeGreaterThan(1.0);
    expect(created.figures?.bodyHz).toBeLessThan(1.5);
    expect(created.figures?.wheelHopHz).toBeGreaterThan(10);
    expect(created.figures?.wheelHopHz).toBeLessThan(15);

    const list = SetupsResponse.parse((await eng.get(setups).expect(200)).body);
    const row = list.setups.find((s) => s.id === created.id);
    expect(row).toMatchObject({ latestRevision: 1, changedBy: { name: 'Ines Marrow' }, createdBy: { name: 'Ines Marrow' } });
    expect(await auditActions(created.id)).toEqual(['setup.created']);
  });

  it('a save adds the next revision and never changes an older one', async () => {
    const created = await create('Corrie rear');
    const before = await revisionRows(created.id);

    const softer = cornerDocument('Corrie rear', { springRate: 30000 });
    const saved = SetupDetail.parse((await ld.post(`${setups}/${created.id}/revisions`, { setup: softer, message: 'Softer spring', basedOn: 1 }).expect(201)).body);
    expect(saved.latestRevision).toBe(2);
    expect(saved.revision).toMatchObject({ number: 2, message: 'Softer spring', author: { name: 'Tomas Reed' } });
    expect(saved.revision.document.springRate).toBe(30000);
    expect(saved.changedBy.name).toBe('Tomas Reed');

    const third = cornerDocument('Corrie rear', { springRate: 29000, unsprungMass: 42 });
    await eng.post(`${setups}/${created.id}/revisions`, { setup: third, message: 'Heavier hub', basedOn: 2 }).expect(201);

    const after = await revisionRows(created.id);
    expect(after).toHaveLength(3);
    // revision 1's stored row, byte for byte, is what it was before the two saves
    expect(after[0]).toEqual(before[0]);
    expect(JSON.parse(after[0].document).springRate).toBe(32000);
    expect(JSON.parse(after[1].document).springRate).toBe(30000);

    const one = SetupRevision.parse((await eng.get(`${setups}/${created.id}/revisions/1`).expect(200)).body);
    expect(one.document).toEqual(parsed(cornerDocument('Corrie rear')));
    const list = RevisionsResponse.parse((await eng.get(`${setups}/${created.id}/revisions`).expect(200)).body);
    expect(list.revisions.map((r) => [r.number, r.message, r.author.name])).toEqual([
      [3, 'Heavier hub', 'Ines Marrow'],
      [2, 'Softer spring', 'Tomas Reed'],
      [1, 'First revision', 'Ines Marrow'],
    ]);
    expect(await auditActions(created.id)).toEqual(['setup.created', 'setup.revised', 'setup.revised']);
  });

  it('lists revisions a page at a time, newest first, and says where the next page starts', async () => {
    const created = await create('Paged history');
    for (let n = 2; n <= 5; n++) {
      await eng.post(`${setups}/${created.id}/revisions`, { setup: cornerDocument('Paged history', { springRate: 30000 + n }), message: `Save ${n}`, basedOn: n - 1 }).expect(201);
    }
    const numbers = (r: RevisionsResponse) => r.revisions.map((x) => x.number);
    const first = RevisionsResponse.parse((await eng.get(`${setups}/${created.id}/revisions?limit=2`).expect(200)).body);
    expect(numbers(first)).toEqual([5, 4]);
    expect(first.nextBefore).toBe(4);
    const second = RevisionsResponse.parse((await eng.get(`${setups}/${created.id}/revisions?limit=2&before=${first.nextBefore}`).expect(200)).body);
    expect(numbers(second)).toEqual([3, 2]);
    const last = RevisionsResponse.parse((await eng.get(`${setups}/${created.id}/revisions?limit=2&before=${second.nextBefore}`).expect(200)).body);
    expect(numbers(last)).toEqual([1]);
    expect(last.nextBefore).toBeNull();
    // exactly a page left: no empty page promised
    const exact = RevisionsResponse.parse((await eng.get(`${setups}/${created.id}/revisions?limit=5`).expect(200)).body);
    expect(exact.nextBefore).toBeNull();
    // the default page holds all five
    expect(numbers(RevisionsResponse.parse((await eng.get(`${setups}/${created.id}/revisions`).expect(200)).body))).toEqual([5, 4, 3, 2, 1]);
    for (const bad of ['limit=0', 'limit=501', 'limit=two', 'before=1', 'before=-3']) {
      const res = await eng.get(`${setups}/${created.id}/revisions?${bad}`).expect(400);
      expect(JSON.stringify(res.body)).toMatch(new RegExp(bad.split('=')[0]));
    }
  });

  it('a corner beyond what the linear analysis resolves still saves, and the list shows it without figures', async () => {
    // a first damper point at 5e-324 m/s: an infinite low-speed slope (found by tests/fuzz)
    const extreme = cornerDocument('Extreme damper', {});
    const doc = { ...extreme, damper: { ...(extreme as { damper: object }).damper, rebound: [[5e-324, 0.000001]] } };
    const res = await eng.post(setups, { setup: doc }).expect(201);
    const id = SetupDetail.parse(res.body).id;
    const list = SetupsResponse.parse((await eng.get(setups).expect(200)).body);
    expect(list.setups.find((s) => s.id === id)?.figures).toBeNull();
    expect(list.setups.filter((s) => s.id !== id).every((s) => s.figures !== null)).toBe(true);
  });

  it('the database itself refuses to update a revision row', async () => {
    const created = await create('Immutable check');
    await expect(t.db.updateTable('setup_revision').set({ message: 'rewritten' }).where('setup_id', '=', created.id).execute()).rejects.toThrow(/immutable/);
    expect((await revisionRows(created.id))[0].message).toBe('First revision');
  });

  it('refuses a save edited from an outdated revision, and saves nothing', async () => {
    const created = await create('Skerry front');
    await eng.post(`${setups}/${created.id}/revisions`, { setup: cornerDocument('Skerry front', { sprungMass: 250 }), message: 'Lighter body', basedOn: 1 }).expect(201);
    const res = await ld.post(`${setups}/${created.id}/revisions`, { setup: cornerDocument('Skerry front', { sprungMass: 260 }), message: 'Stale edit', basedOn: 1 }).expect(409);
    expect(ErrorBody.parse(res.body).error.code).toBe('conflict');
    expect(ErrorBody.parse(res.body).error.message).toMatch(/Revision 2 was saved/);
    expect(await revisionRows(created.id)).toHaveLength(2);
  });

  it('restores an old revision as the next one, leaving every revision in between', async () => {
    const created = await create('Pipit rear');
    await eng.post(`${setups}/${created.id}/revisions`, { setup: cornerDocument('Pipit rear', { tyreRate: 230000 }), message: 'Stiffer tyre' }).expect(201);
    const before = await revisionRows(created.id);

    const restored = SetupDetail.parse((await eng.post(`${setups}/${created.id}/revisions/1/restore`, {}).expect(201)).body);
    expect(restored.revision).toMatchObject({ number: 3, source: 'restore:1', message: 'Restored revision 1' });
    expect(restored.revision.document).toEqual(parsed(cornerDocument('Pipit rear')));

    const after = await revisionRows(created.id);
    expect(after.slice(0, 2)).toEqual(before);
    expect(await auditActions(created.id)).toEqual(['setup.created', 'setup.revised', 'setup.restored']);
    await eng.post(`${setups}/${created.id}/revisions/9/restore`, {}).expect(404);
  });

  it('answers a bad body with 400 naming each field, and saves nothing', async () => {
    const created = await create('Validation target');
    const bad = cornerDocument('Validation target', {
      sprungMass: -5,
      damper: {
        compression: [
          [0.1, 130],
          [0.05, 80],
        ],
        rebound: [
          [0.05, 180],
          [0.1, 150],
        ],
      },
    });
    const [setupsBefore, revisionsBefore, auditBefore] = [await count('setup'), await count('setup_revision'), await count('audit_log')];

    const res = await eng.post(`${setups}/${created.id}/revisions`, { setup: bad, message: 'Broken' }).expect(400);
    const paths = ErrorBody.parse(res.body).error.fields?.map((f) => f.path) ?? [];
    expect(paths).toEqual(expect.arrayContaining(['setup.sprungMass', 'setup.damper.compression.1.0', 'setup.damper.rebound.1.1']));

    const noMessage = await eng.post(`${setups}/${created.id}/revisions`, { setup: cornerDocument('Validation target'), message: '  ' }).expect(400);
    expect(ErrorBody.parse(noMessage.body).error.fields?.map((f) => f.path)).toEqual(['message']);

    const createBad = await eng.post(setups, { setup: { ...cornerDocument('x'), tyreRate: 'stiff' } }).expect(400);
    expect(ErrorBody.parse(createBad.body).error.fields?.map((f) => f.path)).toEqual(['setup.tyreRate']);

    expect([await count('setup'), await count('setup_revision'), await count('audit_log')]).toEqual([setupsBefore, revisionsBefore, auditBefore]);
  });

  it('refuses a name with a text-direction override or a line break, naming the field, and saves nothing', async () => {
    const before = await count('setup');
    for (const name of ['Pipit \u202Etnorf', 'Pipit front\n=HYPERLINK("http://evil.example")']) {
      const res = await eng.post(setups, { setup: cornerDocument(name) }).expect(400);
      expect(ErrorBody.parse(res.body).error.fields?.map((f) => f.path)).toEqual(['setup.name']);
    }
    expect(await count('setup')).toBe(before);
  });

  it('exports a revision as the setup file and imports that file back unchanged', async () => {
    const created = await create('Brume Pipit front, export');
    await eng.post(`${setups}/${created.id}/revisions`, { setup: cornerDocument('Brume Pipit front, export', { motionRatio: 0.9 }), message: 'Lower motion ratio' }).expect(201);

    const res = await eng.get(`${setups}/${created.id}/revisions/2/export`).expect(200);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?brume-pipit-front-export-r2\.setup\.json"?$/);
    const file: unknown = JSON.parse(res.text);
    // exactly the setup document: no envelope, nothing the setup schema would refuse (it is strict)
    expect(Setup.parse(file)).toEqual(file);
    expect(file).toEqual(parsed(cornerDocument('Brume Pipit front, export', { motionRatio: 0.9 })));

    const imported = SetupDetail.parse((await eng.post(`${setups}/import?corner=front`, file as object).expect(201)).body);
    expect(imported.id).not.toBe(created.id);
    expect(imported).toMatchObject({ name: 'Brume Pipit front, export', latestRevision: 1, corner: 'front' });
    expect(imported.revision.source).toBe('import');
    expect(imported.revision.document).toEqual(file);
    expect(await auditActions(imported.id)).toEqual(['setup.imported']);
  });

  it('refuses a bad setup file with the field paths inside the file, and saves nothing', async () => {
    const before = [await count('setup'), await count('setup_revision')];
    const file = { ...cornerDocument('Bad file'), springRate: 0, unknownKey: 1 } as Record<string, unknown>;
    delete file.tyreRate;
    const res = await eng.post(`${setups}/import`, file).expect(400);
    const body = ErrorBody.parse(res.body).error;
    expect(body.message).toMatch(/not a valid setup/);
    expect(body.fields?.map((f) => f.path)).toEqual(expect.arrayContaining(['springRate', 'tyreRate', '(body)']));
    expect([await count('setup'), await count('setup_revision')]).toEqual(before);
  });

  it('renames without a revision; the next save carries the new name into its document', async () => {
    const created = await create('Old name');
    const renamed = SetupDetail.parse((await eng.patch(`${setups}/${created.id}`, { name: 'Corrie front, touring' }).expect(200)).body);
    expect(renamed).toMatchObject({ name: 'Corrie front, touring', latestRevision: 1 });
    expect(renamed.revision.document.name).toBe('Old name');
    const saved = SetupDetail.parse((await eng.post(`${setups}/${created.id}/revisions`, { setup: { ...cornerDocument('Old name'), sprungMass: cornerDocument('Old name').sprungMass + 5 }, message: 'Five kilograms more' }).expect(201)).body);
    expect(saved.revision.document.name).toBe('Corrie front, touring');
    expect(await auditActions(created.id)).toEqual(['setup.created', 'setup.renamed', 'setup.revised']);
  });

  it('archives a setup out of the default list and refuses saves to it until it is brought back', async () => {
    const created = await create('Put away');
    await eng.patch(`${setups}/${created.id}`, { archived: true }).expect(200);
    const live = SetupsResponse.parse((await eng.get(setups).expect(200)).body);
    expect(live.setups.some((s) => s.id === created.id)).toBe(false);
    const archived = SetupsResponse.parse((await eng.get(`${setups}?archived=only`).expect(200)).body);
    expect(archived.setups.map((s) => s.id)).toContain(created.id);

    const res = await eng.post(`${setups}/${created.id}/revisions`, { setup: cornerDocument('Put away'), message: 'x' }).expect(409);
    expect(ErrorBody.parse(res.body).error.message).toMatch(/archived/);
    await eng.patch(`${setups}/${created.id}`, { archived: false }).expect(200);
    await eng.post(`${setups}/${created.id}/revisions`, { setup: { ...cornerDocument('Put away'), sprungMass: cornerDocument('Put away').sprungMass + 5 }, message: 'Back in use' }).expect(201);
    expect(await auditActions(created.id)).toEqual(['setup.created', 'setup.archived', 'setup.unarchived', 'setup.revised']);
  });

  it('keeps setups inside their workspace', async () => {
    const created = await create('Private corner');
    const foreign = `/api/workspaces/${otherWorkspaceId}/setups/${created.id}`;
    await out.get(foreign).expect(404);
    await out.post(`${foreign}/revisions`, { setup: cornerDocument('Hijack'), message: 'x' }).expect(404);
    await out.get(`/api/workspaces/${workspaceId}/setups/${created.id}`).expect(404);
    await eng.get(`${setups}/${created.id}/revisions/abc`).expect(404);
    expect(await revisionRows(created.id)).toHaveLength(1);
  });
});
