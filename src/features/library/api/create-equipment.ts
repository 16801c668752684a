import { useMutation, useQueryClient } from '@tanstack/react-query';
import { equipmentDetailSchema, type EquipmentDetail, type EquipmentKind } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { equipmentKeys } from '../../../lib/api/lab-equipment';

type CreateEquipmentInput = { labId: number; kind: EquipmentKind; data: Record<string, unknown>; reason?: string };

export function createEquipment({ labId, kind, data, reason }: CreateEquipmentInput): Promise<EquipmentDetail> {
  return api.post(`/api/labs/${labId}/equipment`, { kind, data, ...(reason ? { reason } : {}) }, equipmentDetailSchema);
}

/** Adds an item; settles once every list of the lab's library has been read again. */
export function useCreateEquipment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createEquipment,
    onSuccess: (_detail, { labId }) => queryClient.invalidateQueries({ queryKey: equipmentKeys.lists(labId) }),
  });
}
