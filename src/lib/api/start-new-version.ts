import { useMutation } from '@tanstack/react-query';
import { preparationDetailSchema, type PreparationDetail } from '../../../shared/contracts/preparations';
import { api } from '../api-client';
import { usePreparationChanged } from './preparation';

/** Opens a new draft version after an approved one (which itself never changes). */
function startNewVersion(labId: number, preparationId: number): Promise<PreparationDetail> {
  return api.post(`/api/labs/${labId}/preparations/${preparationId}/versions`, {}, preparationDetailSchema);
}

export function useStartNewVersion(labId: number, preparationId: number) {
  const preparationChanged = usePreparationChanged(labId);
  return useMutation({
    mutationFn: () => startNewVersion(labId, preparationId),
    onSuccess: preparationChanged,
  });
}
