import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { storeSignedInUser } from './get-me';

export function signOut(): Promise<void> {
  return api.postWithoutResult('/api/auth/logout');
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => storeSignedInUser(queryClient, null),
  });
}
