import { queryOptions, useMutation, useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import { labPolicyResponseSchema, type LabPolicy } from '../../../shared/contracts/library';
import { api } from '../api-client';

/** Query keys of the lab policy, one per lab: the policy page and the planner read the same entry. */
export const policyKeys = {
  all: ['policy'] as const,
  detail: (labId: number) => [...policyKeys.all, labId] as const,
};

export type StoredLabPolicy = z.infer<typeof labPolicyResponseSchema>;

/** The lab's budget policy (coverage, glassware distribution, temperature range), with who set it and when. */
function getLabPolicy(labId: number): Promise<StoredLabPolicy> {
  return api.get(`/api/labs/${labId}/policy`, labPolicyResponseSchema);
}

export const labPolicyQueryOptions = (labId: number) =>
  queryOptions({ queryKey: policyKeys.detail(labId), queryFn: () => getLabPolicy(labId) });

/** How often an open planner asks for the policy again, so QA's change in another browser reaches it. */
const PLANNER_POLICY_REFRESH_MS = 30_000;

/**
 * The lab policy. `live`: re-read it every 30 s while the page is open (the planner, which computes with it);
 * a change saved in this browser reaches every reader at once through the invalidation of the save.
 */
export function useLabPolicy(labId: number, { live = false }: { live?: boolean } = {}): StoredLabPolicy {
  return useSuspenseQuery({
    ...labPolicyQueryOptions(labId),
    refetchInterval: live ? PLANNER_POLICY_REFRESH_MS : false,
  }).data;
}

type UpdateLabPolicyInput = { labId: number; policy: LabPolicy };

function updateLabPolicy({ labId, policy }: UpdateLabPolicyInput): Promise<StoredLabPolicy> {
  return api.put(`/api/labs/${labId}/policy`, policy, labPolicyResponseSchema);
}

/** Saves the policy (QA only); settles once every reader of it (an open planner too) has read it again. */
export function useUpdateLabPolicy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateLabPolicy,
    onSuccess: (_policy, { labId }) => queryClient.invalidateQueries({ queryKey: policyKeys.detail(labId) }),
  });
}
