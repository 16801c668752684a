import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { approvedRecordSchema, type ApprovedRecord } from '../../../../shared/contracts/reviews';
import { api } from '../../../lib/api-client';
import { recordsKeys } from './records-keys';

const approvedRecordListSchema = z.array(approvedRecordSchema);

/** Approved versions of the lab, newest approval first; `search` looks in title, analyte, analyst and material. */
export function getApprovedRecords(labId: number, search: string): Promise<ApprovedRecord[]> {
  const query = search ? `?${new URLSearchParams({ q: search })}` : '';
  return api.get(`/api/labs/${labId}/approved-records${query}`, approvedRecordListSchema);
}

export const approvedRecordsQueryOptions = (labId: number, search: string) =>
  queryOptions({
    queryKey: recordsKeys.approvedList(labId, search),
    queryFn: () => getApprovedRecords(labId, search),
  });

export function useApprovedRecords(labId: number, search: string): ApprovedRecord[] {
  return useSuspenseQuery(approvedRecordsQueryOptions(labId, search)).data;
}
