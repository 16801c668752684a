import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meSchema, type Me } from '../../../../shared/contracts/auth';
import type { InvitationAccept } from '../../../../shared/contracts/members';
import { api } from '../../../lib/api-client';
import { storeSignedInUser } from './get-me';

type AcceptInvitationInput = { token: string } & InvitationAccept;

/** Accepts an invitation (a new account sends name and password, a signed-in one nothing); the answer is the signed-in user. */
export function acceptInvitation({ token, name, password }: AcceptInvitationInput): Promise<Me> {
  return api.post(`/api/invitations/${encodeURIComponent(token)}/accept`, { name, password }, meSchema);
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    // The used invitation's preview stays cached until the page unmounts; its loader always asks afresh.
    onSuccess: (me) => storeSignedInUser(queryClient, me),
  });
}
