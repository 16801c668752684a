import { queryOptions, useSuspenseQueries, useSuspenseQuery } from '@tanstack/react-query';
import { preparationDetailSchema, type PreparationDetail } from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';
import { preparationsKeys } from './preparations-keys';

export function getPreparation(labId: number, preparationId: number): Promise<PreparationDetail> {
  return api.get(`/api/labs/${labId}/preparations/${preparationId}`, preparationDetailSchema);
}

export const preparationQueryOptions = (labId: number, preparationId: number) =>
  queryOptions({
    queryKey: preparationsKeys.detail(labId, preparationId),
    queryFn: () => getPreparation(labId, preparationId),
    // The workspace owns the draft while it is open; a background refetch must not overwrite typing.
    staleTime: Infinity,
  });

export function usePreparation(labId: number, preparationId: number): PreparationDetail {
  return useSuspenseQuery(preparationQueryOptions(labId, preparationId)).data;
}

/** Several preparations at once, in the order asked (for the comparison). */
export function usePreparationList(labId: number, preparationIds: number[]): PreparationDetail[] {
  return useSuspenseQueries({ queries: preparationIds.map((id) => preparationQueryOptions(labId, id)) }).map(
    (result) => result.data,
  );
}
