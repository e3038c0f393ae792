import { queryOptions, useQuery } from '@tanstack/react-query';
import { VehiclesResponse } from '../../../../shared/schemas/vehicle.ts';
import { api } from '../../../lib/api-client.ts';
import { vehiclesKey, vehiclesPath } from './query-keys.ts';

export const getVehicles = (workspaceId: string) => api.get(vehiclesPath(workspaceId), VehiclesResponse);
export const vehiclesQueryOptions = (workspaceId: string) => queryOptions({ queryKey: [...vehiclesKey(workspaceId), 'list'], queryFn: () => getVehicles(workspaceId) });
/** Vehicles with their front and rear setups and the rear/front body-frequency ratio. */
export const useVehicles = (workspaceId: string) => useQuery(vehiclesQueryOptions(workspaceId));
