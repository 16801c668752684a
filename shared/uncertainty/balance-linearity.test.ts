import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { linearityHalfWidthG } from './balance-weighing';
import { evaluatePlan } from './evaluate-plan';
import type { PlanInput } from './plan-schema';

const fixtures = new URL('../../tests/fixtures/', import.meta.url);
const leadPlan = JSON.parse(
  readFileSync(new URL('plans/lead-standard-from-nitrate.json', fixtures), 'utf8'),
) as PlanInput;

const withSettings = (settings: Partial<PlanInput['settings']>): PlanInput => ({
  ...structuredClone(leadPlan),
  settings: { ...leadPlan.settings, ...settings },
});

/** Variance of the net mass (g²) from the linearity rows of the first weighing (B-01: ±0.2 mg, 0.1599 g of 220 g). */
function linearityVarianceG2(plan: PlanInput): { rows: number; variance: number } {
  const rows = evaluatePlan(plan).rows.filter((row) => row.category === 'balanceLinearity' && row.stepIndices[0] === 0);
  return { rows: rows.length, variance: rows.reduce((sum, row) => sum + row.standardUncertainty ** 2, 0) };
}

describe('linearity of the tare and gross readings of one weighing', () => {
  it('by default they are independent: u²(net) = 2·a²/3 (EURACHEM/CITAC CG4 3rd ed. A1 counts the linearity twice)', () => {
    const { rows, variance } = linearityVarianceG2(leadPlan);
    expect(rows).toBe(2);
    expect(variance).toBeCloseTo((2 * 0.0002 ** 2) / 3, 18);
  });

  it('correlated by r = 0.75 when the loads are close: u²(net) = 2·u²·(1 − r) (common practice, no document)', () => {
    const { rows, variance } = linearityVarianceG2(withSettings({ linearityCorrelation: 0.75 }));
    expect(rows).toBe(2);
    expect(variance).toBeCloseTo(((2 * 0.0002 ** 2) / 3) * 0.25, 18);
    expect(linearityHalfWidthG(0.0002, 0.75, true)).toBeCloseTo(0.0001, 15);
  });

  it('stays independent when the net mass is above the policy fraction of the capacity (0.1599 g > 0.0005·220 g)', () => {
    const { variance } = linearityVarianceG2(
      withSettings({ linearityCorrelation: 0.75, linearityCorrelationNetFraction: 0.0005 }),
    );
    expect(variance).toBeCloseTo((2 * 0.0002 ** 2) / 3, 18);
  });

  it('fully correlated (r = 1): the linearity cancels in gross − tare and leaves no row', () => {
    expect(linearityVarianceG2(withSettings({ linearityCorrelation: 1 })).rows).toBe(0);
  });
});
