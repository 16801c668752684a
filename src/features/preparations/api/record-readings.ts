import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  preparationDetailSchema,
  type PreparationDetail,
  type ReadingsRequest,
} from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';
import { preparationsKeys } from './preparations-keys';

type RecordReadingsInput = { versionNumber: number; request: ReadingsRequest };

/** Records (or corrects) the masses weighed at the bench; the server recomputes the budget on them and marks the version prepared. */
export function recordReadings(
  labId: number,
  preparationId: number,
  { versionNumber, request }: RecordReadingsInput,
): Promise<PreparationDetail> {
  return api.post(
    `/api/labs/${labId}/preparations/${preparationId}/versions/${versionNumber}/readings`,
    request,
    preparationDetailSchema,
  );
}

/** `onRecorded` lets the page refresh what other features cache about the preparation (its record). */
export function useRecordReadings(
  labId: number,
  preparationId: number,
  onRecorded?: (detail: PreparationDetail) => Promise<unknown>,
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: RecordReadingsInput) => recordReadings(labId, preparationId, input),
    onSuccess: async (detail) => {
      queryClient.setQueryData(preparationsKeys.detail(labId, preparationId), detail);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: preparationsKeys.lists(labId) }),
        onRecorded?.(detail),
      ]);
    },
  });
}
