import type { AppDeps } from '../deps.ts';
import { auditRoutes } from './audit.ts';
import { authRoutes } from './auth.ts';
import { configRoutes } from './config.ts';
import { dynoFileRoutes } from './dyno-files.ts';
import { invitationRoutes } from './invitations.ts';
import { memberRoutes } from './members.ts';
import { outboxRoutes } from './outbox.ts';
import type { RouteDef, RouteModule } from './registry.ts';
import { roadRoutes } from './roads.ts';
import { runRoutes } from './runs.ts';
import { setupRoutes } from './setups.ts';
import { shareLinkRoutes } from './share-links.ts';
import { sharedRoutes } from './shared.ts';
import { studyRoutes } from './studies.ts';
import { targetSheetRoutes } from './target-sheets.ts';
import { vehicleRoutes } from './vehicles.ts';
import { workspaceRoutes } from './workspaces.ts';

/**
 * Every route module of the API. A feature adds its module here (one line); the app mounts
 * whatever is listed, and tests/api/route-matrix.test.ts fails until the new routes have matrix entries.
 */
export const routeModules: RouteModule[] = [configRoutes, authRoutes, invitationRoutes, workspaceRoutes, memberRoutes, auditRoutes, outboxRoutes, runRoutes, roadRoutes, dynoFileRoutes, setupRoutes, vehicleRoutes, shareLinkRoutes, sharedRoutes, studyRoutes, targetSheetRoutes];

export function allRoutes(deps: AppDeps): RouteDef[] {
  return routeModules.flatMap((m) => m(deps));
}
