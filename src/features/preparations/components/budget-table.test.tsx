// @vitest-environment happy-dom
import { cleanup, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { evaluatePlan } from '../../../../shared/uncertainty';
import { formatUncertainty } from '../utils/format-number';
import { BudgetTable } from './budget-table';

/** A weighed solid made up in a flask (invented demo items), computed by the real engine. */
const budget = evaluatePlan({
  formatVersion: 1,
  analyte: { formula: 'Cd' },
  settings: { outputUnit: 'mg/L', temperatureHalfRangeC: 4 },
  steps: [
    {
      kind: 'weighSolid',
      material: {
        kind: 'solidMaterial',
        itemId: 'CD-1',
        name: 'Cadmium metal (demo)',
        formula: 'Cd',
        purity: { massFraction: 0.9999, uncertainty: { shape: 'rectangular', halfWidth: 0.0001 } },
      },
      balance: {
        kind: 'balance',
        itemId: 'B-1',
        capacityG: 220,
        readabilityG: 0.00001,
        repeatabilityG: 0.00002,
        linearityG: 0.00005,
      },
      netMassG: 0.10028,
    },
    {
      kind: 'makeUpToVolume',
      flask: {
        kind: 'volumetricFlask',
        itemId: 'F-100',
        nominalMl: 100,
        toleranceClass: 'A',
        toleranceMl: 0.1,
        fillRepeatabilityMl: 0.02,
      },
    },
  ],
});

const stepName = (key: string) => `Step ${Number(key) + 1}`;
const budgetTable = () => screen.getByRole('table', { name: /^Uncertainty budget of/ });

afterEach(cleanup);

describe('BudgetTable', () => {
  it('groups the engine’s rows by step, each group headed by its step with the subtotal beside it', () => {
    render(<BudgetTable budget={budget} stepName={stepName} />);
    expect(budgetTable()).toHaveProperty('caption.textContent', expect.stringMatching(/grouped by step$/));
    expect(budget.byStep.length).toBe(2);
    for (const group of budget.byStep) {
      const heading = within(budgetTable()).getByText(stepName(group.key), { selector: 'th' });
      const row = heading.closest('tr') as HTMLTableRowElement;
      expect(within(row).getByText(formatUncertainty(group.contribution))).toHaveProperty('tagName', 'TD');
    }
    // The header row, one row per source, one subtotal row per step, and the footer.
    expect(within(budgetTable()).getAllByRole('row')).toHaveLength(1 + budget.rows.length + budget.byStep.length + 1);
  });

  it('shows every source with its distribution and sensitivity unit, and u_c in the footer', () => {
    render(<BudgetTable budget={budget} stepName={stepName} />);
    const flaskRow = within(budgetTable())
      .getByRole('cell', { name: 'Flask F-100 (100 mL): tolerance ±0.1 mL (class A)' })
      .closest('tr') as HTMLTableRowElement;
    const flaskCells = within(flaskRow)
      .getAllByRole('cell')
      .map((cell) => cell.textContent);
    expect(flaskCells).toContain('triangular (Type B)');
    expect(flaskCells.some((text) => /mg\/L per mL$/.test(text ?? ''))).toBe(true);
    const footer = within(budgetTable())
      .getByRole('rowheader', { name: 'Combined standard uncertainty u_c(y)' })
      .closest('tr') as HTMLTableRowElement;
    expect(
      within(footer)
        .getAllByRole('cell')
        .map((cell) => cell.textContent),
    ).toEqual([formatUncertainty(budget.standardUncertainty), '100.00']);
    // The shares of independent sources add up to the whole variance (GUM JCGM 100:2008 §5.1.2, eq. 10).
    expect(budget.rows.reduce((sum, row) => sum + row.indexPercent, 0)).toBeCloseTo(100, 9);
  });

  it('drops the step groups when grouping is switched off, and sorts by a column heading', async () => {
    const user = userEvent.setup();
    render(<BudgetTable budget={budget} stepName={stepName} />);
    const grouping = screen.getByRole('checkbox', { name: 'Group by step with subtotals' });
    expect(grouping).toHaveProperty('checked', true);
    await user.click(grouping);
    expect(grouping).toHaveProperty('checked', false);
    expect(budgetTable()).toHaveProperty('caption.textContent', expect.stringMatching(/all sources$/));
    expect(within(budgetTable()).queryByText('Step 1', { selector: 'th' })).toBeNull();
    expect(within(budgetTable()).getAllByRole('row')).toHaveLength(1 + budget.rows.length + 1);

    const share = within(budgetTable()).getByRole('columnheader', { name: /% of variance/ });
    expect(share.getAttribute('aria-sort')).toBeNull();
    await user.click(within(share).getByRole('button'));
    expect(share.getAttribute('aria-sort')).toMatch(/^(ascending|descending)$/);
    // The shown cells round small shares to "< 0.01", so read each row's share from the engine by its source.
    const shareOf = new Map(budget.rows.map((row) => [row.label, row.indexPercent]));
    const shares = within(budgetTable())
      .getAllByRole('row')
      .slice(1, -1)
      .map((row) => shareOf.get(within(row).getAllByRole('cell')[0].textContent ?? '') ?? Number.NaN);
    expect(shares.length).toBe(budget.rows.length);
    expect(shares.filter(Number.isNaN)).toEqual([]); // every row's source is one of the engine's
    const ascending = [...shares].sort((left, right) => left - right);
    expect(shares).toEqual(share.getAttribute('aria-sort') === 'ascending' ? ascending : ascending.reverse());
  });
});
