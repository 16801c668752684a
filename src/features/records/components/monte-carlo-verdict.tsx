import {
  VALIDATION_HEADLINES,
  validationOutcome,
  validationWords,
} from '../../../../shared/contracts/validation-words';
import type { GumValidation, MonteCarloResult } from '../../../../shared/uncertainty';
import { Badge } from '../../../components/ui/badge';
import { formatSignificant } from '../utils/format-figures';

type MonteCarloVerdictProps = {
  monteCarlo: MonteCarloResult;
  validation: GumValidation;
  unit: string;
  /** Whether the record's statement is the Monte Carlo interval (false for a record signed before it was). */
  statesMonteCarlo: boolean;
};

/** Whether Monte Carlo (JCGM 101:2008) confirms the GUM interval, in words, with the run that decided it. */
export function MonteCarloVerdict({ monteCarlo, validation, unit, statesMonteCarlo }: MonteCarloVerdictProps) {
  return (
    <section aria-labelledby="monte-carlo-heading" className="rounded-lg border border-line bg-surface p-6">
      <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
        <h2 id="monte-carlo-heading" className="text-lg font-bold">
          Monte Carlo check
        </h2>
        <Badge tone={validation.passed ? 'ok' : 'caution'}>{VALIDATION_HEADLINES[validationOutcome(validation)]}</Badge>
      </div>
      <p>{validationWords(validation, unit, statesMonteCarlo)}</p>
      <p className="mt-2 text-sm text-muted">
        <span className="numeric">{monteCarlo.trials.toLocaleString('en-GB')}</span> trials
        {monteCarlo.adaptive ? ` in ${monteCarlo.adaptive.batches} batches` : ''}, seed{' '}
        <span className="numeric">{monteCarlo.seed}</span>; symmetric{' '}
        {(monteCarlo.coverageProbability * 100).toFixed(2)} % interval{' '}
        <span className="numeric whitespace-nowrap">
          [{formatSignificant(monteCarlo.symmetricInterval.low, 6)},{' '}
          {formatSignificant(monteCarlo.symmetricInterval.high, 6)}] {unit}
        </span>
        .
      </p>
    </section>
  );
}
