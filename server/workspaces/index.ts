// What other parts of the server may use from this domain; everything else stays inside it.
export { workspaceSettings } from './settings.service.ts';
export { requireMember, requireRoleAnywhere } from './workspace-context.middleware.ts';
export { findMembership, insertMembership, insertWorkspace, listMembershipsOfUser } from './workspaces.repository.ts';
