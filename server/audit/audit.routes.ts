import { AuditQuery, type AuditResponse } from '../../shared/schemas/audit.ts';
import { workspaceOf } from '../auth/request-context.ts';
import { listAudit } from './audit.service.ts';
import type { RouteModule } from '../http/registry.ts';

export const auditRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: '/api/workspaces/:workspaceId/audit',
    access: 'admin',
    handler: async (req, res) => {
      const query = AuditQuery.parse(req.query);
      const body: AuditResponse = await listAudit(deps.db, workspaceOf(req).workspaceId, query);
      res.json(body);
    },
  },
];
