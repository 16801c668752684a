import { useMutation, useQueryClient } from '@tanstack/react-query';
import { equipmentDetailSchema, type EquipmentDetail } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { equipmentKeys } from '../../../lib/api/lab-equipment';

type RetireEquipmentInput = { labId: number; itemId: number; reason: string };

/** Takes an item out of use; its record and every budget that used it stay readable. */
export function retireEquipment({ labId, itemId, reason }: RetireEquipmentInput): Promise<EquipmentDetail> {
  return api.post(`/api/labs/${labId}/equipment/${itemId}/retire`, { reason }, equipmentDetailSchema);
}

export function useRetireEquipment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retireEquipment,
    onSuccess: async (detail, { labId, itemId }) => {
      queryClient.setQueryData(equipmentKeys.detail(labId, itemId), detail);
      await queryClient.invalidateQueries({ queryKey: equipmentKeys.lists(labId) });
    },
  });
}
