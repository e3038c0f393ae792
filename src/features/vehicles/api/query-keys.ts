import type { QueryClient } from '@tanstack/react-query';
import { workspaceKey } from '../../../lib/queries/query-keys.ts';
import { setupsKey } from '../../../lib/queries/setups.ts';

export const vehiclesKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'vehicles'] as const;
export const vehicleKey = (workspaceId: string, vehicleId: string) => [...vehiclesKey(workspaceId), vehicleId] as const;
export const vehiclesPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/vehicles`;
export const vehiclePath = (workspaceId: string, vehicleId: string) => `${vehiclesPath(workspaceId)}/${encodeURIComponent(vehicleId)}`;

/** Grouping changes touch the setups too (their vehicle and corner), under the setups prefix. */
export const invalidateAfterVehicleWrite = (queryClient: QueryClient, workspaceId: string) =>
  Promise.all([queryClient.invalidateQueries({ queryKey: vehiclesKey(workspaceId) }), queryClient.invalidateQueries({ queryKey: setupsKey(workspaceId) })]);
