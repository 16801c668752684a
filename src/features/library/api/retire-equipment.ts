import { useMutation, useQueryClient } from '@tanstack/react-query';
import { equipmentDetailSchema, type EquipmentDetail } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { equipmentItemQueryOptions } from './get-equipment-item';
import { libraryKeys } from './library-keys';

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
      queryClient.setQueryData(equipmentItemQueryOptions(labId, itemId).queryKey, detail);
      await queryClient.invalidateQueries({ queryKey: libraryKeys.lists(labId) });
    },
  });
}
