import { useMutation, useQueryClient } from '@tanstack/react-query';
import { VehicleDetail } from '../../../../shared/schemas/vehicle.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateAfterVehicleWrite, vehiclesPath } from './query-keys.ts';

export interface CreateVehicleBody {
  name: string;
  notes?: string;
  frontSetupId?: string | null;
  rearSetupId?: string | null;
}

export const createVehicle = (workspaceId: string, body: CreateVehicleBody) => api.post(vehiclesPath(workspaceId), body, VehicleDetail);

export function useCreateVehicle(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: (body: CreateVehicleBody) => createVehicle(workspaceId, body), onSuccess: () => invalidateAfterVehicleWrite(queryClient, workspaceId) });
}
