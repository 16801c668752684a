import { useMutation, useQueryClient } from '@tanstack/react-query';
import { importResultSchema, type EquipmentKind, type ImportResult } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { equipmentKeys } from '../../../lib/api/lab-equipment';

type ImportInput = { labId: number; kind: EquipmentKind; csv: string; dryRun: boolean };

/**
 * Checks (dry run) or imports a CSV file of one kind. A real import with any error row is refused
 * whole (`400 import_rejected`) and writes nothing.
 */
export function importEquipmentCsv({ labId, kind, csv, dryRun }: ImportInput): Promise<ImportResult> {
  return api.post(`/api/labs/${labId}/equipment-csv/import`, { kind, csv, dryRun }, importResultSchema);
}

export function useImportEquipmentCsv() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importEquipmentCsv,
    onSuccess: async (result, { labId }) => {
      if (result.written) await queryClient.invalidateQueries({ queryKey: equipmentKeys.lab(labId) });
    },
  });
}
