import { AcceptInvitationInput, type Invitation, type InvitationInfo, InviteInput } from '../../shared/schemas/workspace.ts';
import { pathParam, userOf, workspaceOf } from '../auth/request-context.ts';
import { unwrap } from '../core/errors.ts';
import { acceptInvitation, createInvitation, invitationInfo, revokeInvitation } from './invitations.service.ts';
import { startSession } from '../accounts/index.ts';
import type { RouteModule } from '../http/registry.ts';

export const invitationRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: '/api/invitations/:token',
    access: 'public',
    handler: async (req, res) => {
      const info: InvitationInfo = unwrap(await invitationInfo(deps, pathParam(req, 'token')));
      res.json(info);
    },
  },
  {
    method: 'post',
    path: '/api/invitations/:token/accept',
    access: 'public',
    rateLimited: true,
    handler: async (req, res) => {
      const input = AcceptInvitationInput.parse(req.body ?? {});
      const who = unwrap(await acceptInvitation(deps, pathParam(req, 'token'), input, req.user));
      await startSession(deps, req, res, who);
    },
  },
  {
    method: 'post',
    path: '/api/workspaces/:workspaceId/invitations',
    access: 'admin',
    handler: async (req, res) => {
      const input = InviteInput.parse(req.body);
      const invitation: Invitation = unwrap(await createInvitation(deps, workspaceOf(req), userOf(req), input));
      res.status(201).json(invitation);
    },
  },
  {
    method: 'delete',
    path: '/api/workspaces/:workspaceId/invitations/:invitationId',
    access: 'admin',
    handler: async (req, res) => {
      unwrap(await revokeInvitation(deps, workspaceOf(req), userOf(req), pathParam(req, 'invitationId')));
      res.status(204).end();
    },
  },
];
