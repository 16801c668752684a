import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { equipmentItemSchema, type EquipmentItem, type EquipmentKind } from '../../../../shared/contracts/library';
import type { EquipmentStatusFilter } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { libraryKeys } from './library-keys';

const equipmentListSchema = z.array(equipmentItemSchema);

export function getEquipmentList(
  labId: number,
  kind: EquipmentKind,
  status: EquipmentStatusFilter,
): Promise<EquipmentItem[]> {
  const query = new URLSearchParams({ kind, status });
  return api.get(`/api/labs/${labId}/equipment?${query}`, equipmentListSchema);
}

export const equipmentListQueryOptions = (labId: number, kind: EquipmentKind, status: EquipmentStatusFilter) =>
  queryOptions({
    queryKey: libraryKeys.list(labId, kind, status),
    queryFn: () => getEquipmentList(labId, kind, status),
  });

export function useEquipmentList(labId: number, kind: EquipmentKind, status: EquipmentStatusFilter): EquipmentItem[] {
  return useSuspenseQuery(equipmentListQueryOptions(labId, kind, status)).data;
}
