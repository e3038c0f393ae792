import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Me } from '../../../../shared/schemas/account.ts';
import { UnitPreferences } from '../../../../shared/schemas/unit-preferences.ts';
import { api } from '../../../lib/api-client.ts';
import { meKey } from '../../../lib/queries/query-keys.ts';

export const saveUnits = (units: UnitPreferences) => api.put('/api/account/units', units, UnitPreferences);

/** Saves the display units and puts them into the cached `me` at once, so every open screen follows. */
export function useSaveUnits() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveUnits,
    onSuccess: (units) => queryClient.setQueryData<Me | null>(meKey, (me) => (me ? { ...me, units } : me)),
  });
}
