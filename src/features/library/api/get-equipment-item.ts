import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { equipmentDetailSchema, type EquipmentDetail } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { libraryKeys } from './library-keys';

/** One item with its revisions (newest first) and certificates. */
export function getEquipmentItem(labId: number, itemId: number): Promise<EquipmentDetail> {
  return api.get(`/api/labs/${labId}/equipment/${itemId}`, equipmentDetailSchema);
}

export const equipmentItemQueryOptions = (labId: number, itemId: number) =>
  queryOptions({
    queryKey: libraryKeys.detail(labId, itemId),
    queryFn: () => getEquipmentItem(labId, itemId),
  });

export function useEquipmentItem(labId: number, itemId: number): EquipmentDetail {
  return useSuspenseQuery(equipmentItemQueryOptions(labId, itemId)).data;
}
