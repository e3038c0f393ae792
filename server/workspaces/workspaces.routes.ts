import { type WorkspaceInfo, WorkspaceSettings } from '../../shared/schemas/workspace.ts';
import { userOf, workspaceOf } from '../auth/request-context.ts';
import { changeWorkspaceSettings, workspaceSettings } from './settings.service.ts';
import type { RouteModule } from '../http/registry.ts';

export const workspaceRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: '/api/workspaces/:workspaceId',
    access: 'viewer',
    handler: async (req, res) => {
      const ws = workspaceOf(req);
      const body: WorkspaceInfo = { id: ws.workspaceId, name: ws.workspaceName, role: ws.role, settings: await workspaceSettings(deps.db, ws.workspaceId) };
      res.json(body);
    },
  },
  {
    method: 'put',
    path: '/api/workspaces/:workspaceId/settings',
    access: 'admin',
    handler: async (req, res) => {
      const input = WorkspaceSettings.parse(req.body);
      const body: WorkspaceSettings = await changeWorkspaceSettings(deps.db, workspaceOf(req), userOf(req), input, deps.clock());
      res.json(body);
    },
  },
];
