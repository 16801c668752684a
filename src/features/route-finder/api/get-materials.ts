import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { equipmentItemSchema, type EquipmentItem } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { routeFinderKeys } from './route-finder-keys';

const listSchema = z.array(equipmentItemSchema);

/** The lab's active reference materials, solid and certified solutions. */
export async function getMaterials(labId: number): Promise<EquipmentItem[]> {
  const [solids, solutions] = await Promise.all([
    api.get(`/api/labs/${labId}/equipment?kind=solid-material&status=active`, listSchema),
    api.get(`/api/labs/${labId}/equipment?kind=solution-material&status=active`, listSchema),
  ]);
  return [...solids, ...solutions];
}

export const materialsQueryOptions = (labId: number) =>
  queryOptions({ queryKey: routeFinderKeys.materials(labId), queryFn: () => getMaterials(labId) });

export function useMaterials(labId: number): EquipmentItem[] {
  return useSuspenseQuery(materialsQueryOptions(labId)).data;
}
