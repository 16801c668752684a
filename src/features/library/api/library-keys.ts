import type { EquipmentKind } from '../../../../shared/contracts/library';
import type { EquipmentStatusFilter } from '../../../config/paths';

/** Query keys of the tolerance library, scoped by lab; `libraryKeys.lab(labId)` reaches the whole family. */
export const libraryKeys = {
  all: ['library'] as const,
  lab: (labId: number) => [...libraryKeys.all, labId] as const,
  lists: (labId: number) => [...libraryKeys.lab(labId), 'list'] as const,
  list: (labId: number, kind: EquipmentKind, status: EquipmentStatusFilter) =>
    [...libraryKeys.lists(labId), kind, status] as const,
  details: (labId: number) => [...libraryKeys.lab(labId), 'detail'] as const,
  detail: (labId: number, itemId: number) => [...libraryKeys.details(labId), itemId] as const,
  templates: (labId: number) => [...libraryKeys.lab(labId), 'templates'] as const,
  csvColumns: (labId: number) => [...libraryKeys.lab(labId), 'csv-columns'] as const,
};
