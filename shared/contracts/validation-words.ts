import { groupedDigits, MAXIMUM_MONTE_CARLO_TRIALS } from '../uncertainty/plan-limits';
import { verdictFigure } from '../uncertainty/result-rounding';
import type { GumValidation } from '../uncertainty/validation';

/** The three verdicts of the JCGM 101:2008 §8 validation; a validation stored before `decided` existed is decided. */
export type ValidationOutcome = 'confirmed' | 'notConfirmed' | 'notDecided';

export function validationOutcome(validation: GumValidation): ValidationOutcome {
  if (validation.decided === false) return 'notDecided';
  return validation.passed ? 'confirmed' : 'notConfirmed';
}

/** The verdict in three words, for a badge: the same on the record page and in the planner. */
export const VALIDATION_HEADLINES: Record<ValidationOutcome, string> = {
  confirmed: 'GUM result confirmed',
  notConfirmed: 'GUM result not confirmed',
  notDecided: 'GUM result not decided',
};

/**
 * The JCGM 101:2008 §8 comparison of the GUM interval with the Monte Carlo interval, in words, with the numbers that
 * decide it: one voice for the record page and the planner's Monte Carlo panel.
 */
export function validationWords(validation: GumValidation, unit: string, statesMonteCarlo = true): string {
  const instead = statesMonteCarlo
    ? 'The result above states the Monte Carlo interval.'
    : 'This record was computed before Dilutrace stated the Monte Carlo interval in that case, so its result is the GUM interval, as it was signed.';
  const tolerance = `δ = ${verdictFigure(validation.numericalTolerance)} ${unit}`;
  const ends = `the interval ends differ by ${verdictFigure(validation.lowEndDifference)} ${unit} and ${verdictFigure(validation.highEndDifference)} ${unit}`;
  switch (validationOutcome(validation)) {
    case 'confirmed':
      return `Confirmed: ${ends}, both within the numerical tolerance ${tolerance}.`;
    case 'notConfirmed':
      return `Not confirmed: ${ends}, more than the numerical tolerance ${tolerance}. ${instead}`;
    case 'notDecided': {
      const limit = `${groupedDigits(MAXIMUM_MONTE_CARLO_TRIALS)} trials`;
      const known =
        validation.intervalEndTolerance === undefined
          ? `at this coverage probability Monte Carlo cannot place its interval ends closely enough within ${limit}`
          : `after ${limit} Monte Carlo still knows its interval ends only to within ${verdictFigure(validation.intervalEndTolerance)} ${unit}`;
      return `Not decided: ${known}, too coarse to judge the GUM interval against the numerical tolerance ${tolerance}; ${ends}. ${instead}`;
    }
  }
}
