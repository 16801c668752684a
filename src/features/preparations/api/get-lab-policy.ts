import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { labPolicySchema, type LabPolicy } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { preparationsKeys } from './preparations-keys';

/** The lab's budget policy (coverage, glassware distribution, temperature range), applied to every live budget. */
export function getLabPolicy(labId: number): Promise<LabPolicy> {
  return api.get(`/api/labs/${labId}/policy`, labPolicySchema);
}

export const labPolicyQueryOptions = (labId: number) =>
  queryOptions({
    queryKey: preparationsKeys.policy(labId),
    queryFn: () => getLabPolicy(labId),
  });

export function useLabPolicy(labId: number): LabPolicy {
  return useSuspenseQuery(labPolicyQueryOptions(labId)).data;
}
