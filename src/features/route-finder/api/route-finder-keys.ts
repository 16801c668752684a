/** Query keys of the route finder's reads, scoped by lab. */
export const routeFinderKeys = {
  all: ['route-finder'] as const,
  materials: (labId: number) => [...routeFinderKeys.all, labId, 'materials'] as const,
};
