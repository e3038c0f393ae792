import type { WorkspaceSettings } from '../../shared/schemas/workspace.ts';
import type { SessionUser, WorkspaceContext } from '../auth/request-context.ts';
import type { Db, Queryable } from '../db/database.ts';
import { findWorkspace, updateWorkspaceSettings } from './workspaces.repository.ts';
import { recordAudit } from '../audit/index.ts';

export async function workspaceSettings(db: Queryable, workspaceId: string): Promise<WorkspaceSettings> {
  const row = await findWorkspace(db, workspaceId);
  return { releaseNeedsSecondPerson: row?.release_needs_second_person === 1 };
}

/** Admins change the workspace's rules; each change is audited. */
export async function changeWorkspaceSettings(db: Db, ws: WorkspaceContext, actor: SessionUser, input: WorkspaceSettings, now: Date): Promise<WorkspaceSettings> {
  return db.transaction().execute(async (trx) => {
    const before = await workspaceSettings(trx, ws.workspaceId);
    if (before.releaseNeedsSecondPerson !== input.releaseNeedsSecondPerson) {
      await updateWorkspaceSettings(trx, ws.workspaceId, { release_needs_second_person: input.releaseNeedsSecondPerson ? 1 : 0 });
      await recordAudit(trx, {
        workspaceId: ws.workspaceId,
        actorId: actor.id,
        action: 'workspace.settings_changed',
        entityType: 'workspace',
        entityId: ws.workspaceId,
        summary: input.releaseNeedsSecondPerson
          ? `${actor.name} asked for a second person: a target sheet is now released only by a lead other than its author and submitter.`
          : `${actor.name} allowed a lead to release a target sheet they wrote or submitted.`,
        at: now,
      });
    }
    return input;
  });
}
