import {
  formatResultStatement,
  roundIntervalToUncertainty,
  roundToUncertainty,
  verdictFigure,
} from './result-rounding';

/** Which Monte Carlo coverage interval a result states when the GUM interval is not validated (JCGM 101:2008 7.7). */
export const MONTE_CARLO_INTERVALS = ['symmetric', 'shortest'] as const;
export type MonteCarloInterval = (typeof MONTE_CARLO_INTERVALS)[number];

const INTERVAL_WORDS: Record<MonteCarloInterval, string> = {
  symmetric: 'probabilistically symmetric',
  shortest: 'shortest',
};

/** What a result statement is made of: a computed budget, its Monte Carlo run and their comparison, live or stored. */
export interface StatedResult {
  /** The engine that computed a stored result; absent for a live one. */
  engineVersion?: string;
  plan: { settings: { monteCarloInterval?: MonteCarloInterval } };
  budget: {
    measurand: string;
    unit: string;
    value: number;
    expandedUncertainty: number;
    coverageFactor: number;
    coverageProbability: number;
    /** The temperature a result per volume is stated at; absent for a mass fraction, a molality, or an old snapshot. */
    referenceTemperatureC?: number;
  };
  monteCarlo: {
    coverageProbability: number;
    symmetricInterval: { low: number; high: number };
    shortestInterval: { low: number; high: number };
  } | null;
  validation: {
    passed: boolean;
    /** false when the trial limit came before the interval ends were known well enough to judge (absent: decided). */
    decided?: boolean;
    lowEndDifference: number;
    highEndDifference: number;
    numericalTolerance: number;
  } | null;
}

/** The result as stated on the record: one voice for the planner, the record page, the PDF, the e-mails and the CLI. */
export interface ResultStatement {
  /** 'gum': value ± U with k; 'monteCarlo': value with the Monte Carlo coverage interval. */
  method: 'gum' | 'monteCarlo';
  /** The statement, one line: "c(Pb) = (10.012 ± 0.054) mg/L, k = 2.00, coverage probability ≈ 95.45 %". */
  text: string;
  /** Why the Monte Carlo interval is stated instead of U, with the numbers that decided it; null for GUM. */
  reason: string | null;
  valueText: string;
  /** "± 0.054" or "[9.958, 10.066]", without the unit. */
  intervalText: string;
  /** "k = 2.00" or "Monte Carlo interval". */
  coverageText: string;
}

/** The first engine that states the Monte Carlo interval when GUM is not validated. */
const MONTE_CARLO_STATEMENT_SINCE = [1, 1];

/**
 * A result stored by an engine before MONTE_CARLO_STATEMENT_SINCE keeps the GUM statement it was computed, reviewed
 * and signed with: a signed record never changes its words afterwards (its verdict says so, see validation-words.ts).
 */
export function statedAsSigned(engineVersion: string | undefined): boolean {
  if (engineVersion === undefined) return false;
  const [major = 0, minor = 0] = engineVersion.split('.').map(Number);
  const [sinceMajor, sinceMinor] = MONTE_CARLO_STATEMENT_SINCE;
  return major < sinceMajor || (major === sinceMajor && minor < sinceMinor);
}

/**
 * States a result as a laboratory reports it. GUM (JCGM 100:2008 7.2.3): y ± U with k and the coverage
 * probability. When Monte Carlo does not validate the GUM interval (JCGM 101:2008 §8: an end differs by more than
 * the numerical tolerance δ), the Monte Carlo coverage interval for the same probability is stated instead
 * (JCGM 101:2008 §8 and 7.7; probabilistically symmetric, or the shortest by lab policy) with the reason. The value
 * is y = f(x), the same on every screen; the interval's ends are rounded to the decimal place of the value rounded
 * to the interval's half-width at two significant digits (result-rounding.ts). Stored snapshots are stated from
 * their stored numbers the same way; a plan stored before the policy existed states the symmetric interval.
 */
export function resultStatement(result: StatedResult): ResultStatement {
  const { budget, monteCarlo, validation } = result;
  if (!monteCarlo || !validation || validation.passed || statedAsSigned(result.engineVersion)) {
    const rounded = roundToUncertainty(budget.value, budget.expandedUncertainty);
    const coverageText = `k = ${budget.coverageFactor.toFixed(2)}`;
    return {
      method: 'gum',
      text: formatResultStatement(budget),
      reason: null,
      valueText: rounded.valueText,
      intervalText: `± ${rounded.uncertaintyText}`,
      coverageText,
    };
  }
  const choice = result.plan.settings.monteCarloInterval ?? 'symmetric';
  const interval = choice === 'shortest' ? monteCarlo.shortestInterval : monteCarlo.symmetricInterval;
  const rounded = roundIntervalToUncertainty(budget.value, interval);
  const unit = (text: string) => (budget.unit === '1' || budget.unit === '' ? text : `${text} ${budget.unit}`);
  const percent = (monteCarlo.coverageProbability * 100).toFixed(2);
  const intervalText = `[${rounded.lowText}, ${rounded.highText}]`;
  const temperature = budget.referenceTemperatureC === undefined ? '' : ` at ${budget.referenceTemperatureC} °C`;
  return {
    method: 'monteCarlo',
    text: `${budget.measurand} = ${unit(rounded.valueText)}${temperature}, ${percent} % coverage interval ${unit(intervalText)}, Monte Carlo interval (${INTERVAL_WORDS[choice]}; the GUM interval is not validated)`,
    reason:
      (validation.decided === false
        ? `Monte Carlo (JCGM 101 §8) could not judge the GUM interval y ± U within its trial limit: its ends differ ` +
          `from the Monte Carlo interval by ${unit(verdictFigure(validation.lowEndDifference))} and ${unit(verdictFigure(validation.highEndDifference))}, ` +
          `against the numerical tolerance δ = ${unit(verdictFigure(validation.numericalTolerance))}, so the Monte Carlo `
        : `Monte Carlo (JCGM 101 §8) does not validate the GUM interval y ± U: its ends differ from the Monte Carlo ` +
          `interval by ${unit(verdictFigure(validation.lowEndDifference))} and ${unit(verdictFigure(validation.highEndDifference))}, ` +
          `more than the numerical tolerance δ = ${unit(verdictFigure(validation.numericalTolerance))}, so the Monte Carlo `) +
      `coverage interval is stated instead of U = ${unit(roundToUncertainty(budget.value, budget.expandedUncertainty).uncertaintyText)} (k = ${budget.coverageFactor.toFixed(2)}).`,
    valueText: rounded.valueText,
    intervalText,
    coverageText: 'Monte Carlo interval',
  };
}
