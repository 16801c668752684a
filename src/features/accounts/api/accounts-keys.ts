/** Query keys of the operator's account list (instance-wide, not per lab). */
export const accountsKeys = {
  all: ['accounts'] as const,
  list: () => [...accountsKeys.all, 'list'] as const,
};
