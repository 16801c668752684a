/** Query keys of the lab policy, one per lab. */
export const policyKeys = {
  all: ['policy'] as const,
  lab: (labId: number) => [...policyKeys.all, labId] as const,
};
