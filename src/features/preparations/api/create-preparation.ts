import { useMutation } from '@tanstack/react-query';
import {
  preparationDetailSchema,
  type PreparationDetail,
  type PreparationWrite,
} from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';
import { usePreparationChanged } from '../../../lib/api/preparation';

export function createPreparation(labId: number, write: PreparationWrite): Promise<PreparationDetail> {
  return api.post(`/api/labs/${labId}/preparations`, write, preparationDetailSchema);
}

/** Creates a preparation (its first draft version), puts it in the cache and refreshes the lists. */
export function useCreatePreparation(labId: number) {
  const preparationChanged = usePreparationChanged(labId);
  return useMutation({
    mutationFn: (write: PreparationWrite) => createPreparation(labId, write),
    onSuccess: preparationChanged,
  });
}
