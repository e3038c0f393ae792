import { useMutation } from '@tanstack/react-query';
import type { ResetConfirmInput, ResetRequestInput } from '../../../../shared/schemas/account.ts';
import { api } from '../../../lib/api-client.ts';

/** Always succeeds (202) whether or not the address has an account, so nobody can probe for accounts. */
export const requestReset = (input: ResetRequestInput) => api.post('/api/auth/reset/request', input);

/** Sets a new password from an e-mailed token; `gone` when the link was used or has expired. */
export const confirmReset = (input: ResetConfirmInput) => api.post('/api/auth/reset/confirm', input);

export const useRequestReset = () => useMutation({ mutationFn: requestReset });
export const useConfirmReset = () => useMutation({ mutationFn: confirmReset });
