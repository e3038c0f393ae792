import { useMutation } from '@tanstack/react-query';
import { SignUpAnswer, type SignUpInput } from '../../../../shared/schemas/account.ts';
import { api } from '../../../lib/api-client.ts';

/** Sign-up answers the same for every address and finishes by mail: nobody is signed in yet. */
export const signUp = (input: SignUpInput) => api.post('/api/auth/signup', input, SignUpAnswer);

export const useSignUp = () => useMutation({ mutationFn: signUp });
