// @vitest-environment happy-dom
import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { snapshotSchema } from '../../../../shared/contracts/snapshot';
import { evaluatePlan } from '../../../../shared/uncertainty';
import stored from '../../../../tests/fixtures/snapshots/lead-standard-stored-with-text-warnings.json';
import { RecordedWarnings } from './recorded-warnings';

// Stored while warnings were sentences: 0.1599 g on BAL-04, below its minimum weight (tests/fixtures/snapshots/README.md).
const storedSentence = (JSON.parse(stored.snapshotJson) as { warnings: string[] }).warnings[0];
const snapshot = snapshotSchema.parse(JSON.parse(stored.snapshotJson));

afterEach(cleanup);

const shownWarnings = () =>
  within(screen.getByRole('status'))
    .getAllByRole('listitem')
    .map((item) => item.textContent);

describe('the record’s warnings', () => {
  it('show a warning stored as a sentence in its stored words (as the PDF prints it)', () => {
    expect(storedSentence).toMatch(/^Step 1: 0\.1599 g is below the minimum weight of Balance BAL-04/);
    render(<RecordedWarnings warnings={snapshot.warnings} />);
    expect(screen.getByText('Warnings recorded with the budget')).toBeTruthy();
    expect(shownWarnings()).toEqual([storedSentence]);
  });

  it('show the engine’s coded warning for the same plan in the same words', () => {
    const { warnings } = evaluatePlan(snapshot.plan);
    expect(warnings.map((warning) => warning.code)).toEqual(['belowMinimumWeight']);
    render(<RecordedWarnings warnings={warnings} />);
    expect(shownWarnings()).toEqual([storedSentence]);
  });

  it('show nothing when there are none', () => {
    render(<RecordedWarnings warnings={[]} />);
    expect(screen.queryByRole('status')).toBeNull();
  });
});
