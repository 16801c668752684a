import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { versionDetailSchema, type VersionDetail } from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';
import { recordsKeys } from './records-keys';

/** One version in full: its plan, computed snapshot, hash and review trail. */
export function getRecordVersion(labId: number, preparationId: number, versionNumber: number): Promise<VersionDetail> {
  return api.get(`/api/labs/${labId}/preparations/${preparationId}/versions/${versionNumber}`, versionDetailSchema);
}

export const recordVersionQueryOptions = (labId: number, preparationId: number, versionNumber: number) =>
  queryOptions({
    queryKey: recordsKeys.version(labId, preparationId, versionNumber),
    queryFn: () => getRecordVersion(labId, preparationId, versionNumber),
  });

export function useRecordVersion(labId: number, preparationId: number, versionNumber: number): VersionDetail {
  return useSuspenseQuery(recordVersionQueryOptions(labId, preparationId, versionNumber)).data;
}
