import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { molarMass, parseFormula } from './chemical-formula';
import { MAXIMUM_COVERAGE_FACTOR } from './coverage-factor';
import { evaluatePlan } from './evaluate-plan';
import { runMonteCarlo } from './monte-carlo';
import { parsePlan } from './parse-plan';
import { PlanError } from './plan-error';
import {
  MAXIMUM_EXTRA_SOURCES_PER_STEP,
  MAXIMUM_FORMULA_LENGTH,
  MAXIMUM_FORMULA_NESTING,
  MAXIMUM_MONTE_CARLO_TRIALS,
  MAXIMUM_PLAN_STEPS,
} from './plan-limits';
import type { PlanInput } from './plan-schema';

const selenium = JSON.parse(
  readFileSync(new URL('../../tests/fixtures/plans/selenium-working-standard.json', import.meta.url), 'utf8'),
) as PlanInput;
const refusal = (action: () => unknown): PlanError => {
  try {
    action();
  } catch (error) {
    if (error instanceof PlanError) return error;
    throw error;
  }
  throw new Error('expected a PlanError');
};

describe('plan size caps', () => {
  it('refuses more steps than the cap, saying how many the plan has', () => {
    const [start, ...rest] = selenium.steps;
    const steps = [start, ...Array.from({ length: 1000 }, () => rest).flat()].slice(0, 2002);
    const error = refusal(() => parsePlan({ ...selenium, steps }));
    expect(error.message).toBe(`A plan can have at most ${MAXIMUM_PLAN_STEPS} steps; this one has 2002.`);
  });

  it('refuses more extra sources on a step than the cap', () => {
    const source = {
      name: 'evaporation',
      effect: 'relative',
      distribution: { shape: 'rectangular', halfWidth: 0.001 },
    };
    const steps = selenium.steps.map((step, index) =>
      index === 1 ? { ...step, extraSources: Array.from({ length: 5000 }, () => source) } : step,
    );
    const error = refusal(() => parsePlan({ ...selenium, steps }));
    expect(error.message).toBe(
      `Step 2: A step can have at most ${MAXIMUM_EXTRA_SOURCES_PER_STEP} extra sources; it has 5000.`,
    );
  });

  it('accepts a plan at the caps', () => {
    const source = {
      name: 'evaporation',
      effect: 'relative',
      distribution: { shape: 'rectangular', halfWidth: 0.001 },
    } as const;
    const steps = selenium.steps.map((step) => ({
      ...step,
      extraSources: Array.from({ length: MAXIMUM_EXTRA_SOURCES_PER_STEP }, () => source),
    }));
    expect(evaluatePlan(parsePlan({ ...selenium, steps })).value).toBeGreaterThan(0);
  });

  it('refuses a formula longer than the cap in the plan, and in the formula reader', () => {
    const long = 'H2O'.repeat(200);
    expect(refusal(() => parsePlan({ ...selenium, analyte: { formula: long } })).message).toMatch(
      `at most ${MAXIMUM_FORMULA_LENGTH} characters`,
    );
    expect(refusal(() => parseFormula(long)).message).toMatch(`at most ${MAXIMUM_FORMULA_LENGTH} characters`);
  });

  it('refuses a formula nested deeper than the cap before reading it (200 000 levels gave a stack overflow)', () => {
    const abyss = `${'('.repeat(200_000)}Pb${')'.repeat(200_000)}`;
    expect(refusal(() => molarMass(abyss, undefined, ['analyte', 'formula'])).path).toEqual(['analyte', 'formula']);
    const justTooDeep = `${'('.repeat(MAXIMUM_FORMULA_NESTING + 1)}Pb${')'.repeat(MAXIMUM_FORMULA_NESTING + 1)}`;
    expect(refusal(() => parseFormula(justTooDeep)).message).toMatch(`at most ${MAXIMUM_FORMULA_NESTING} levels`);
    const atTheCap = `${'('.repeat(MAXIMUM_FORMULA_NESTING)}Pb${')'.repeat(MAXIMUM_FORMULA_NESTING)}`;
    expect(Object.fromEntries(parseFormula(atTheCap))).toEqual({ Pb: 1 });
  });

  it('refuses more Monte Carlo trials than the cap', () => {
    const plan = parsePlan(selenium);
    expect(refusal(() => runMonteCarlo(plan, { seed: 1, trials: MAXIMUM_MONTE_CARLO_TRIALS + 1 })).message).toMatch(
      'at most 1 000 000 trials',
    );
    expect(
      refusal(() => runMonteCarlo(plan, { seed: 1, adaptive: { maximumTrials: MAXIMUM_MONTE_CARLO_TRIALS + 1 } }))
        .message,
    ).toMatch('at most 1 000 000 trials');
  });
});

describe('fixed coverage factor', () => {
  it('accepts k up to the engine limit and computes Monte Carlo with it', () => {
    const plan = parsePlan({
      ...selenium,
      settings: { ...selenium.settings, coverage: { k: MAXIMUM_COVERAGE_FACTOR } },
    });
    expect(runMonteCarlo(plan, { seed: 1, trials: 1000 }).trials).toBe(1000);
  });

  it('refuses k above the limit in the plan, where 2Φ(k) − 1 rounds to 1 (k = 8.3 reached Monte Carlo before)', () => {
    const error = refusal(() => parsePlan({ ...selenium, settings: { ...selenium.settings, coverage: { k: 8.3 } } }));
    expect(error.message).toMatch(`at most ${MAXIMUM_COVERAGE_FACTOR}`);
  });
});
