import { useMutation } from '@tanstack/react-query';
import { preparationDetailSchema, type PreparationDetail } from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';
import { usePreparationChanged } from '../../../lib/api/preparation';

export function duplicatePreparation(labId: number, preparationId: number, title?: string): Promise<PreparationDetail> {
  return api.post(
    `/api/labs/${labId}/preparations/${preparationId}/duplicate`,
    title ? { title } : {},
    preparationDetailSchema,
  );
}

/** Copies a preparation's latest plan into a new preparation (a variant to compare). */
export function useDuplicatePreparation(labId: number, preparationId: number) {
  const preparationChanged = usePreparationChanged(labId);
  return useMutation({
    mutationFn: (title?: string) => duplicatePreparation(labId, preparationId, title),
    onSuccess: preparationChanged,
  });
}
