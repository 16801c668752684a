import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invitationSchema, type Invitation, type InvitationCreate } from '../../../../shared/contracts/members';
import { api } from '../../../lib/api-client';
import { invitationsQueryOptions } from './get-invitations';

type CreateInvitationInput = { labId: number; invitation: InvitationCreate };

export function createInvitation({ labId, invitation }: CreateInvitationInput): Promise<Invitation> {
  return api.post(`/api/labs/${labId}/invitations`, invitation, invitationSchema);
}

export function useCreateInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSuccess: (_invitation, { labId }) =>
      queryClient.invalidateQueries({ queryKey: invitationsQueryOptions(labId).queryKey }),
  });
}
