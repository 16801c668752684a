/** Query keys of the review workflow, scoped by lab; `reviewsKeys.lab(labId)` reaches the whole family. */
export const reviewsKeys = {
  all: ['reviews'] as const,
  lab: (labId: number) => [...reviewsKeys.all, labId] as const,
  queue: (labId: number) => [...reviewsKeys.lab(labId), 'queue'] as const,
};
