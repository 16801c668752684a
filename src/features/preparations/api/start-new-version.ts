import { useMutation, useQueryClient } from '@tanstack/react-query';
import { preparationDetailSchema, type PreparationDetail } from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';
import { preparationsKeys } from './preparations-keys';

export function startNewVersion(labId: number, preparationId: number): Promise<PreparationDetail> {
  return api.post(`/api/labs/${labId}/preparations/${preparationId}/versions`, {}, preparationDetailSchema);
}

/** Opens a new draft version from the latest (read-only) one. */
export function useStartNewVersion(labId: number, preparationId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => startNewVersion(labId, preparationId),
    onSuccess: async (detail) => {
      queryClient.setQueryData(preparationsKeys.detail(labId, preparationId), detail);
      await queryClient.invalidateQueries({ queryKey: preparationsKeys.lists(labId) });
    },
  });
}
