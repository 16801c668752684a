import { ColumnEvaluator } from './column-evaluator';
import { twoSigmaProbability } from './coverage-factor';
import { coverageProbabilityOf } from './coverage-setting';
import {
  histogram,
  meanAndStandardDeviation,
  numericalTolerance,
  orderTails,
  shortestInterval,
  symmetricInterval,
  type Histogram,
  type Interval,
} from './coverage-interval';
import { ENGINE_VERSION } from './engine-version';
import type { CompiledModel } from './model-types';
import { parsePlan } from './parse-plan';
import { compilePlan } from './plan-compiler';
import { PlanError } from './plan-error';
import { groupedDigits, MAXIMUM_MONTE_CARLO_TRIALS } from './plan-limits';
import type { Plan, PlanInput } from './plan-schema';
import { RandomGenerator } from './random-generator';
import { fillSamples } from './samplers';

export interface MonteCarloOptions {
  /** 32-bit unsigned integer; the same seed gives the same numbers everywhere. */
  seed: number;
  /** Fixed number of trials M, at most MAXIMUM_MONTE_CARLO_TRIALS. Give this or `adaptive`. */
  trials?: number;
  /**
   * The adaptive procedure of JCGM 101:2008 7.9.4, stopped at `maximumTrials` (at most, and by default,
   * MAXIMUM_MONTE_CARLO_TRIALS). With `intervalEndTolerance` it stops on the interval ends alone, when twice the
   * standard deviation of their batch means is at most that tolerance (the rule the validation of JCGM 101:2008 §8
   * needs, see validation.ts); `minimumBatches` (default 2) batches are always run. `stopEarly`, asked after each
   * batch from `minimumBatches` on with the mean of the batches' interval ends and the tolerance reached, ends the
   * run unconverged when it returns true (the verdict stops once an end is clearly outside its tolerance).
   */
  adaptive?: {
    significantDigits?: 1 | 2;
    maximumTrials?: number;
    intervalEndTolerance?: number;
    minimumBatches?: number;
    stopEarly?: (batchEnds: { low: number; high: number; reachedTolerance: number }) => boolean;
  };
  /** Defaults to the plan's coverage setting, or 2Φ(2) − 1 for a compiled model. */
  coverageProbability?: number;
  histogramBins?: number;
  /** Trials sampled and evaluated together (memory per chunk ≈ nodes × chunkSize × 8 bytes). */
  chunkSize?: number;
}

export interface MonteCarloResult {
  engineVersion: string;
  measurand: string;
  unit: string;
  seed: number;
  trials: number;
  coverageProbability: number;
  mean: number;
  standardDeviation: number;
  symmetricInterval: Interval;
  shortestInterval: Interval;
  histogram: Histogram;
  /**
   * Present for the adaptive procedure: `numericalTolerance` is the tolerance it aimed at; `reachedTolerance`
   * (absent in results stored before it existed) the largest 2s of the quantities it watched when it stopped.
   */
  adaptive?: {
    converged: boolean;
    batches: number;
    batchSize: number;
    numericalTolerance: number;
    reachedTolerance?: number;
  };
}

export interface MonteCarloProgress {
  trialsDone: number;
  /** Planned trials; for the adaptive procedure, the trials of the batches decided so far. */
  trialsPlanned: number;
  finished: boolean;
  /** For the adaptive procedure: batches finished, the fewest it runs and the most its trial limit allows. */
  batches?: { done: number; minimum: number; maximum: number };
}

/** A Monte Carlo calculation that runs piece by piece, so a Web Worker can report progress and stop. */
export interface MonteCarloRun {
  /** Runs up to `maximumTrials` more trials (whole chunks) and reports where it stands. */
  advance(maximumTrials: number): MonteCarloProgress;
  /** The summary; @throws Error before the run has finished. */
  result(): MonteCarloResult;
}

const defaultChunkSize = 8192;

function isCompiledModel(input: CompiledModel | PlanInput | Plan): input is CompiledModel {
  return (input as CompiledModel).modelFormat === 'dilutrace-model/1';
}

/**
 * Starts a Monte Carlo propagation of distributions (JCGM 101:2008): for each trial every source is drawn from
 * its distribution (see fillSamples) with the seeded xoshiro128** generator, and the model is evaluated.
 * Sources are drawn chunk by chunk in a fixed order (chunk, then source, then trial), so only the outputs
 * are kept: one Float64Array of M values, whose tails are then put in order for the coverage intervals.
 * @throws PlanError for an invalid plan or options
 */
