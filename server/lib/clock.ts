/** Time source passed into the app so tests can move it. */
export interface Clock {
  now(): Date;
}

export const systemClock: Clock = { now: () => new Date() };

/** The ISO time `ms` milliseconds after `from` (an expiry from a clock reading). */
export const isoAfter = (from: Date, ms: number): string => new Date(from.getTime() + ms).toISOString();
