import { queryOptions, useQuery } from '@tanstack/react-query';
import { VehicleDetail } from '../../../../shared/schemas/vehicle.ts';
import { api } from '../../../lib/api-client.ts';
import { vehicleKey, vehiclePath } from './query-keys.ts';

export const getVehicle = (workspaceId: string, vehicleId: string) => api.get(vehiclePath(workspaceId, vehicleId), VehicleDetail);
export const vehicleQueryOptions = (workspaceId: string, vehicleId: string) =>
  queryOptions({ queryKey: vehicleKey(workspaceId, vehicleId), queryFn: () => getVehicle(workspaceId, vehicleId) });
/** One vehicle with the modal analysis of both corners. */
export const useVehicle = (workspaceId: string, vehicleId: string) => useQuery(vehicleQueryOptions(workspaceId, vehicleId));
