import { formatSignificant } from './format-figures';
import type { GumValidation } from '../../../../shared/uncertainty';

/** The JCGM 101:2008 §8 comparison of the GUM interval with the Monte Carlo interval, in words, with the numbers that decide it. */
export function validationWords(validation: GumValidation, unit: string): string {
  const tolerance = `δ = ${formatSignificant(validation.numericalTolerance)} ${unit}`;
  const ends = `the interval ends differ by ${formatSignificant(validation.lowEndDifference)} ${unit} and ${formatSignificant(validation.highEndDifference)} ${unit}`;
  return validation.passed
    ? `Confirmed: ${ends}, both within the numerical tolerance ${tolerance}.`
    : `Not confirmed: ${ends}, more than the numerical tolerance ${tolerance}. The result above states the Monte Carlo interval.`;
}
