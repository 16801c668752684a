import { useMutation, useQueryClient } from '@tanstack/react-query';
import { equipmentDetailSchema, type EquipmentDetail } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { equipmentKeys } from '../../../lib/api/lab-equipment';

type ReviseEquipmentInput = { labId: number; itemId: number; data: Record<string, unknown>; reason: string };

/** Saves new data as a new revision (identical data makes none); earlier revisions stay as they were. */
export function reviseEquipment({ labId, itemId, data, reason }: ReviseEquipmentInput): Promise<EquipmentDetail> {
  return api.put(`/api/labs/${labId}/equipment/${itemId}`, { data, reason }, equipmentDetailSchema);
}

export function useReviseEquipment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: reviseEquipment,
    onSuccess: async (detail, { labId, itemId }) => {
      queryClient.setQueryData(equipmentKeys.detail(labId, itemId), detail);
      await queryClient.invalidateQueries({ queryKey: equipmentKeys.lists(labId) });
    },
  });
}
