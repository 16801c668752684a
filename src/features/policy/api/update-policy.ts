import { useMutation, useQueryClient } from '@tanstack/react-query';
import { labPolicyResponseSchema, type LabPolicy } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { policyQueryOptions, type StoredLabPolicy } from './get-policy';

type UpdatePolicyInput = { labId: number; policy: LabPolicy };

export function updatePolicy({ labId, policy }: UpdatePolicyInput): Promise<StoredLabPolicy> {
  return api.put(`/api/labs/${labId}/policy`, policy, labPolicyResponseSchema);
}

/** Saves the policy (QA only); settles once the stored policy has been read again. */
export function useUpdatePolicy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePolicy,
    onSuccess: (_policy, { labId }) => queryClient.invalidateQueries({ queryKey: policyQueryOptions(labId).queryKey }),
  });
}
