/** Query keys of preparation records, scoped by lab; `recordsKeys.lab(labId)` reaches the whole family. */
export const recordsKeys = {
  all: ['records'] as const,
  lab: (labId: number) => [...recordsKeys.all, labId] as const,
  approvedLists: (labId: number) => [...recordsKeys.lab(labId), 'approved'] as const,
  approvedList: (labId: number, search: string) => [...recordsKeys.approvedLists(labId), search] as const,
  preparation: (labId: number, preparationId: number) =>
    [...recordsKeys.lab(labId), 'preparation', preparationId] as const,
  versions: (labId: number, preparationId: number) =>
    [...recordsKeys.preparation(labId, preparationId), 'version'] as const,
  version: (labId: number, preparationId: number, versionNumber: number) =>
    [...recordsKeys.versions(labId, preparationId), versionNumber] as const,
};
