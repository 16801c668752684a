/** Query keys of the outbox feature, scoped by lab. */
export const outboxKeys = {
  all: ['outbox'] as const,
  list: (labId: number) => [...outboxKeys.all, labId] as const,
};
