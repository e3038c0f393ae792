import { createContext, useContext, type ReactNode } from 'react';
import { hasRole, type Role, type WorkspaceInfo } from '../../shared/schemas/workspace.ts';

/**
 * The workspace the page is in, provided by the app shell under `/w/:workspaceId`. Features read
 * it instead of parsing the URL, and use `can()` to hide controls the role may not use (the
 * server refuses them anyway; hiding only spares people a pointless error).
 */
export interface CurrentWorkspace extends WorkspaceInfo {
  /** True when the caller's role is `least` or above. */
  can: (least: Role) => boolean;
}

const WorkspaceContext = createContext<CurrentWorkspace | null>(null);

export function WorkspaceProvider({ workspace, children }: { workspace: WorkspaceInfo; children: ReactNode }) {
  const value: CurrentWorkspace = { ...workspace, can: (least) => hasRole(workspace.role, least) };
  return <WorkspaceContext.Provider value={value}>{children}</WorkspaceContext.Provider>;
}

/** The current workspace; throws when used outside `/w/:workspaceId` (a wiring bug). */
export function useWorkspace(): CurrentWorkspace {
  const value = useContext(WorkspaceContext);
  if (!value) throw new Error('useWorkspace() used outside a workspace route');
  return value;
}
