import { useMutation, useQueryClient } from '@tanstack/react-query';
import { VehicleDetail } from '../../../../shared/schemas/vehicle.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateAfterVehicleWrite, vehicleKey, vehiclePath } from './query-keys.ts';

export interface UpdateVehicleBody {
  name?: string;
  notes?: string;
  /** null empties the slot; absent leaves it. */
  frontSetupId?: string | null;
  rearSetupId?: string | null;
}

export const updateVehicle = (workspaceId: string, vehicleId: string, body: UpdateVehicleBody) => api.patch(vehiclePath(workspaceId, vehicleId), body, VehicleDetail);

export function useUpdateVehicle(workspaceId: string, vehicleId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateVehicleBody) => updateVehicle(workspaceId, vehicleId, body),
    onSuccess: (detail) => {
      queryClient.setQueryData(vehicleKey(workspaceId, vehicleId), detail);
      return invalidateAfterVehicleWrite(queryClient, workspaceId);
    },
  });
}
