import type { AppDeps } from '../deps.ts';
import { apiTokenRoutes } from '../api-tokens/api-tokens.routes.ts';
import { auditRoutes } from '../audit/audit.routes.ts';
import { authRoutes } from '../accounts/auth.routes.ts';
import { configRoutes } from './config.routes.ts';
import { dynoFileRoutes } from '../dyno/dyno-files.routes.ts';
import { fleetRoutes } from '../fleet/fleet.routes.ts';
import { driveRoutes } from '../drives/drives.routes.ts';
import { invitationRoutes } from '../workspaces/invitations.routes.ts';
import { memberRoutes } from '../workspaces/members.routes.ts';
import { outboxRoutes } from '../mail/outbox.routes.ts';
import type { RouteDef, RouteModule } from './registry.ts';
import { roadRoutes } from '../roads/roads.routes.ts';
import { runRoutes } from '../runs/runs.routes.ts';
import { setupRoutes } from '../setups/setups.routes.ts';
import { shareLinkRoutes } from '../sharing/share-links.routes.ts';
import { sharedRoutes } from '../sharing/public.routes.ts';
import { studyRoutes } from '../studies/studies.routes.ts';
import { targetSheetRoutes } from '../target-sheets/target-sheets.routes.ts';
import { unitPreferenceRoutes } from '../accounts/unit-preferences.routes.ts';
import { vehicleRoutes } from '../vehicles/vehicles.routes.ts';
import { workspaceRoutes } from '../workspaces/workspaces.routes.ts';

/**
 * Every route module of the API. A feature adds its module here (one line); the app mounts
 * whatever is listed, and tests/api/route-matrix.test.ts fails until the new routes have matrix entries.
 */
export const routeModules: RouteModule[] = [configRoutes, authRoutes, invitationRoutes, workspaceRoutes, memberRoutes, auditRoutes, outboxRoutes, runRoutes, roadRoutes, dynoFileRoutes, driveRoutes, setupRoutes, vehicleRoutes, shareLinkRoutes, sharedRoutes, studyRoutes, fleetRoutes, targetSheetRoutes, apiTokenRoutes, unitPreferenceRoutes];

export function allRoutes(deps: AppDeps): RouteDef[] {
  return routeModules.flatMap((m) => m(deps));
}
