/**
 * npm run bench — speed figures of the uncertainty engine, in one process and one run:
 * Monte Carlo of a 4-step chain (≈ 20 sources) at 10⁶ trials, the same model trial by trial through a
 * mathjs compiled expression (naive baseline), GUM evaluation time, route finder on a 5 × 12 × 12 library,
 * and peak memory. The last line is one JSON object for tracking the figures over time.
 */
import { readFileSync } from 'node:fs';
import { all, create } from 'mathjs';
import { compilePlan, findRoutes, propagate, RandomGenerator, runMonteCarlo, type CompiledModel, type PlanInput, type RouteRequest } from '../shared/uncertainty/index';
import { fillSamples } from '../shared/uncertainty/samplers';

const readJson = <T>(path: string): T => JSON.parse(readFileSync(new URL(path, import.meta.url), 'utf8')) as T;
const lead = readJson<PlanInput & { steps: PlanInput['steps'] }>('../tests/fixtures/plans/lead-standard-from-nitrate.json');
const { balances, flasks, pipettes } = readJson<Pick<RouteRequest, 'balances' | 'flasks' | 'pipettes'>>('../tests/fixtures/plans/library/demo-equipment-library.json');
const library = { balances, flasks, pipettes };

// The 4-step chain: weigh Pb(NO3)2 → 100 mL stock → 10 mL aliquot → 100 mL.
const chain: PlanInput = { ...lead, title: 'bench: 4-step lead chain', steps: lead.steps.slice(0, 4) };
const model = compilePlan(chain);
const trials = 1_000_000;
const seed = 20240611;

// Warm-up so that both paths are measured after the JIT has optimised them (steady state, as in the app).
for (let run = 0; run < 3; run += 1) runMonteCarlo(model, { trials: 200_000, seed: seed + run + 1 });
let start = performance.now();
const monteCarlo = runMonteCarlo(model, { trials, seed });
const engineSeconds = (performance.now() - start) / 1000;

/** The tape as one mathjs expression over variables x0…x(N−1). */
function expressionOf(compiled: CompiledModel): string {
  const text: string[] = [];
  compiled.nodes.forEach((node, index) => {
    if (node.operation === 'source') text[index] = `x${node.sourceIndex}`;
    else if (node.operation === 'constant') text[index] = `(${node.value})`;
    else text[index] = `(${text[node.left]} ${{ add: '+', subtract: '-', multiply: '*', divide: '/' }[node.operation]} ${text[node.right]})`;
  });
  return text[compiled.outputNode];
}
const math = create(all);
const compiledExpression = math.compile(expressionOf(model));
const baselineTrials = 100_000;
const random = new RandomGenerator(seed);
const draw = new Float64Array(1);
const scope: Record<string, number> = {};
const runBaseline = (count: number) => {
  let sum = 0;
  for (let trial = 0; trial < count; trial += 1) {
    model.sources.forEach((source, index) => {
      fillSamples(draw, 1, source.estimate, source.distribution, random);
      scope[`x${index}`] = draw[0];
    });
    sum += compiledExpression.evaluate(scope) as number;
  }
  return sum / count;
};
runBaseline(20_000);
start = performance.now();
const baselineMean = runBaseline(baselineTrials);
const baselineSeconds = (performance.now() - start) / 1000;

const gumRepetitions = 2_000;
for (let index = 0; index < 200; index += 1) propagate(model, { probability: 0.9545 });
start = performance.now();
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
console.log(`engine Monte Carlo: ${trials} trials in ${engineSeconds.toFixed(3)} s = ${Math.round(trialsPerSecond)} trials/s (mean ${monteCarlo.mean.toFixed(4)}, sd ${monteCarlo.standardDeviation.toFixed(4)} ${monteCarlo.unit})`);
console.log(`mathjs baseline: ${baselineTrials} trials in ${baselineSeconds.toFixed(3)} s = ${Math.round(baselineTrialsPerSecond)} trials/s (mean ${baselineMean.toFixed(4)})`);
console.log(`ratio engine/baseline: ${(trialsPerSecond / baselineTrialsPerSecond).toFixed(1)}×`);
console.log(`GUM propagation: ${gumMicroseconds.toFixed(1)} µs per evaluation`);
console.log(`route finder (${library.balances?.length} balances × ${library.flasks.length} flasks × ${library.pipettes?.length} pipettes): ${routeMilliseconds.toFixed(1)} ms, ${routes.feasibleCandidates} feasible candidates scored`);
console.log(`peak RSS: ${peakRssMb.toFixed(1)} MB (outputs array ${(trials * 8) / 1e6} MB)`);
console.log(
  JSON.stringify({
    trialsPerSecond: Math.round(trialsPerSecond),
    baselineTrialsPerSecond: Math.round(baselineTrialsPerSecond),
    ratio: Number((trialsPerSecond / baselineTrialsPerSecond).toFixed(1)),
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
