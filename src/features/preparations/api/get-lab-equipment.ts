import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { equipmentItemSchema, type EquipmentItem } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { preparationsKeys } from './preparations-keys';

const equipmentListSchema = z.array(equipmentItemSchema);

/** Every active item of the lab's library (retired items are never offered to a plan). */
export function getLabEquipment(labId: number): Promise<EquipmentItem[]> {
  return api.get(`/api/labs/${labId}/equipment?status=active`, equipmentListSchema);
}

export const labEquipmentQueryOptions = (labId: number) =>
  queryOptions({
    queryKey: preparationsKeys.equipment(labId),
    queryFn: () => getLabEquipment(labId),
  });

export function useLabEquipment(labId: number): EquipmentItem[] {
  return useSuspenseQuery(labEquipmentQueryOptions(labId)).data;
}
