/**
 * Work that runs after the answer has gone (mail for a reset request, refunding an attempt).
 * A failure is logged, never thrown; `idle()` lets shutdown wait until it has finished.
 */
export function backgroundWork(log: (message: string, error?: unknown) => void) {
  const pending = new Set<Promise<void>>();
  return {
    run(what: string, task: () => Promise<unknown>): void {
      const done: Promise<void> = task().then(
        () => undefined,
        (error: unknown) => log(`${what} failed`, error),
      );
      pending.add(done);
      void done.finally(() => pending.delete(done));
    },
    async idle(): Promise<void> {
      while (pending.size > 0) await Promise.all([...pending]);
    },
  };
}
export type BackgroundWork = ReturnType<typeof backgroundWork>;
