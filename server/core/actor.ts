import type { SessionUser, WorkspaceContext } from '../auth/request-context.ts';

/** Who makes a change: written into `created_by` columns and audit entries. */
export type Actor = Pick<SessionUser, 'id' | 'name'>;

/** The workspace a service call acts in; every query is scoped by it. */
export type WorkspaceRef = Pick<WorkspaceContext, 'workspaceId'>;
