import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluatePlan } from './evaluate-plan';
import type { PlanInput } from './plan-schema';

const fixtures = new URL('../../tests/fixtures/', import.meta.url);
const leadPlan = JSON.parse(
  readFileSync(new URL('plans/lead-standard-from-nitrate.json', fixtures), 'utf8'),
) as PlanInput;

/** The lead plan with balance B-01's repeatability s = 0.0004 g (large enough to matter), from `readings` readings when given. */
function leadPlanWithRepeatability(readings?: number): PlanInput {
  const plan = structuredClone(leadPlan) as PlanInput & { steps: { balance?: Record<string, unknown> }[] };
  const balance = plan.steps[0].balance as Record<string, unknown>;
  balance.repeatabilityG = 0.0004;
  if (readings !== undefined) balance.repeatabilityReadings = readings;
  return plan;
}

describe('balance repeatability with its number of readings (Type A, ν = n − 1)', () => {
  const typeA = evaluatePlan(leadPlanWithRepeatability(5));
  const exact = evaluatePlan(leadPlanWithRepeatability());
  const repeatabilityRows = typeA.rows.filter((row) => row.category === 'balanceRepeatability');

  it('makes each reading’s repeatability a Type A source with ν = n − 1 = 4 and u = s (JCGM 100:2008 4.2)', () => {
    expect(repeatabilityRows).toHaveLength(2); // gross and tare
    for (const row of repeatabilityRows) {
      expect(row).toMatchObject({ evaluationType: 'A', degreesOfFreedom: 4, distribution: 'studentT' });
      expect(row.standardUncertainty).toBe(0.0004);
    }
    // u_c is unchanged: the readings only say how well s is known.
    expect(typeA.standardUncertainty).toBe(exact.standardUncertainty);
    expect(exact.effectiveDegreesOfFreedom).toBe(Infinity);
  });

  // Welch–Satterthwaite by hand (JCGM 100:2008 G.4.1): c is proportional to the net mass m = 0.1599 g, so each
  // reading's error e enters with |∂c/∂e| = c/m and u_i(c) = (c/m)·s; the other sources have ν = ∞, hence
  // ν_eff = u_c⁴ / (2·u_i⁴/4) = 2·u_c⁴/u_i⁴.
  it('gives the Welch–Satterthwaite ν_eff worked by hand, and k from it', () => {
    const perReading = (typeA.value / 0.1599) * 0.0004;
    for (const row of repeatabilityRows) expect(row.contribution / perReading - 1).toBeCloseTo(0, 9);
    const byHand = (2 * typeA.standardUncertainty ** 4) / perReading ** 4;
    expect(typeA.effectiveDegreesOfFreedom / byHand - 1).toBeCloseTo(0, 8);
    expect(Number.isFinite(typeA.effectiveDegreesOfFreedom)).toBe(true);
    expect(typeA.coverageFactor).toBeGreaterThan(exact.coverageFactor);
  });
});
