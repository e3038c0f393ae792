import type { AppConfig } from '../../shared/schemas/config.ts';
import { DEMO_USERS } from '../core/demo-people.ts';
import type { RouteModule } from './registry.ts';

export const configRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: '/api/config',
    access: 'public',
    issuesCsrf: true,
    handler: (_req, res) => {
      const body: AppConfig = { demoMode: deps.demoMode, demoUsers: deps.demoMode ? DEMO_USERS : [], signUpOpen: deps.openSignUp, teamWorkers: deps.fleet !== null };
      res.json(body);
    },
  },
];
