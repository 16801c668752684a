import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { capturedMessageSchema, type CapturedMessage } from '../../../../shared/contracts/operator';
import { api } from '../../../lib/api-client';
import { capturedMailKeys } from './captured-mail-keys';

const capturedListSchema = z.array(capturedMessageSchema);

/** Every captured message with its body (the instance operator only), newest first whatever order the server sends. */
export async function getCapturedMail(): Promise<CapturedMessage[]> {
  const messages = await api.get('/api/operator/mail', capturedListSchema);
  return messages.toSorted((first, second) => second.createdAt.localeCompare(first.createdAt) || second.id - first.id);
}

export const capturedMailQueryOptions = () =>
  queryOptions({
    queryKey: capturedMailKeys.list(),
    queryFn: getCapturedMail,
  });

export function useCapturedMail(): CapturedMessage[] {
  return useSuspenseQuery(capturedMailQueryOptions()).data;
}
