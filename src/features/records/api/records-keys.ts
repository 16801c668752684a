/**
 * Query keys of the approved records, scoped by lab. A record's preparation and versions are the shared
 * `preparationKeys` entries (src/lib/api/preparation.ts).
 */
export const recordsKeys = {
  all: ['records'] as const,
  lab: (labId: number) => [...recordsKeys.all, labId] as const,
  approvedLists: (labId: number) => [...recordsKeys.lab(labId), 'approved'] as const,
  approvedList: (labId: number, search: string) => [...recordsKeys.approvedLists(labId), search] as const,
};