export function startMonteCarlo(input: CompiledModel | PlanInput | Plan, options: MonteCarloOptions): MonteCarloRun {
  let model: CompiledModel;
  let coverageProbability = options.coverageProbability;
  if (isCompiledModel(input)) {
    model = input;
  } else {
    const plan = parsePlan(input);
    model = compilePlan(plan);
    coverageProbability ??= coverageProbabilityOf(plan.settings.coverage);
  }
  const probability = coverageProbability ?? twoSigmaProbability;
  if (!(probability > 0 && probability < 1))
    throw new PlanError(['coverageProbability'], 'The coverage probability must lie between 0 and 1.');
  if (!Number.isInteger(options.seed) || options.seed < 0 || options.seed > 0xffffffff) {
    throw new PlanError(['seed'], 'The seed must be a whole number from 0 to 4294967295.');
  }
  const chunkSize = options.chunkSize ?? defaultChunkSize;
  const evaluator = new ColumnEvaluator(model, chunkSize);
  const random = new RandomGenerator(options.seed);
  const bins = options.histogramBins ?? 50;

  const words = new Int32Array(2 * chunkSize);
  const { sources } = model;
  const runChunk = (target: Float64Array, offset: number, count: number) => {
    for (let index = 0; index < sources.length; index += 1) {
      fillSamples(
        evaluator.sourceColumns[index],
        count,
        sources[index].estimate,
        sources[index].distribution,
        random,
        words,
      );
    }
    evaluator.evaluate(count, target, offset);
  };

  const summarise = (outputs: Float64Array, adaptive?: MonteCarloResult['adaptive']): MonteCarloResult => {
    const { mean, standardDeviation } = meanAndStandardDeviation(outputs);
    orderTails(outputs, probability);
    return {
      engineVersion: ENGINE_VERSION,
      measurand: model.measurand,
      unit: model.outputUnit,
      seed: options.seed,
      trials: outputs.length,
      coverageProbability: probability,
      mean,
      standardDeviation,
      symmetricInterval: symmetricInterval(outputs, probability),
      shortestInterval: shortestInterval(outputs, probability),
      histogram: histogram(outputs, bins),
      ...(adaptive === undefined ? {} : { adaptive }),
    };
  };

  if (options.adaptive === undefined) {
    const trials = options.trials;
    if (trials === undefined || !Number.isInteger(trials) || trials < 2) {
      throw new PlanError(['trials'], 'Give a whole number of trials (at least 2), or ask for the adaptive procedure.');
    }
    assertTrialsWithinCap(trials, ['trials']);
    const outputs = new Float64Array(trials);
    let done = 0;
    let summary: MonteCarloResult | undefined;
    return {
      advance(maximumTrials) {
        const stop = Math.min(trials, done + Math.max(maximumTrials, 1));
        while (done < stop) {
          const count = Math.min(chunkSize, trials - done);
          runChunk(outputs, done, count);
          done += count;
        }
        if (done === trials) summary ??= summarise(outputs);
        return { trialsDone: done, trialsPlanned: trials, finished: done === trials };
      },
      result() {
        if (summary === undefined) throw new Error('The Monte Carlo run has not finished.');
        return summary;
      },
    };
  }
  return startAdaptive(options.adaptive, probability, runChunk, summarise, chunkSize);
}

function assertTrialsWithinCap(trials: number, path: string[]): void {
  if (trials > MAXIMUM_MONTE_CARLO_TRIALS) {
    throw new PlanError(
      path,
      `A Monte Carlo run can have at most ${groupedDigits(MAXIMUM_MONTE_CARLO_TRIALS)} trials; ${groupedDigits(trials)} were asked for.`,
    );
  }
}

/**
 * Trials per batch of the adaptive procedure (JCGM 101:2008 7.9.4): M = max(⌈100/(1 − p)⌉, 10⁴), so that each
 * batch has at least 100 trials outside its coverage interval.
 * @example adaptiveBatchSize(0.95) // 10000
 */
export function adaptiveBatchSize(coverageProbability: number): number {
  return Math.max(Math.ceil(100 / (1 - coverageProbability)), 10_000);
}

/**
 * JCGM 101:2008 7.9.4: batches of M = adaptiveBatchSize(p) trials; after each batch h ≥ 2 (and h ≥ minimumBatches)
 * the standard deviations s = √(Σ(x⁽ʳ⁾ − x̄)²/(h(h − 1))) of the batch means, standard uncertainties and interval
 * ends are compared with the numerical tolerance δ of u(y) from all trials; stop when 2s ≤ δ for all four. With
 * `intervalEndTolerance` only the two interval ends are watched, against that tolerance.
 */
