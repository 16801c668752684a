/**
 * Size caps of a plan document, so that one plan's computation stays bounded for every lab sharing the
 * server. Each is stated in docs/plan-format.md; a plan beyond one is refused with a message saying which.
 */

/** Steps in one plan: a long serial dilution with weighings is well under 20. */
export const MAXIMUM_PLAN_STEPS = 20;

/** Extra sources on one step. */
export const MAXIMUM_EXTRA_SOURCES_PER_STEP = 20;

/** Characters in a chemical formula (after spaces are removed). */
export const MAXIMUM_FORMULA_LENGTH = 100;

/** Brackets inside brackets in a chemical formula: K3[Fe(CN)6] nests 2 deep. */
export const MAXIMUM_FORMULA_NESTING = 5;

/** Monte Carlo trials of one run, fixed or adaptive. */
export const MAXIMUM_MONTE_CARLO_TRIALS = 1_000_000;

/** Writes a whole number with thin groups a chemist reads: 1000000 → "1 000 000". */
export function groupedDigits(value: number): string {
  return String(value).replace(/\B(?=(\d{3})+(?!\d))/g, ' ');
}
