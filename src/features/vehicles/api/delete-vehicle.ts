import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client.ts';
import { invalidateAfterVehicleWrite, vehiclePath } from './query-keys.ts';

export const deleteVehicle = (workspaceId: string, vehicleId: string) => api.delete(vehiclePath(workspaceId, vehicleId));

/** Removes the vehicle; its setups stay, ungrouped. */
export function useDeleteVehicle(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: (vehicleId: string) => deleteVehicle(workspaceId, vehicleId), onSuccess: () => invalidateAfterVehicleWrite(queryClient, workspaceId) });
}
