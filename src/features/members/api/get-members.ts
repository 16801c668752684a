import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { memberSchema, type Member } from '../../../../shared/contracts/members';
import { api } from '../../../lib/api-client';
import { membersKeys } from './members-keys';

const memberListSchema = z.array(memberSchema);

export function getMembers(labId: number): Promise<Member[]> {
  return api.get(`/api/labs/${labId}/members`, memberListSchema);
}

export const membersQueryOptions = (labId: number) =>
  queryOptions({
    queryKey: membersKeys.list(labId),
    queryFn: () => getMembers(labId),
  });

export function useMembers(labId: number): Member[] {
  return useSuspenseQuery(membersQueryOptions(labId)).data;
}
