import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { outboxMessageSchema, type OutboxMessage } from '../../../../shared/contracts/members';
import { api } from '../../../lib/api-client';
import { outboxKeys } from './outbox-keys';

const outboxListSchema = z.array(outboxMessageSchema);

/** Captured mail for the lab, newest first whatever order the server sends. */
export async function getOutbox(labId: number): Promise<OutboxMessage[]> {
  const messages = await api.get(`/api/labs/${labId}/outbox`, outboxListSchema);
  return messages.toSorted((first, second) => second.createdAt.localeCompare(first.createdAt) || second.id - first.id);
}

export const outboxQueryOptions = (labId: number) =>
  queryOptions({
    queryKey: outboxKeys.list(labId),
    queryFn: () => getOutbox(labId),
  });

export function useOutbox(labId: number): OutboxMessage[] {
  return useSuspenseQuery(outboxQueryOptions(labId)).data;
}
