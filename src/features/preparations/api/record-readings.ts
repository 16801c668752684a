import { useMutation } from '@tanstack/react-query';
import {
  preparationDetailSchema,
  type PreparationDetail,
  type ReadingsRequest,
} from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';
import { usePreparationChanged } from '../../../lib/api/preparation';

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

/** Stores the answer as the preparation's one detail entry; settles once its versions and the lists are read again. */
export function useRecordReadings(labId: number, preparationId: number) {
  const preparationChanged = usePreparationChanged(labId);
  return useMutation({
    mutationFn: (input: RecordReadingsInput) => recordReadings(labId, preparationId, input),
    onSuccess: preparationChanged,
  });
}
