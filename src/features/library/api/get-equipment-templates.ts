import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import type { GlasswareTemplate, PistonTemplate } from '../../../../shared/contracts/equipment-templates';
import { api } from '../../../lib/api-client';
import { libraryKeys } from './library-keys';

// The shared contract states these shapes as interfaces; the annotations keep the schemas in step with them.
const provenanceSchema = z.enum(['read', 'memory']);
const glasswareTemplateSchema: z.ZodType<GlasswareTemplate> = z.object({
  kind: z.enum(['flask', 'glass-pipette']),
  standard: z.string(),
  glassClass: z.enum(['A', 'B']),
  nominalMl: z.number(),
  toleranceMl: z.number(),
  provenance: provenanceSchema,
});
const pistonTemplateSchema: z.ZodType<PistonTemplate> = z.object({
  kind: z.literal('piston-pipette'),
  standard: z.string(),
  nominalUl: z.number(),
  systematicErrorUl: z.number(),
  randomErrorUl: z.number(),
  provenance: provenanceSchema,
});
const equipmentTemplatesSchema = z.object({
  glassware: z.array(glasswareTemplateSchema),
  piston: z.array(pistonTemplateSchema),
});
export type EquipmentTemplates = z.infer<typeof equipmentTemplatesSchema>;

/** ISO 1042:1998, ISO 648:2008 and ISO 8655-2:2002 tolerances for the common nominal volumes. */
export function getEquipmentTemplates(labId: number): Promise<EquipmentTemplates> {
  return api.get(`/api/labs/${labId}/equipment-templates`, equipmentTemplatesSchema);
}

export const equipmentTemplatesQueryOptions = (labId: number) =>
  queryOptions({
    queryKey: libraryKeys.templates(labId),
    queryFn: () => getEquipmentTemplates(labId),
    staleTime: Infinity,
  });

export function useEquipmentTemplates(labId: number): EquipmentTemplates {
  return useSuspenseQuery(equipmentTemplatesQueryOptions(labId)).data;
}
