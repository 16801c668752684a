// @vitest-environment happy-dom
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { snapshotSchema } from '../../../../shared/contracts/snapshot';
import { resultStatement } from '../../../../shared/uncertainty';
import stored from '../../../../tests/fixtures/snapshots/lead-standard-stored-before-typing.json';
import { ResultStatementPanel } from './result-statement-panel';

// A snapshot as the previous code stored it, ν_eff = ∞ written as null (tests/fixtures/snapshots/README.md).
const snapshot = snapshotSchema.parse(JSON.parse(stored.snapshotJson));
const { budget } = snapshot;

afterEach(cleanup);

const degreesShown = () => screen.getByText('Effective degrees of freedom').nextElementSibling?.textContent;

describe('the record’s result panel', () => {
  it('shows ν_eff = ∞ for a snapshot stored with null', () => {
    render(<ResultStatementPanel snapshot={snapshot} />);
    expect(degreesShown()).toBe('∞');
  });

  it('shows ν_eff truncated, as the coverage factor used it (8.7 → 8)', () => {
    render(<ResultStatementPanel snapshot={{ ...snapshot, budget: { ...budget, effectiveDegreesOfFreedom: 8.7 } }} />);
    expect(degreesShown()).toBe('8');
  });

  it('states a stored validated result exactly as it was stored (JCGM 100:2008 7.2.3)', () => {
    render(<ResultStatementPanel snapshot={snapshot} />);
    expect(screen.getByTestId('record-result-statement').textContent).toBe(budget.statement);
    expect(screen.queryByTestId('record-result-reason')).toBeNull();
  });

  it('states the Monte Carlo interval and why, in the PDF’s words, when Monte Carlo did not validate GUM (JCGM 101:2008 §8)', () => {
    // Computed by 1.1.0 (a record signed earlier keeps its GUM statement: stored-statement.test.ts).
    const failed = {
      ...snapshot,
      engineVersion: '1.1.0',
      validation: { ...snapshot.validation, passed: false, lowEndDifference: 0.02, highEndDifference: 0.011 },
    };
    render(<ResultStatementPanel snapshot={failed} />);
    const statement = resultStatement(failed);
    expect(statement.method).toBe('monteCarlo');
    expect(screen.getByTestId('record-result-statement').textContent).toBe(statement.text);
    expect(screen.getByTestId('record-result-statement').textContent).toContain('coverage interval [');
    expect(screen.getByTestId('record-result-reason').textContent).toBe(statement.reason);
    expect(screen.getByText('Monte Carlo coverage interval').nextElementSibling?.textContent).toBe(
      `${statement.intervalText} mg/L`,
    );
  });
});
