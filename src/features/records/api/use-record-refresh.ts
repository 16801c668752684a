import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import type { PreparationDetail } from '../../../../shared/contracts/preparations';
import { recordQueryOptions } from './get-record';
import { recordsKeys } from './records-keys';

/**
 * After a review action answered with the preparation: stores it, and re-reads its versions and the
 * approved list (a version's status, trail and the approved records have changed).
 */
export function useRecordRefresh(labId: number) {
  const queryClient = useQueryClient();
  return useCallback(
    async (detail: PreparationDetail) => {
      queryClient.setQueryData(recordQueryOptions(labId, detail.id).queryKey, detail);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: recordsKeys.versions(labId, detail.id) }),
        queryClient.invalidateQueries({ queryKey: recordsKeys.approvedLists(labId) }),
      ]);
    },
    [labId, queryClient],
  );
}
