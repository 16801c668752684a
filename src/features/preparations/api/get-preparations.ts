import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import {
  preparationSummarySchema,
  type PreparationStatus,
  type PreparationSummary,
} from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';
import { preparationsKeys } from './preparations-keys';

/** The list filters, as the API's query takes them (all optional). */
export type PreparationListFilter = {
  status?: PreparationStatus;
  analyst?: number;
  material?: string;
  from?: string;
  to?: string;
  q?: string;
};

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
    queryKey: preparationsKeys.list(labId, filter),
    queryFn: () => getPreparations(labId, filter),
  });

export function usePreparations(labId: number, filter: PreparationListFilter): PreparationSummary[] {
  return useSuspenseQuery(preparationsQueryOptions(labId, filter)).data;
}
