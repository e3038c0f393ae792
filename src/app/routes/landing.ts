import type { Me } from '../../../shared/schemas/account.ts';
import { lastWorkspace } from '../../features/workspaces/last-workspace.ts';

/** Where a signed-in person lands: the workspace they used last, else their first one. */
export function landingPath(me: Me): string {
  const remembered = lastWorkspace();
  const target = me.memberships.find((m) => m.workspaceId === remembered) ?? me.memberships[0];
  return target ? `/w/${target.workspaceId}` : '/account';
}

/** Only same-site paths are followed after sign-in, so a crafted link cannot send people elsewhere. */
export function safeNext(next: string | null): string | null {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return null;
  return next;
}
