import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meSchema, type LoginRequest, type Me } from '../../../../shared/contracts/auth';
import { api } from '../../../lib/api-client';
import { storeSignedInUser } from './get-me';

export function signIn(credentials: LoginRequest): Promise<Me> {
  return api.post('/api/auth/login', credentials, meSchema);
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (me) => storeSignedInUser(queryClient, me),
  });
}
