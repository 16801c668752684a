import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { invitationPreviewSchema, type InvitationPreview } from '../../../../shared/contracts/members';
import { api } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

export function getInvitationPreview(token: string): Promise<InvitationPreview> {
  return api.get(`/api/invitations/${encodeURIComponent(token)}`, invitationPreviewSchema);
}

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitation(token),
    queryFn: () => getInvitationPreview(token),
  });

export function useInvitationPreview(token: string): InvitationPreview {
  return useSuspenseQuery(invitationPreviewQueryOptions(token)).data;
}
