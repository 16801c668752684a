import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import { labPolicyResponseSchema } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { policyKeys } from './policy-keys';

export type StoredLabPolicy = z.infer<typeof labPolicyResponseSchema>;

/** The lab's policy for budgets, with who set it and when (both null while the defaults apply). */
export function getPolicy(labId: number): Promise<StoredLabPolicy> {
  return api.get(`/api/labs/${labId}/policy`, labPolicyResponseSchema);
}

export const policyQueryOptions = (labId: number) =>
  queryOptions({
    queryKey: policyKeys.lab(labId),
    queryFn: () => getPolicy(labId),
  });

export function usePolicy(labId: number): StoredLabPolicy {
  return useSuspenseQuery(policyQueryOptions(labId)).data;
}
