import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { evaluatePlan } from '../../../../shared/uncertainty';
import { BudgetTable } from './budget-table';

/** A weighed solid made up in a flask (invented demo items), computed by the real engine. */
const budget = evaluatePlan({
  formatVersion: 1,
  analyte: { formula: 'Cd' },
  settings: { outputUnit: 'mg/L', temperatureHalfRangeC: 4 },
  steps: [
    {
      kind: 'weighSolid',
      material: { kind: 'solidMaterial', itemId: 'CD-1', name: 'Cadmium metal (demo)', formula: 'Cd', purity: { massFraction: 0.9999, uncertainty: { shape: 'rectangular', halfWidth: 0.0001 } } },
      balance: { kind: 'balance', itemId: 'B-1', capacityG: 220, readabilityG: 0.00001, repeatabilityG: 0.00002, linearityG: 0.00005 },
      netMassG: 0.10028,
    },
    { kind: 'makeUpToVolume', flask: { kind: 'volumetricFlask', itemId: 'F-100', nominalMl: 100, toleranceClass: 'A', toleranceMl: 0.1, fillRepeatabilityMl: 0.02 } },
  ],
});

describe('BudgetTable', () => {
  const html = renderToStaticMarkup(<BudgetTable budget={budget} stepName={(key) => `Step ${Number(key) + 1}`} />);

  it('groups the engine’s rows by step, each group with its subtotal', () => {
    expect(html).toContain('<th scope="rowgroup" colSpan="6"');
    for (const group of budget.byStep) expect(html).toContain(`Step ${Number(group.key) + 1}</th>`);
    // One body row per source plus one subtotal row per step.
    expect(html.match(/<tr/g)?.length).toBe(1 + budget.rows.length + budget.byStep.length + 1);
  });

  it('shows every source with its distribution, sensitivity coefficient and share, and u_c in the footer', () => {
    expect(html).toContain('Flask F-100 (100 mL): tolerance ±0.1 mL (class A)');
    expect(html).toContain('triangular (Type B)');
    expect(html).toContain('mg/L per mL');
    expect(html).toContain(`>${budget.standardUncertainty.toPrecision(2)}</td>`);
    const shares = budget.rows.reduce((sum, row) => sum + row.indexPercent, 0);
    expect(shares).toBeCloseTo(100, 9); // the shares of independent sources add up to the whole variance
  });
});
