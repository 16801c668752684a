/** Query keys of the operator's captured mail (instance-wide, not per lab). */
export const capturedMailKeys = {
  all: ['captured-mail'] as const,
  list: () => [...capturedMailKeys.all, 'list'] as const,
};
