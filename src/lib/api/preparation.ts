import { queryOptions, useQueryClient, useSuspenseQueries, useSuspenseQuery } from '@tanstack/react-query';
import { useCallback } from 'react';
import {
  preparationDetailSchema,
  versionDetailSchema,
  type PreparationDetail,
  type PreparationListFilter,
  type VersionDetail,
} from '../../../shared/contracts/preparations';
import { api } from '../api-client';

/**
 * Query keys of a lab's preparations. A preparation's detail is one entry read by the planner, the bench sheet,
 * the comparison and the record page; its versions sit under it, so `detail(labId, id)` reaches them too.
 */
export const preparationKeys = {
  all: ['preparations'] as const,
  lab: (labId: number) => [...preparationKeys.all, labId] as const,
  lists: (labId: number) => [...preparationKeys.lab(labId), 'list'] as const,
  list: (labId: number, filter: PreparationListFilter) => [...preparationKeys.lists(labId), filter] as const,
  details: (labId: number) => [...preparationKeys.lab(labId), 'detail'] as const,
  detail: (labId: number, preparationId: number) => [...preparationKeys.details(labId), preparationId] as const,
  versions: (labId: number, preparationId: number) =>
    [...preparationKeys.detail(labId, preparationId), 'version'] as const,
  version: (labId: number, preparationId: number, versionNumber: number) =>
    [...preparationKeys.versions(labId, preparationId), versionNumber] as const,
};

/** The preparation with its list of versions (the latest in full). */
function getPreparation(labId: number, preparationId: number): Promise<PreparationDetail> {
  return api.get(`/api/labs/${labId}/preparations/${preparationId}`, preparationDetailSchema);
}

export const preparationQueryOptions = (labId: number, preparationId: number) =>
  queryOptions({
    queryKey: preparationKeys.detail(labId, preparationId),
    queryFn: () => getPreparation(labId, preparationId),
    // The workspace owns the draft while it is open; a background refetch must not overwrite typing.
    // Pages that must show what the server holds now read it in their loader with `staleTime: 0`.
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

/** One version in full: its plan, computed snapshot, hash and review trail. */
function getVersion(labId: number, preparationId: number, versionNumber: number): Promise<VersionDetail> {
  return api.get(`/api/labs/${labId}/preparations/${preparationId}/versions/${versionNumber}`, versionDetailSchema);
}

export const versionQueryOptions = (labId: number, preparationId: number, versionNumber: number) =>
  queryOptions({
    queryKey: preparationKeys.version(labId, preparationId, versionNumber),
    queryFn: () => getVersion(labId, preparationId, versionNumber),
  });

export function useVersion(labId: number, preparationId: number, versionNumber: number): VersionDetail {
  return useSuspenseQuery(versionQueryOptions(labId, preparationId, versionNumber)).data;
}

/**
 * For every change the server answers with the preparation: stores that answer as the one detail entry, and
 * settles once its versions and the lab's preparation lists have been read again.
 */
export function usePreparationChanged(labId: number) {
  const queryClient = useQueryClient();
  return useCallback(
    async (detail: PreparationDetail) => {
      queryClient.setQueryData(preparationKeys.detail(labId, detail.id), detail);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: preparationKeys.versions(labId, detail.id) }),
        queryClient.invalidateQueries({ queryKey: preparationKeys.lists(labId) }),
      ]);
    },
    [labId, queryClient],
  );
}
