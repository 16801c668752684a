import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invitationSchema, type Invitation } from '../../../../shared/contracts/members';
import { api } from '../../../lib/api-client';
import { invitationsQueryOptions } from './get-invitations';

type RevokeInvitationInput = { labId: number; invitationId: number };

/** Withdraws a pending invitation: its link stops working. */
export function revokeInvitation({ labId, invitationId }: RevokeInvitationInput): Promise<Invitation> {
  return api.post(`/api/labs/${labId}/invitations/${invitationId}/revoke`, {}, invitationSchema);
}

export function useRevokeInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvitation,
    onSettled: (_invitation, _error, { labId }) =>
      queryClient.invalidateQueries({ queryKey: invitationsQueryOptions(labId).queryKey }),
  });
}
