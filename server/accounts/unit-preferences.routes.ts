import { UnitPreferences } from '../../shared/schemas/unit-preferences.ts';
import { userOf } from '../auth/request-context.ts';
import type { RouteModule } from '../http/registry.ts';
import { saveUnitPreferences } from './unit-preferences.service.ts';

/** The person's display units; reading them is part of GET /api/auth/me. */
export const unitPreferenceRoutes: RouteModule = (deps) => [
  {
    method: 'put',
    path: '/api/account/units',
    access: 'user',
    handler: async (req, res) => {
      const units = UnitPreferences.parse(req.body);
      res.json(await saveUnitPreferences(deps.db, userOf(req).id, units));
    },
  },
];
