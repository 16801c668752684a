import type { PreparationListFilter } from './get-preparations';

/** Query keys of a lab's preparations; `preparationsKeys.lab(labId)` reaches the whole family. */
export const preparationsKeys = {
  all: ['preparations'] as const,
  lab: (labId: number) => [...preparationsKeys.all, labId] as const,
  lists: (labId: number) => [...preparationsKeys.lab(labId), 'list'] as const,
  list: (labId: number, filter: PreparationListFilter) => [...preparationsKeys.lists(labId), filter] as const,
  details: (labId: number) => [...preparationsKeys.lab(labId), 'detail'] as const,
  detail: (labId: number, preparationId: number) => [...preparationsKeys.details(labId), preparationId] as const,
  equipment: (labId: number) => [...preparationsKeys.lab(labId), 'equipment'] as const,
  policy: (labId: number) => [...preparationsKeys.lab(labId), 'policy'] as const,
};
