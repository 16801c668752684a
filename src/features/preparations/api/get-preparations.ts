import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { preparationSummarySchema, type PreparationSummary } from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';
import { preparationKeys } from '../../../lib/api/preparation';
import type { PreparationListFilter } from '../../../../shared/contracts/preparations';

const listSchema = z.array(preparationSummarySchema);

export function getPreparations(labId: number, filter: PreparationListFilter): Promise<PreparationSummary[]> {
  const query = new URLSearchParams();
  for (const [name, value] of Object.entries(filter))
    if (value !== undefined && value !== '') query.set(name, String(value));
  const search = query.toString();
  return api.get(`/api/labs/${labId}/preparations${search ? `?${search}` : ''}`, listSchema);
}

export const preparationsQueryOptions = (labId: number, filter: PreparationListFilter) =>
  queryOptions({
    queryKey: preparationKeys.list(labId, filter),
    queryFn: () => getPreparations(labId, filter),
  });

export function usePreparations(labId: number, filter: PreparationListFilter): PreparationSummary[] {
  return useSuspenseQuery(preparationsQueryOptions(labId, filter)).data;
}
