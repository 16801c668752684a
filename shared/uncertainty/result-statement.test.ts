import { describe, expect, it } from 'vitest';
import { evaluatePlan } from './evaluate-plan';
import { formatResultStatement } from './result-rounding';
import { resultStatement, type StatedResult } from './result-statement';

/**
 * JCGM 101:2008 §9.2 (from memory, reproduced by simulation; /work REFERENCES "GUM Supplement 1"): Y = X₁+X₂+X₃+X₄,
 * X₁..X₃ ~ N(0, 1), X₄ rectangular with standard deviation 10. GUM: u = 10.1, 95 % interval ±19.9 (k = 1.96);
 * Monte Carlo: ±17.0. The ends differ by 2.9, more than δ = 0.5 (u to two digits, 10), so GUM is not validated.
 */
const additiveModel = (interval: 'symmetric' | 'shortest' | undefined): StatedResult => ({
  plan: { settings: interval ? { monteCarloInterval: interval } : {} },
  budget: {
    measurand: 'Y',
    unit: '1',
    value: 0,
    expandedUncertainty: 19.9,
    coverageFactor: 1.96,
    coverageProbability: 0.95,
  },
  monteCarlo: {
    coverageProbability: 0.95,
    symmetricInterval: { low: -17.0, high: 17.0 },
    // A made-up shortest interval, shifted, to tell the two apart (half-width 16.85: no decimals).
    shortestInterval: { low: -16.4, high: 17.3 },
  },
  validation: { passed: false, lowEndDifference: 2.9, highEndDifference: 2.9, numericalTolerance: 0.5 },
});

describe('resultStatement: one statement for screen, PDF and e-mail', () => {
  it('states the probabilistically symmetric Monte Carlo interval when GUM is not validated, and why (JCGM 101:2008 §8 and §9.2, from memory)', () => {
    const statement = resultStatement(additiveModel(undefined));
    expect(statement.method).toBe('monteCarlo');
    // Half-width 17 at two significant digits: no decimals (JCGM 100:2008 7.2.6).
    expect(statement.text).toBe(
      'Y = 0, 95.00 % coverage interval [-17, 17], Monte Carlo interval (probabilistically symmetric; the GUM interval is not validated)',
    );
    expect(statement.coverageText).toBe('Monte Carlo interval');
    expect(statement.reason).toContain('by 2.9 and 2.9, more than the numerical tolerance δ = 0.5,');
    expect(statement.reason).toContain('instead of U = 20 (k = 1.96)');
  });

  it('states the shortest interval when the lab policy asks for it (JCGM 101:2008 7.7)', () => {
    const statement = resultStatement(additiveModel('shortest'));
    expect(statement.intervalText).toBe('[-16, 17]');
    expect(statement.text).toContain('Monte Carlo interval (shortest;');
  });

  it('states y ± U with k when Monte Carlo validates GUM, or has not run (JCGM 100:2008 7.2.3)', () => {
    const validated = additiveModel(undefined);
    validated.validation = { ...validated.validation!, passed: true };
    const expected = formatResultStatement(validated.budget);
    expect(resultStatement(validated)).toMatchObject({ method: 'gum', text: expected, reason: null });
    expect(resultStatement({ ...validated, monteCarlo: null, validation: null }).text).toBe(expected);
    expect(expected).toBe('Y = (0 ± 20) 1, k = 1.96, coverage probability ≈ 95.00 %');
  });
});

describe('resultStatement names the reference temperature of a result per volume', () => {
  const planAt25 = {
    formatVersion: 1 as const,
    analyte: { formula: 'Pb' },
    settings: { outputUnit: 'mg/L' as const, labTemperatureC: 25, referenceTemperatureC: 20 },
    steps: [
      {
        kind: 'startFromCertifiedSolution' as const,
        material: {
          kind: 'certifiedSolution' as const,
          itemId: 'CRM-PB',
          name: 'Lead standard',
          certifiedValue: 1000,
          certifiedUnit: 'mg/L' as const,
          uncertainty: { shape: 'normal' as const, expandedUncertainty: 2, coverageFactor: 2 },
        },
      },
      {
        kind: 'pipetteAliquot' as const,
        pipette: {
          kind: 'glassPipette' as const,
          itemId: 'GP-10',
          nominalMl: 10,
          toleranceClass: 'A' as const,
          toleranceMl: 0.02,
        },
        volumeMl: 10,
      },
      {
        kind: 'makeUpToVolume' as const,
        flask: {
          kind: 'volumetricFlask' as const,
          itemId: 'VF-100',
          nominalMl: 100,
          toleranceClass: 'A' as const,
          toleranceMl: 0.1,
        },
      },
    ],
  };

  it('in the GUM statement, the same words as the budget (common practice: a volume-based result names its temperature)', () => {
    const budget = evaluatePlan(planAt25);
    expect(budget.referenceTemperatureC).toBe(20);
    const statement = resultStatement({ plan: { settings: {} }, budget, monteCarlo: null, validation: null });
    expect(statement.text).toBe(budget.statement);
    expect(statement.text).toMatch(/^c\(Pb\) = \(\d+\.\d+ ± \d\.\d+\) mg\/L at 20 °C, k = 2\.00/);
  });

  it('in the Monte Carlo statement too', () => {
    const budget = evaluatePlan(planAt25);
    const statement = resultStatement({
      plan: { settings: {} },
      budget,
      monteCarlo: {
        coverageProbability: budget.coverageProbability,
        symmetricInterval: { low: budget.value - 2, high: budget.value + 2 },
        shortestInterval: { low: budget.value - 2, high: budget.value + 2 },
      },
      validation: { passed: false, lowEndDifference: 1, highEndDifference: 1, numericalTolerance: 0.05 },
    });
    expect(statement.method).toBe('monteCarlo');
    expect(statement.text).toMatch(/^c\(Pb\) = \d+\.\d mg\/L at 20 °C, 95\.45 % coverage interval \[/);
  });

  it('and none for a mass fraction, which does not depend on temperature', () => {
    const budget = evaluatePlan({
      ...planAt25,
      settings: { ...planAt25.settings, outputUnit: 'mg/kg' as const },
    });
    expect(budget.referenceTemperatureC).toBeUndefined();
    expect(resultStatement({ plan: { settings: {} }, budget, monteCarlo: null, validation: null }).text).not.toContain(
      '°C',
    );
  });
});
