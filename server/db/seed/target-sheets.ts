import type { Role } from '../../../shared/schemas/workspace.ts';
import type { TargetPoint } from '../../../shared/schemas/target-sheet.ts';
import { storeSheetCheckInTx } from '../../target-sheets/checks.service.ts';
import { checkContentJson, readCheckFiles } from '../../target-sheets/read-check-files.ts';
import { createTargetSheetInTx, moveTargetSheetInTx, saveTargetSheetInTx } from '../../target-sheets/target-sheets.service.ts';
import type { Queryable } from '../database.ts';
import { DEMO_USERS, DEMO_WORKSPACE_NAME } from '../../core/demo-people.ts';
import type { SeedStep } from './seed-context.ts';

const daysBefore = (now: Date, days: number) => new Date(now.getTime() - days * 86_400_000);

function actorOf(role: Role, users: Record<Role, string>) {
  const person = DEMO_USERS.find((u) => u.role === role);
  if (!person) throw new Error(`no demo person with role ${role}`);
  return { id: users[role], name: person.name };
}

async function setupNamed(trx: Queryable, workspaceId: string, name: string): Promise<string> {
  const row = await trx.selectFrom('setup').select('id').where('workspace_id', '=', workspaceId).where('name', '=', name).executeTakeFirst();
  if (!row) throw new Error(`the target-sheet seed needs the demo setup "${name}" (server/db/seed/setups.ts runs first)`);
  return row.id;
}

/**
 * Peak readings of one invented damper unit as the supplier's rig would report them: the target
 * force at each reference speed times (1 + offset), offsets chosen by hand per point.
 */
function unitCsv(unit: string, compression: TargetPoint[], rebound: TargetPoint[], offsets: { compression: number[]; rebound: number[] }): string {
  const rows = compression.map((c, i) => {
    const r = rebound[i];
    const f = (p: TargetPoint, k: number) => (p.force * (1 + k)).toFixed(1);
    return `${(c.velocity * 1000).toFixed(0)},${f(c, offsets.compression[i] ?? 0)},${f(r, offsets.rebound[i] ?? 0)}`;
  });
  return (
    `# Tallis & Brume Motor Works - Brume Pipit front damper, unit ${unit} (invented example data)\n` +
    `# peak force at each test speed, gas force removed\n` +
    `velocity [mm/s],compression force [N],rebound force [N]\n${rows.join('\n')}\n`
  );
}

/**
 * Demo target sheets: the Pipit front damper (revision 2) drafted by the engineer, released by the
 * lead, with one dyno check of two supplier units (one inside every band, one with rebound high
 * at speed); and a draft for the Pipit rear.
 */
export const seedTargetSheets: SeedStep = async (trx, ctx) => {
  const engineer = actorOf('engineer', ctx.users);
  const lead = actorOf('lead', ctx.users);
  const ws = (role: Role) => ({ workspaceId: ctx.workspaceId, workspaceName: DEMO_WORKSPACE_NAME, role });
  const must = <T>(o: { ok: true; value: T } | { ok: false; message: string }, what: string): T => {
    if (!o.ok) throw new Error(`demo target sheet: ${what} refused: ${o.message}`);
    return o.value;
  };

  const front = await setupNamed(trx, ctx.workspaceId, 'Brume Pipit front, baseline');
  const created = must(await createTargetSheetInTx(trx, ws('engineer'), engineer, { setupId: front, revision: 2 }, daysBefore(ctx.now, 10)), 'create');
  const id = created.sheet.id;
  must(
    await saveTargetSheetInTx(
      trx,
      ws('engineer'),
      engineer,
      id,
      { ...created.sheet, notes: 'Production tolerance agreed with the damper supplier: ±10 % with a 20 N floor. Forces exclude the gas force.' },
      daysBefore(ctx.now, 10),
    ),
    'edit',
  );
  must(await moveTargetSheetInTx(trx, ws('engineer'), engineer, id, 'in_review', undefined, daysBefore(ctx.now, 9)), 'submit');
  const released = must(await moveTargetSheetInTx(trx, ws('lead'), lead, id, 'released', undefined, daysBefore(ctx.now, 8)), 'release').detail.sheet;

  const { compression, rebound } = released;
  const files = [
    { unit: 'PF-0151', offsets: { compression: [0.04, 0.03, -0.02, -0.04, 0.01, 0.05, 0.02], rebound: [-0.03, 0.02, 0.04, -0.01, 0.03, 0.06, 0.07] } },
    { unit: 'PF-0152', offsets: { compression: [0.02, -0.05, -0.03, 0.0, 0.04, 0.06, 0.08], rebound: [0.05, 0.03, 0.06, 0.09, 0.12, 0.14, 0.13] } },
  ].map(({ unit, offsets }) => {
    const text = unitCsv(unit, compression, rebound, offsets);
    return { text, filename: `${unit.toLowerCase()}.csv`, bytes: text.length };
  });
  const read = must(readCheckFiles(files, { label: ['PF-0151', 'PF-0152'] }), 'read dyno files');
  const kept = { filenames: files.map((f) => f.filename), content: checkContentJson(files, read.measured) };
  must(await storeSheetCheckInTx(trx, ws('engineer'), engineer, id, kept, read, daysBefore(ctx.now, 5)), 'dyno check');

  const rear = await setupNamed(trx, ctx.workspaceId, 'Brume Pipit rear, baseline');
  must(await createTargetSheetInTx(trx, ws('engineer'), engineer, { setupId: rear, revision: 1 }, daysBefore(ctx.now, 2)), 'draft');
};
