import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { deliveryLogEntrySchema, type DeliveryLogEntry } from '../../../../shared/contracts/members';
import { api } from '../../../lib/api-client';
import { membersKeys } from './members-keys';

const deliveryLogSchema = z.array(deliveryLogEntrySchema);

/** The lab's mail delivery log (to, subject, time), newest first whatever order the server sends. */
export async function getDeliveryLog(labId: number): Promise<DeliveryLogEntry[]> {
  const entries = await api.get(`/api/labs/${labId}/delivery-log`, deliveryLogSchema);
  return entries.toSorted((first, second) => second.createdAt.localeCompare(first.createdAt) || second.id - first.id);
}

export const deliveryLogQueryOptions = (labId: number) =>
  queryOptions({
    queryKey: membersKeys.deliveryLog(labId),
    queryFn: () => getDeliveryLog(labId),
  });

export function useDeliveryLog(labId: number): DeliveryLogEntry[] {
  return useSuspenseQuery(deliveryLogQueryOptions(labId)).data;
}
