/**
 * Query keys of the library pages' own reads (item templates, CSV columns). The items themselves are
 * `equipmentKeys` (src/lib/api/lab-equipment.ts), shared with the planner and the route finder.
 */
export const libraryKeys = {
  all: ['library'] as const,
  lab: (labId: number) => [...libraryKeys.all, labId] as const,
  templates: (labId: number) => [...libraryKeys.lab(labId), 'templates'] as const,
  csvColumns: (labId: number) => [...libraryKeys.lab(labId), 'csv-columns'] as const,
};
