import { useMutation, useQueryClient } from '@tanstack/react-query';
import { memberSchema, type Member, type MemberUpdate } from '../../../../shared/contracts/members';
import { api } from '../../../lib/api-client';
import { membersQueryOptions } from './get-members';

type UpdateMemberInput = { labId: number; userId: number; change: MemberUpdate };

export function updateMember({ labId, userId, change }: UpdateMemberInput): Promise<Member> {
  return api.patch(`/api/labs/${labId}/members/${userId}`, change, memberSchema);
}

/** Saves a role change; settles only once the member list has been read again. */
export function useUpdateMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMember,
    onSettled: (_member, _error, { labId }) =>
      queryClient.invalidateQueries({ queryKey: membersQueryOptions(labId).queryKey }),
  });
}
