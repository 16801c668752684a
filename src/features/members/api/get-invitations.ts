import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { invitationSchema, type Invitation } from '../../../../shared/contracts/members';
import { api } from '../../../lib/api-client';
import { membersKeys } from './members-keys';

const invitationListSchema = z.array(invitationSchema);

export function getInvitations(labId: number): Promise<Invitation[]> {
  return api.get(`/api/labs/${labId}/invitations`, invitationListSchema);
}

export const invitationsQueryOptions = (labId: number) =>
  queryOptions({
    queryKey: membersKeys.invitations(labId),
    queryFn: () => getInvitations(labId),
  });

export function useInvitations(labId: number): Invitation[] {
  return useSuspenseQuery(invitationsQueryOptions(labId)).data;
}
