import type { GumValidation } from '../../../../shared/uncertainty';
import { formatSignificant } from './format-number';

/** The JCGM 101:2008 §8 comparison in words, with the numbers that decide it. */
export function validationVerdict(validation: GumValidation, unit: string): string {
  const delta = `δ = ${formatSignificant(validation.numericalTolerance, 2)} ${unit}`;
  if (validation.passed) return `The GUM interval is confirmed by Monte Carlo within ${delta}.`;
  return (
    `The GUM interval is not confirmed: the ends differ by ${formatSignificant(validation.lowEndDifference, 2)} ${unit} and ` +
    `${formatSignificant(validation.highEndDifference, 2)} ${unit}, more than ${delta}; report the Monte Carlo interval.`
  );
}
