import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import {
  equipmentDetailSchema,
  equipmentItemSchema,
  type EquipmentDetail,
  type EquipmentItem,
  type EquipmentKind,
} from '../../../shared/contracts/library';
import type { EquipmentStatusFilter } from '../../config/paths';
import { api } from '../api-client';

/** Which items a list holds: one kind or all, by status. */
export type EquipmentListFilter = { kind?: EquipmentKind; status: EquipmentStatusFilter };

/**
 * Query keys of a lab's equipment (the tolerance library). The library pages, the planner, the bench sheet and
 * the route finder read these entries, so invalidating `equipmentKeys.lists(labId)` reaches every list.
 */
export const equipmentKeys = {
  all: ['equipment'] as const,
  lab: (labId: number) => [...equipmentKeys.all, labId] as const,
  lists: (labId: number) => [...equipmentKeys.lab(labId), 'list'] as const,
  list: (labId: number, filter: EquipmentListFilter) => [...equipmentKeys.lists(labId), filter] as const,
  details: (labId: number) => [...equipmentKeys.lab(labId), 'detail'] as const,
  detail: (labId: number, itemId: number) => [...equipmentKeys.details(labId), itemId] as const,
};

const equipmentListSchema = z.array(equipmentItemSchema);

function getEquipmentList(labId: number, { kind, status }: EquipmentListFilter): Promise<EquipmentItem[]> {
  const query = new URLSearchParams(kind ? { kind, status } : { status });
  return api.get(`/api/labs/${labId}/equipment?${query}`, equipmentListSchema);
}

export const equipmentListQueryOptions = (labId: number, filter: EquipmentListFilter) =>
  queryOptions({ queryKey: equipmentKeys.list(labId, filter), queryFn: () => getEquipmentList(labId, filter) });

export function useEquipmentList(labId: number, filter: EquipmentListFilter): EquipmentItem[] {
  return useSuspenseQuery(equipmentListQueryOptions(labId, filter)).data;
}

/** Every active item of the lab's library: what a plan may use (retired items are never offered). */
export const activeEquipmentQueryOptions = (labId: number) => equipmentListQueryOptions(labId, { status: 'active' });

export function useActiveEquipment(labId: number): EquipmentItem[] {
  return useSuspenseQuery(activeEquipmentQueryOptions(labId)).data;
}

/** One item with its revisions (newest first) and certificates. */
function getEquipmentItem(labId: number, itemId: number): Promise<EquipmentDetail> {
  return api.get(`/api/labs/${labId}/equipment/${itemId}`, equipmentDetailSchema);
}

export const equipmentItemQueryOptions = (labId: number, itemId: number) =>
  queryOptions({ queryKey: equipmentKeys.detail(labId, itemId), queryFn: () => getEquipmentItem(labId, itemId) });

export function useEquipmentItem(labId: number, itemId: number): EquipmentDetail {
  return useSuspenseQuery(equipmentItemQueryOptions(labId, itemId)).data;
}
