import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meSchema, type Me } from '../../../../shared/contracts/auth';
import { api } from '../../../lib/api-client';
import { storeSignedInUser } from './get-me';

export function setActiveLab(labId: number): Promise<Me> {
  return api.post('/api/auth/active-lab', { labId }, meSchema);
}

export function useSetActiveLab() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setActiveLab,
    onSuccess: (me) => storeSignedInUser(queryClient, me),
  });
}
