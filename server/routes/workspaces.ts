import type { WorkspaceInfo } from '../../shared/schemas/workspace.ts';
import { workspaceOf } from '../auth/request-context.ts';
import type { RouteModule } from './registry.ts';

export const workspaceRoutes: RouteModule = () => [
  {
    method: 'get',
    path: '/api/workspaces/:workspaceId',
    access: 'viewer',
    handler: (req, res) => {
      const ws = workspaceOf(req);
      const body: WorkspaceInfo = { id: ws.workspaceId, name: ws.workspaceName, role: ws.role };
      res.json(body);
    },
  },
];
