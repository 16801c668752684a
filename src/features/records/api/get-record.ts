import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { preparationDetailSchema, type PreparationDetail } from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';
import { recordsKeys } from './records-keys';

/** The preparation with its list of versions (the latest in full). */
export function getRecord(labId: number, preparationId: number): Promise<PreparationDetail> {
  return api.get(`/api/labs/${labId}/preparations/${preparationId}`, preparationDetailSchema);
}

export const recordQueryOptions = (labId: number, preparationId: number) =>
  queryOptions({
    queryKey: recordsKeys.preparation(labId, preparationId),
    queryFn: () => getRecord(labId, preparationId),
  });

export function useRecord(labId: number, preparationId: number): PreparationDetail {
  return useSuspenseQuery(recordQueryOptions(labId, preparationId)).data;
}