function startAdaptive(
  settings: NonNullable<MonteCarloOptions['adaptive']>,
  probability: number,
  runChunk: (target: Float64Array, offset: number, count: number) => void,
  summarise: (outputs: Float64Array, adaptive: MonteCarloResult['adaptive']) => MonteCarloResult,
  chunkSize: number,
): MonteCarloRun {
  const significantDigits = settings.significantDigits ?? 2;
  const batchSize = adaptiveBatchSize(probability);
  const maximumTrials = settings.maximumTrials ?? MAXIMUM_MONTE_CARLO_TRIALS;
  const minimumBatches = Math.max(2, settings.minimumBatches ?? 2);
  const maximumBatches = Math.floor(maximumTrials / batchSize);
  const endsOnly = settings.intervalEndTolerance !== undefined;
  const watched = endsOnly ? [2, 3] : [0, 1, 2, 3];
  assertTrialsWithinCap(maximumTrials, ['adaptive', 'maximumTrials']);
  if (minimumBatches * batchSize > maximumTrials) {
    throw new PlanError(
      ['adaptive'],
      `At this coverage probability the adaptive procedure needs ${minimumBatches} batches of ${groupedDigits(batchSize)} trials, more than its limit allows; give a fixed number of trials.`,
    );
  }
  let outputs = new Float64Array(4 * batchSize);
  let done = 0;
  const batchStatistics: number[][] = [];
  let summary: MonteCarloResult | undefined;
  let tolerance = settings.intervalEndTolerance ?? Infinity;
  let reached = Infinity;

  const finishBatch = () => {
    const batch = outputs.slice(done - batchSize, done);
    const { mean, standardDeviation } = meanAndStandardDeviation(batch);
    orderTails(batch, probability);
    const interval = symmetricInterval(batch, probability);
    batchStatistics.push([mean, standardDeviation, interval.low, interval.high]);
    const h = batchStatistics.length;
    if (h < 2) return false;
    if (!endsOnly)
      tolerance = numericalTolerance(meanAndStandardDeviation(outputs, done).standardDeviation, significantDigits);
    reached = Math.max(
      ...watched.map((column) => {
        const values = batchStatistics.map((row) => row[column]);
        const average = values.reduce((sum, value) => sum + value, 0) / h;
        return 2 * Math.sqrt(values.reduce((sum, value) => sum + (value - average) ** 2, 0) / (h * (h - 1)));
      }),
    );
    return h >= minimumBatches && reached <= tolerance;
  };
  const stopsEarly = () => {
    if (settings.stopEarly === undefined || batchStatistics.length < minimumBatches) return false;
    const average = (column: number) =>
      batchStatistics.reduce((sum, row) => sum + row[column], 0) / batchStatistics.length;
    return settings.stopEarly({ low: average(2), high: average(3), reachedTolerance: reached });
  };

  return {
    advance(maximumTrials_) {
      let budget = Math.max(maximumTrials_, 1);
      while (summary === undefined && budget > 0) {
        const batchEnd = (batchStatistics.length + 1) * batchSize;
        if (batchEnd > outputs.length) {
          const grown = new Float64Array(Math.min(2 * outputs.length, maximumTrials + batchSize));
          grown.set(outputs.subarray(0, done));
          outputs = grown;
        }
        const count = Math.min(chunkSize, batchEnd - done, budget);
        runChunk(outputs, done, count);
        done += count;
        budget -= count;
        if (done === batchEnd) {
          const converged = finishBatch();
          if (converged || done + batchSize > maximumTrials || stopsEarly()) {
            summary = summarise(outputs.slice(0, done), {
              converged,
              batches: batchStatistics.length,
              batchSize,
              numericalTolerance: tolerance,
              reachedTolerance: reached,
            });
          }
        }
      }
      return {
        trialsDone: done,
        trialsPlanned: (batchStatistics.length + (summary ? 0 : 1)) * batchSize,
        finished: summary !== undefined,
        batches: { done: batchStatistics.length, minimum: minimumBatches, maximum: maximumBatches },
      };
    },
    result() {
      if (summary === undefined) throw new Error('The Monte Carlo run has not finished.');
      return summary;
    },
  };
}

/**
 * Runs a Monte Carlo calculation to the end (see startMonteCarlo), calling `onProgress` after each chunk;
 * returning false from it cancels the run (the function then throws).
 * @example runMonteCarlo(plan, { trials: 1_000_000, seed: 20240611 }).symmetricInterval
 */
export function runMonteCarlo(
  input: CompiledModel | PlanInput | Plan,
  options: MonteCarloOptions & { onProgress?: (progress: MonteCarloProgress) => boolean | void },
): MonteCarloResult {
  const run = startMonteCarlo(input, options);
  const step = Math.max(options.chunkSize ?? defaultChunkSize, 65_536);
  for (;;) {
    const progress = run.advance(step);
    if (options.onProgress?.(progress) === false && !progress.finished)
      throw new Error('The Monte Carlo run was cancelled.');
    if (progress.finished) return run.result();
  }
}
