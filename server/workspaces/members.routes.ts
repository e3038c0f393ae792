import { type Member, type MembersResponse, RoleChangeInput } from '../../shared/schemas/workspace.ts';
import { pathParam, userOf, workspaceOf } from '../auth/request-context.ts';
import { unwrap } from '../core/errors.ts';
import { changeRole, listMembers, removeMember } from './members.service.ts';
import type { RouteModule } from '../http/registry.ts';

export const memberRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: '/api/workspaces/:workspaceId/members',
    access: 'viewer',
    handler: async (req, res) => {
      const body: MembersResponse = await listMembers(deps.db, workspaceOf(req), deps.clock());
      res.json(body);
    },
  },
  {
    method: 'patch',
    path: '/api/workspaces/:workspaceId/members/:userId',
    access: 'admin',
    handler: async (req, res) => {
      const { role } = RoleChangeInput.parse(req.body);
      const member: Member = unwrap(await changeRole(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'userId'), role, deps.clock()));
      res.json(member);
    },
  },
  {
    method: 'delete',
    path: '/api/workspaces/:workspaceId/members/:userId',
    access: 'admin',
    handler: async (req, res) => {
      unwrap(await removeMember(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'userId'), deps.clock()));
      res.status(204).end();
    },
  },
];
