import { useMutation } from '@tanstack/react-query';
import type { PasswordChangeInput } from '../../../../shared/schemas/account.ts';
import { api } from '../../../lib/api-client.ts';

/** Changes the password; the server signs out every other session and keeps this one. */
export const changePassword = (input: PasswordChangeInput) => api.post('/api/auth/password', input);

export const useChangePassword = () => useMutation({ mutationFn: changePassword });
