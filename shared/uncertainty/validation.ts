import type { BudgetResult } from './gum-budget';
import type { CompiledModel } from './model-types';
import { numericalTolerance } from './coverage-interval';
import { adaptiveBatchSize, runMonteCarlo, type MonteCarloProgress, type MonteCarloResult } from './monte-carlo';
import { MAXIMUM_MONTE_CARLO_TRIALS } from './plan-limits';
import type { Plan, PlanInput } from './plan-schema';

export interface GumValidation {
  /** δ from u_c with `significantDigits` significant digits (JCGM 101:2008 7.9.2). */
  numericalTolerance: number;
  /** |y − U_p − y_low| */
  lowEndDifference: number;
  /** |y + U_p − y_high| */
  highEndDifference: number;
  /** Validated: decided, and both differences within δ. */
  passed: boolean;
  significantDigits: number;
  /**
   * False when Monte Carlo stopped at its trial limit before its interval ends were known closely enough to judge
   * the GUM interval against δ ("not decided"). Absent in validations stored before it existed, and for a run of a
   * fixed number of trials: both read as decided.
   */
  decided?: boolean;
  /** The numerical tolerance of the Monte Carlo interval ends when the run stopped (2s of their batch means, JCGM 101:2008 7.9.4). */
  intervalEndTolerance?: number;
}

/**
 * How far below δ the Monte Carlo numerical tolerance of the interval ends must fall before the verdict is taken:
 * 2s ≤ δ/2, i.e. a standard error of each end of at most δ/4, so a model for which GUM is exact fails only on a
 * 4-standard-error excursion of an end (p ≈ 6·10⁻⁵ per end). JCGM 101:2008 §8.2 (from memory) asks for the adaptive
 * procedure to be run to a tolerance small compared with δ (a fifth of it, as we recall); δ/5 needs about
 * 6 times the trials, more than MAXIMUM_MONTE_CARLO_TRIALS for u written as 2.0, so we take δ/2 and show it is safe
 * (validation.test.ts: 20 seeds of the JCGM 101:2008 §9.2 all-normal model).
 */
export const VALIDATION_SAFETY_FACTOR = 2;

/** Batches the verdict's adaptive run always completes, so that the spread of the batch results is itself well estimated. */
export const MINIMUM_VALIDATION_BATCHES = 10;

/**
 * Validation of the GUM uncertainty framework by Monte Carlo (JCGM 101:2008 §8): with the GUM interval
 * y ± U_p and the Monte Carlo probabilistically symmetric interval [y_low, y_high] for the same p,
 * d_low = |y − U_p − y_low|, d_high = |y + U_p − y_high|; validated when both ≤ δ.
 * For an adaptive run that stopped at its trial limit unconverged, the verdict is taken only when an end differs by
 * more than δ + VALIDATION_SAFETY_FACTOR·t (t the ends' tolerance reached): not validated whatever the remaining noise;
 * otherwise it is not decided.
 */
export function validateAgainstGum(
  budget: Pick<BudgetResult, 'value' | 'standardUncertainty' | 'expandedUncertainty'>,
  monteCarlo: MonteCarloResult,
  significantDigits = 2,
): GumValidation {
  const tolerance = numericalTolerance(budget.standardUncertainty, significantDigits);
  const lowEndDifference = Math.abs(budget.value - budget.expandedUncertainty - monteCarlo.symmetricInterval.low);
  const highEndDifference = Math.abs(budget.value + budget.expandedUncertainty - monteCarlo.symmetricInterval.high);
  const within = lowEndDifference <= tolerance && highEndDifference <= tolerance;
  const comparison = { numericalTolerance: tolerance, lowEndDifference, highEndDifference, significantDigits };
  const adaptive = monteCarlo.adaptive;
  if (adaptive === undefined) return { ...comparison, passed: within };
  const reached = adaptive.reachedTolerance ?? adaptive.numericalTolerance;
  const decided =
    adaptive.converged ||
    Math.max(lowEndDifference, highEndDifference) > tolerance + VALIDATION_SAFETY_FACTOR * reached;
  return { ...comparison, passed: decided && within, decided, intervalEndTolerance: reached };
}

/**
 * The verdict on a GUM budget, as the stored record, the planner and the CLI all take it: the adaptive Monte Carlo
 * procedure (JCGM 101:2008 7.9) at the budget's coverage probability, in batches of adaptiveBatchSize(p), run until
 * the numerical tolerance of both interval ends is at most δ/VALIDATION_SAFETY_FACTOR (δ of the validation, §8.2),
 * after at least MINIMUM_VALIDATION_BATCHES batches and at most MAXIMUM_MONTE_CARLO_TRIALS trials, or as soon as an
 * end is clearly outside δ (beyond δ + (VALIDATION_SAFETY_FACTOR + 1)·t, t the ends' tolerance reached); then
 * validateAgainstGum. When the coverage probability is so high that the minimum batches exceed the trial limit, a
 * fixed run at the limit is made and the verdict is not decided. The same seed gives the same verdict everywhere.
 * `onProgress` may return false to cancel (the function then throws).
 * @throws PlanError for an invalid plan
 */
export function checkGumByMonteCarlo(
  input: CompiledModel | PlanInput | Plan,
  budget: Pick<BudgetResult, 'value' | 'standardUncertainty' | 'expandedUncertainty' | 'coverageProbability'>,
  options: { seed: number; onProgress?: (progress: MonteCarloProgress) => boolean | void },
): { monteCarlo: MonteCarloResult; validation: GumValidation } {
  const coverageProbability = budget.coverageProbability;
  const run = { seed: options.seed, coverageProbability, onProgress: options.onProgress };
  if (MINIMUM_VALIDATION_BATCHES * adaptiveBatchSize(coverageProbability) > MAXIMUM_MONTE_CARLO_TRIALS) {
    const monteCarlo = runMonteCarlo(input, { ...run, trials: MAXIMUM_MONTE_CARLO_TRIALS });
    return { monteCarlo, validation: { ...validateAgainstGum(budget, monteCarlo), passed: false, decided: false } };
  }
  const delta = numericalTolerance(budget.standardUncertainty, 2);
  // An end already beyond δ by more than (safety factor + 1)·t is "not validated" whatever more trials bring: stop there
  // (one t more than validateAgainstGum asks of the pooled ends, so the pooled verdict is decided too).
  const clearlyOutside = ({ low, high, reachedTolerance }: { low: number; high: number; reachedTolerance: number }) =>
    Math.max(
      Math.abs(budget.value - budget.expandedUncertainty - low),
      Math.abs(budget.value + budget.expandedUncertainty - high),
    ) >
    delta + (VALIDATION_SAFETY_FACTOR + 1) * reachedTolerance;
  const monteCarlo = runMonteCarlo(input, {
    ...run,
    adaptive: {
      intervalEndTolerance: delta / VALIDATION_SAFETY_FACTOR,
      minimumBatches: MINIMUM_VALIDATION_BATCHES,
      maximumTrials: MAXIMUM_MONTE_CARLO_TRIALS,
      stopEarly: clearlyOutside,
    },
  });
  return { monteCarlo, validation: validateAgainstGum(budget, monteCarlo) };
}
