import { numericalTolerance } from './coverage-interval';
import type { BudgetResult } from './gum-budget';
import type { MonteCarloResult } from './monte-carlo';

export interface GumValidation {
  /** δ from u_c with `significantDigits` significant digits (JCGM 101:2008 7.9.2). */
  numericalTolerance: number;
  /** |y − U_p − y_low| */
  lowEndDifference: number;
  /** |y + U_p − y_high| */
  highEndDifference: number;
  passed: boolean;
  significantDigits: number;
}

/**
 * Validation of the GUM uncertainty framework by Monte Carlo (JCGM 101:2008 §8): with the GUM interval
 * y ± U_p and the Monte Carlo probabilistically symmetric interval [y_low, y_high] for the same p,
 * d_low = |y − U_p − y_low|, d_high = |y + U_p − y_high|; validated when both ≤ δ.
 */
export function validateAgainstGum(
  budget: Pick<BudgetResult, 'value' | 'standardUncertainty' | 'expandedUncertainty'>,
  monteCarlo: MonteCarloResult,
  significantDigits = 2,
): GumValidation {
  const tolerance = numericalTolerance(budget.standardUncertainty, significantDigits);
  const lowEndDifference = Math.abs(budget.value - budget.expandedUncertainty - monteCarlo.symmetricInterval.low);
  const highEndDifference = Math.abs(budget.value + budget.expandedUncertainty - monteCarlo.symmetricInterval.high);
  return {
    numericalTolerance: tolerance,
    lowEndDifference,
    highEndDifference,
    passed: lowEndDifference <= tolerance && highEndDifference <= tolerance,
    significantDigits,
  };
}
