import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { equipmentKindSchema, type EquipmentKind } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { libraryKeys } from './library-keys';

const csvColumnSchema = z.object({ column: z.string(), help: z.string(), required: z.boolean() });
const csvColumnsSchema = z.record(equipmentKindSchema, z.array(csvColumnSchema));
export type CsvColumn = z.infer<typeof csvColumnSchema>;

/** The documented CSV column set of every kind. */
export function getCsvColumns(labId: number): Promise<Record<EquipmentKind, CsvColumn[]>> {
  return api.get(`/api/labs/${labId}/equipment-csv/columns`, csvColumnsSchema);
}

export const csvColumnsQueryOptions = (labId: number) =>
  queryOptions({
    queryKey: libraryKeys.csvColumns(labId),
    queryFn: () => getCsvColumns(labId),
    staleTime: Infinity,
  });

export function useCsvColumns(labId: number): Record<EquipmentKind, CsvColumn[]> {
  return useSuspenseQuery(csvColumnsQueryOptions(labId)).data;
}

/** Download addresses: an empty file with the header row, and the kind's active items as CSV. */
export const csvTemplateUrl = (labId: number, kind: EquipmentKind) =>
  `/api/labs/${labId}/equipment-csv/template?kind=${kind}`;
export const csvExportUrl = (labId: number, kind: EquipmentKind) =>
  `/api/labs/${labId}/equipment-csv/export?kind=${kind}`;
