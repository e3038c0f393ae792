import type { Role } from '../../../shared/schemas/workspace.ts';
import type { TargetSheetDetail, TargetSheetStatus } from '../../../shared/schemas/target-sheet.ts';
import { runSheetCheck } from '../../../server/target-sheets/checks.service.ts';
import { createTargetSheet, moveTargetSheet } from '../../../server/target-sheets/target-sheets.service.ts';
import type { TestUser } from './people.ts';
import { freshSetup } from './setup-fixtures.ts';
import type { TestApp } from './test-app.ts';

/** Who does what to a fixture sheet: an engineer drafts and submits, a lead decides. */
export interface SheetCast {
  workspaceId: string;
  workspaceName: string;
  engineer: TestUser;
  lead: TestUser;
}

const as = (cast: SheetCast, role: Role) => ({ workspaceId: cast.workspaceId, workspaceName: cast.workspaceName, role });

/**
 * A new sheet from a new setup's revision 1, moved through the services to `status`
 * (returned sheets carry a reason). Submitting and deciding send the usual mails.
 */
export async function freshSheet(t: TestApp, cast: SheetCast, status: TargetSheetStatus = 'draft'): Promise<TargetSheetDetail> {
  const setup = await freshSetup(t.db, cast.workspaceId, cast.engineer);
  const created = await createTargetSheet(t.deps, as(cast, 'engineer'), cast.engineer, { setupId: setup.id, revision: 1 });
  if (!created.ok) throw new Error(`fixture sheet refused: ${created.message}`);
  let detail: TargetSheetDetail = created.value;
  const id = detail.sheet.id;
  const path: [TargetSheetStatus, Role, string?][] =
    status === 'draft' ? [] : status === 'in_review' ? [['in_review', 'engineer']] : status === 'released' ? [['in_review', 'engineer'], ['released', 'lead']] : [['in_review', 'engineer'], ['returned', 'lead', 'Fixture: bands too tight']];
  for (const [to, role, reason] of path) {
    const actor = role === 'lead' ? cast.lead : cast.engineer;
    const moved = await moveTargetSheet(t.deps, as(cast, role), actor, id, to, reason);
    if (!moved.ok) throw new Error(`fixture sheet could not become ${to}: ${moved.message}`);
    detail = moved.value;
  }
  return detail;
}

/** A stored conformity check of the sheet against `csv`. */
export async function freshCheck(t: TestApp, cast: SheetCast, sheetId: string, csv: string) {
  const outcome = await runSheetCheck(t.db, { workspaceId: cast.workspaceId }, cast.engineer, sheetId, [{ content: Buffer.from(csv), filename: 'fixture-damper.csv', bytes: csv.length }], { label: [] }, new Date());
  if (!outcome.ok) throw new Error(`fixture check refused: ${outcome.message}`);
  return outcome.value;
}
