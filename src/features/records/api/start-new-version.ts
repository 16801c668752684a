import { useMutation, useQueryClient } from '@tanstack/react-query';
import { preparationDetailSchema, type PreparationDetail } from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';
import { recordQueryOptions } from './get-record';

type StartNewVersionInput = { labId: number; preparationId: number };

/** Opens a new draft version after an approved one (which itself never changes). */
export function startNewVersion({ labId, preparationId }: StartNewVersionInput): Promise<PreparationDetail> {
  return api.post(`/api/labs/${labId}/preparations/${preparationId}/versions`, {}, preparationDetailSchema);
}

export function useStartNewVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: startNewVersion,
    onSuccess: (detail, { labId, preparationId }) => {
      queryClient.setQueryData(recordQueryOptions(labId, preparationId).queryKey, detail);
    },
  });
}
