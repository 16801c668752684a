import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { membersQueryOptions } from './get-members';

type RemoveMemberInput = { labId: number; userId: number };

/** Ends a person's membership of the lab; their account and their records stay. */
export function removeMember({ labId, userId }: RemoveMemberInput): Promise<void> {
  return api.delete(`/api/labs/${labId}/members/${userId}`);
}

/** Settles only once the member list has been read again. */
export function useRemoveMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSettled: (_result, _error, { labId }) =>
      queryClient.invalidateQueries({ queryKey: membersQueryOptions(labId).queryKey }),
  });
}
