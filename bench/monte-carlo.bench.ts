/**
 * npm run bench — speed figures of the uncertainty engine, in one process and one run:
 * Monte Carlo of a 4-step chain (≈ 20 sources) at 10⁶ trials, the same model trial by trial through a
 * mathjs compiled expression with the same summary (naive baseline), GUM evaluation time, route finder on a 5 × 12 × 12 library,
 * and peak memory. The last line is one JSON object for tracking the figures over time.
 *
 * The engine and the baseline are timed in alternating rounds (engine, baseline, engine, …) and each figure is
 * the median over the rounds; the ratio is the median of the rounds' ratios, so that load from other processes,
 * which comes and goes, weighs on both sides of each ratio alike.
 */
import { readFileSync } from 'node:fs';
import { all, create } from 'mathjs';
import {
  compilePlan,
  findRoutes,
  propagate,
  RandomGenerator,
  runMonteCarlo,
  type CompiledModel,
  type PlanInput,
  type RouteRequest,
} from '../shared/uncertainty/index';
import { fillSamples } from '../shared/uncertainty/samplers';

const readJson = <T>(path: string): T => JSON.parse(readFileSync(new URL(path, import.meta.url), 'utf8')) as T;
const lead = readJson<PlanInput & { steps: PlanInput['steps'] }>(
  '../tests/fixtures/plans/lead-standard-from-nitrate.json',
);
const { balances, flasks, pipettes } = readJson<Pick<RouteRequest, 'balances' | 'flasks' | 'pipettes'>>(
  '../tests/fixtures/plans/library/demo-equipment-library.json',
);
const library = { balances, flasks, pipettes };

// The 4-step chain: weigh Pb(NO3)2 → 100 mL stock → 10 mL aliquot → 100 mL.
const chain: PlanInput = { ...lead, title: 'bench: 4-step lead chain', steps: lead.steps.slice(0, 4) };
const model = compilePlan(chain);
const trials = 1_000_000;
const seed = 20240611;

const rounds = 5;
const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
};
const secondsOf = (work: () => void) => {
  const begin = performance.now();
  work();
  return (performance.now() - begin) / 1000;
};

// Warm-up so that both paths are measured after the JIT has optimised them (steady state, as in the app).
for (let run = 0; run < 2; run += 1) runMonteCarlo(model, { trials: 200_000, seed: seed + run + 1 });
let monteCarlo = runMonteCarlo(model, { trials: 200_000, seed: seed + 3 }); // the third warm-up run; replaced by the timed runs below

/** The tape as one mathjs expression over variables x0…x(N−1). */
function expressionOf(compiled: CompiledModel): string {
  const text: string[] = [];
  compiled.nodes.forEach((node, index) => {
    if (node.operation === 'source') text[index] = `x${node.sourceIndex}`;
    else if (node.operation === 'constant') text[index] = `(${node.value})`;
    else
      text[index] =
        `(${text[node.left]} ${{ add: '+', subtract: '-', multiply: '*', divide: '/' }[node.operation]} ${text[node.right]})`;
  });
  return text[compiled.outputNode];
}
const math = create(all);
const compiledExpression = math.compile(expressionOf(model));
const baselineTrials = 100_000;
const random = new RandomGenerator(seed);
const draw = new Float64Array(1);
const scope: Record<string, number> = {};
/**
 * The naive Monte Carlo: every trial draws each source and evaluates the mathjs expression; the outputs
 * go into a plain array that is sorted for the 95.45 % probabilistically symmetric interval, the same
 * summary the engine returns (mean, standard deviation, interval).
 */
