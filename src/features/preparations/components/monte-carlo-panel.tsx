import { lazy, memo, Suspense, useEffect } from 'react';
import type { Budget } from '../../../../shared/contracts/snapshot';
import {
  VALIDATION_HEADLINES,
  validationOutcome,
  validationWords,
} from '../../../../shared/contracts/validation-words';
import { Button } from '../../../components/ui/button';
import { LoadingLine } from '../../../components/ui/loading-line';
import { TextField } from '../../../components/ui/text-field';
import { useMonteCarlo } from '../hooks/use-monte-carlo';
import type { GumValidation, MonteCarloResult, PlanInput } from '../../../../shared/uncertainty';
import { formatSignificant } from '../utils/format-number';
import { randomSeed } from '../utils/plan-draft';

const MonteCarloHistogram = lazy(() => import('./monte-carlo-histogram'));

type MonteCarloPanelProps = {
  /** The valid engine plan to sample (null while the plan has a problem). */
  plan: PlanInput | null;
  budget: Budget | null;
  seed: number;
  onSeedChange: (seed: number) => void;
  seedEditable: boolean;
  /** Told the finished verdict run for this budget, or null while there is none, so the stated result can use it. */
  onCheck?: (check: LiveCheck | null) => void;
};

/** A finished verdict run with the budget it was judged against. */
export type LiveCheck = {
  budget: Budget;
  monteCarlo: MonteCarloResult;
  validation: GumValidation;
};

/**
 * Monte Carlo (JCGM 101:2008) for the plan on screen: the verdict run the stored record makes (adaptive, by batches),
 * its progress, cancel, the seed, the histogram and the verdict against GUM in the record's words. The run's state
 * lives here, so progress repaints only this panel, never the editor.
 */
export const MonteCarloPanel = memo(function MonteCarloPanel({
  plan,
  budget,
  seed,
  onSeedChange,
  seedEditable,
  onCheck,
}: MonteCarloPanelProps) {
  const { state, start: onStart, cancel: onCancel, planKey } = useMonteCarlo(plan, seed, { automatic: true });
  const running = state.phase === 'running';
  const result = state.phase === 'done' ? state.result : null;
  const outOfDate = state.phase === 'done' && state.planKey !== planKey;
  const validation = state.phase === 'done' && budget && !outOfDate ? state.validation : null;
  const planned = running ? Math.max(state.trialsPlanned, state.trialsDone, 1) : 1;
  const percent = running ? Math.round((100 * state.trialsDone) / planned) : 0;
  const unit = budget?.unit ?? '';
  useEffect(() => {
    onCheck?.(result && budget && validation ? { budget, monteCarlo: result, validation } : null);
  }, [onCheck, result, budget, validation]);

  return (
    <div>
      <div className="flex flex-wrap items-end gap-3">
        <TextField
          label="Seed"
          className="w-44"
          inputMode="numeric"
          value={String(seed)}
          disabled={!seedEditable}
          onChange={(event) => {
            const next = Number(event.target.value.replace(/\D/g, ''));
            if (Number.isSafeInteger(next) && next <= 4294967295) onSeedChange(next);
          }}
          hint="Same seed, same numbers."
        />
        {seedEditable ? (
          <Button variant="quiet" onClick={() => onSeedChange(randomSeed())}>
            New seed
          </Button>
        ) : null}
        {running ? (
          <Button variant="secondary" onClick={onCancel}>
            Cancel Monte Carlo
          </Button>
        ) : (
          <Button onClick={onStart} disabled={!budget}>
            Run Monte Carlo
          </Button>
        )}
      </div>
      <p className="mt-1 text-sm text-muted">
        Runs by itself a second after you stop editing, in the background: keep typing.
      </p>

      <div className="mt-3" aria-live="polite">
        {running ? (
          <div>
            <label htmlFor="monte-carlo-progress" className="text-sm font-semibold">
              {state.batches
                ? `Batch ${Math.min(state.batches.done + 1, state.batches.maximum)} of at least ${state.batches.minimum} (at most ${state.batches.maximum}): ${state.trialsDone.toLocaleString('en-GB')} trials`
                : 'Starting the Monte Carlo run…'}
            </label>
            <progress
              id="monte-carlo-progress"
              max={planned}
              value={state.trialsDone}
              className="block h-3 w-full accent-[var(--color-ink)]"
            >
              {percent} %
            </progress>
          </div>
        ) : null}
        {state.phase === 'cancelled' ? (
          <p className="text-muted">Monte Carlo cancelled. Run it again when you are ready.</p>
        ) : null}
        {state.phase === 'failed' ? <p className="font-semibold text-danger">{state.message}</p> : null}
        {state.phase === 'idle' && !budget ? <p className="text-muted">Monte Carlo needs a valid plan.</p> : null}
        {running ? (
          <p className="mt-1 text-sm text-muted">
            Batches run until the ends of the Monte Carlo interval are known well enough to judge the GUM interval.
          </p>
        ) : null}
      </div>

      {result ? (
        <div className={outOfDate ? 'opacity-60' : ''}>
          {outOfDate ? (
            <p className="mb-2 font-semibold text-caution">
              This result is for an earlier version of the plan; a new run starts shortly.
            </p>
          ) : null}
          {validation ? (
            <div
              className={`mb-3 rounded-md border-l-4 px-4 py-3 ${validation.passed ? 'border-ok bg-ok-tint text-ok' : 'border-caution bg-caution-tint text-caution'}`}
              data-testid="validation-verdict"
            >
              <p className="font-semibold">{VALIDATION_HEADLINES[validationOutcome(validation)]}</p>
              <p>{validationWords(validation, unit)}</p>
            </div>
          ) : null}
          <dl className="mb-3 grid grid-cols-2 gap-x-4 gap-y-1 text-sm sm:grid-cols-4">
            <div>
              <dt className="text-muted">Mean</dt>
              <dd className="numeric font-semibold">
                {formatSignificant(result.mean, 6)} {unit}
              </dd>
            </div>
            <div>
              <dt className="text-muted">Standard deviation</dt>
              <dd className="numeric font-semibold">
                {formatSignificant(result.standardDeviation, 2)} {unit}
              </dd>
            </div>
            <div>
              <dt className="text-muted">Symmetric {(result.coverageProbability * 100).toFixed(2)} % interval</dt>
              <dd className="numeric font-semibold">
                [{formatSignificant(result.symmetricInterval.low, 6)},{' '}
                {formatSignificant(result.symmetricInterval.high, 6)}] {unit}
              </dd>
            </div>
            <div>
              <dt className="text-muted">Shortest interval</dt>
              <dd className="numeric font-semibold">
                [{formatSignificant(result.shortestInterval.low, 6)},{' '}
                {formatSignificant(result.shortestInterval.high, 6)}] {unit}
              </dd>
            </div>
          </dl>
          <p className="mb-2 text-sm text-muted">
            Seed {result.seed}, {result.trials.toLocaleString('en-GB')} trials
            {result.adaptive ? ` in ${result.adaptive.batches} batches` : ''}.
          </p>
          {budget ? (
            <Suspense fallback={<LoadingLine label="Drawing the histogram…" />}>
              <MonteCarloHistogram monteCarlo={result} budget={budget} />
            </Suspense>
          ) : null}
        </div>
      ) : null}
    </div>
  );
});
