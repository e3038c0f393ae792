import type { SheetTransition } from '../../shared/target-sheet/lifecycle.ts';
import type { WorkspaceContext, SessionUser } from '../auth/request-context.ts';
import type { AppDeps } from '../deps.ts';
import { sheetReleasedMail, sheetReturnedMail, sheetSubmittedMail } from './sheet-mail.templates.ts';
import { findUserAddress, listMembersWithRole } from './target-sheets.repository.ts';

/** What the mails about one sheet need to say. */
export interface SheetMailFacts {
  sheetId: string;
  number: string;
  setupName: string;
  revision: number;
  authorId: string;
  reason: string | null;
}

/**
 * Sends the mail a status change calls for and returns how many were sent: on submit every
 * lead of the workspace (its admins when it has no lead, so a submitted sheet never waits
 * unseen), on release or return the author, on reopen nobody.
 */
export async function mailSheetDecision(
  deps: Pick<AppDeps, 'db' | 'mailer' | 'publicUrl'>,
  ws: Pick<WorkspaceContext, 'workspaceId' | 'workspaceName'>,
  actor: Pick<SessionUser, 'name'>,
  action: SheetTransition['action'],
  facts: SheetMailFacts,
): Promise<number> {
  const common = {
    number: facts.number,
    setupName: facts.setupName,
    revision: facts.revision,
    workspaceName: ws.workspaceName,
    link: `${deps.publicUrl}/w/${ws.workspaceId}/sheets/${facts.sheetId}`,
    by: actor.name,
  };
  let to: { email: string }[] = [];
  let template;
  if (action === 'submit') {
    const leads = await listMembersWithRole(deps.db, ws.workspaceId, 'lead');
    to = leads.length ? leads : await listMembersWithRole(deps.db, ws.workspaceId, 'admin');
    template = sheetSubmittedMail(common);
  } else if (action === 'release' || action === 'return') {
    const author = await findUserAddress(deps.db, facts.authorId);
    to = author ? [author] : [];
    template = action === 'release' ? sheetReleasedMail(common) : sheetReturnedMail({ ...common, reason: facts.reason ?? '' });
  }
  if (!template) return 0;
  const sent = await Promise.all(to.map((r) => deps.mailer.send({ to: r.email, workspaceId: ws.workspaceId, ...template })));
  return sent.filter(Boolean).length;
}