const runBaseline = (count: number) => {
  const outputs: number[] = [];
  for (let trial = 0; trial < count; trial += 1) {
    model.sources.forEach((source, index) => {
      fillSamples(draw, 1, source.estimate, source.distribution, random);
      scope[`x${index}`] = draw[0];
    });
    outputs.push(compiledExpression.evaluate(scope) as number);
  }
  const mean = outputs.reduce((total, value) => total + value, 0) / count;
  const standardDeviation = Math.sqrt(outputs.reduce((total, value) => total + (value - mean) ** 2, 0) / (count - 1));
  outputs.sort((a, b) => a - b);
  const tail = Math.round(((1 - 0.9545) / 2) * count);
  return { mean, standardDeviation, low: outputs[tail], high: outputs[count - 1 - tail] };
};
runBaseline(20_000);
let baselineMean = 0;
let baselineSummary = runBaseline(1000);
const engineRounds: number[] = [];
const baselineRounds: number[] = [];
for (let round = 0; round < rounds; round += 1) {
  engineRounds.push(secondsOf(() => (monteCarlo = runMonteCarlo(model, { trials, seed }))));
  baselineRounds.push(secondsOf(() => (baselineSummary = runBaseline(baselineTrials))));
  baselineMean = baselineSummary.mean;
}
const engineSeconds = median(engineRounds);
const baselineSeconds = median(baselineRounds);
const ratio = median(engineRounds.map((seconds, round) => trials / seconds / (baselineTrials / baselineRounds[round])));

const gumRepetitions = 2_000;
for (let index = 0; index < 200; index += 1) propagate(model, { probability: 0.9545 });
let start = performance.now();
for (let index = 0; index < gumRepetitions; index += 1) propagate(model, { probability: 0.9545 });
const gumMicroseconds = ((performance.now() - start) * 1000) / gumRepetitions;

const routeRequest: RouteRequest = {
  target: { value: 10, unit: 'µg/L' },
  analyte: { formula: 'Pb' },
  material: (lead.steps[0] as { material: RouteRequest['material'] }).material,
  ...library,
  limit: 10,
};
start = performance.now();
const routes = findRoutes(routeRequest);
const routeMilliseconds = performance.now() - start;

const trialsPerSecond = trials / engineSeconds;
const baselineTrialsPerSecond = baselineTrials / baselineSeconds;
const peakRssMb = process.resourceUsage().maxRSS / 1024;

console.log(`model: ${model.sources.length} sources, ${model.nodes.length} tape nodes, ${chain.steps.length} steps`);
console.log(
  `engine Monte Carlo (median of ${rounds} rounds): ${trials} trials in ${engineSeconds.toFixed(3)} s = ${Math.round(trialsPerSecond)} trials/s (mean ${monteCarlo.mean.toFixed(4)}, sd ${monteCarlo.standardDeviation.toFixed(4)} ${monteCarlo.unit})`,
);
console.log(
  `mathjs baseline (median of ${rounds} rounds): ${baselineTrials} trials in ${baselineSeconds.toFixed(3)} s = ${Math.round(baselineTrialsPerSecond)} trials/s (mean ${baselineMean.toFixed(4)})`,
);
console.log(
  `ratio engine/baseline (median of the rounds' ratios): ${ratio.toFixed(1)}× (rounds: ${engineRounds
    .map((seconds, round) => (baselineRounds[round] * trials) / (seconds * baselineTrials))
    .map((value) => value.toFixed(1))
    .join(', ')})`,
);
console.log(`GUM propagation: ${gumMicroseconds.toFixed(1)} µs per evaluation`);
console.log(
  `route finder (${library.balances?.length} balances × ${library.flasks.length} flasks × ${library.pipettes?.length} pipettes): ${routeMilliseconds.toFixed(1)} ms, ${routes.feasibleCandidates} feasible candidates scored`,
);
console.log(`peak RSS: ${peakRssMb.toFixed(1)} MB (outputs array ${(trials * 8) / 1e6} MB)`);
console.log(
  JSON.stringify({
    trialsPerSecond: Math.round(trialsPerSecond),
    baselineTrialsPerSecond: Math.round(baselineTrialsPerSecond),
    ratio: Number(ratio.toFixed(1)),
    gumMicroseconds: Number(gumMicroseconds.toFixed(1)),
    peakRssMb: Number(peakRssMb.toFixed(1)),
    engineSeconds: Number(engineSeconds.toFixed(3)),
    trials,
    baselineTrials,
    sources: model.sources.length,
    routeFinderMilliseconds: Number(routeMilliseconds.toFixed(1)),
    node: process.version,
  }),
);
