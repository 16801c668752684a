// @vitest-environment happy-dom
import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { readingWords, snapshotStepNamer, STEP_KINDS } from '../../../../shared/contracts/step-kinds';
import { preparationAt } from '../../../test-support/component-harness';
import { BenchReadings } from './bench-readings';
import { BudgetSummary } from './budget-summary';

afterEach(cleanup);

// The prepared lead check standard of tests/fixtures/records: four steps, the solid weighed on BAL-05.
const version = preparationAt('prepared').current;
const snapshot = version.snapshot!;
const readings = version.readings!;

/** The text of each body row's first cell in the table with this caption. */
const firstCells = (caption: string) =>
  within(screen.getByRole('table', { name: caption }))
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).getAllByRole('cell')[0].textContent);

describe('the record page words its steps as the step-kind registry does', () => {
  it('names each budget group by the registry label and the item code', () => {
    render(<BudgetSummary budget={snapshot.budget} stepName={snapshotStepNamer(snapshot)} />);
    const names = firstCells(`Contributions to u(${snapshot.budget.measurand}) by step`);
    expect(names).toHaveLength(4);
    expect(names).toEqual([
      `Step 1 · ${STEP_KINDS.weighSolid.label} (BAL-05)`,
      `Step 2 · ${STEP_KINDS.makeUpToVolume.label} (VF-100-A)`,
      `Step 3 · ${STEP_KINDS.pipetteAliquot.label} (GP-10-A)`,
      `Step 4 · ${STEP_KINDS.makeUpToVolume.label} (VF-100-B)`,
    ]);
    expect(names[0]).toBe('Step 1 · Weigh the solid (BAL-05)');
  });

  it('names each reading by its step and the mass the registry says that step records', () => {
    render(<BenchReadings readings={readings} stepName={snapshotStepNamer(snapshot)} plan={snapshot.plan} />);
    const cells = firstCells('Masses weighed beside the planned masses');
    expect(cells).toHaveLength(1);
    expect(cells[0]).toBe(`Step 1 · Weigh the solid (BAL-05)${readingWords('weighSolid')}`);
    expect(readingWords('weighSolid')).toBe('net mass');
  });
});
