// @vitest-environment happy-dom
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { snapshotSchema } from '../../../../shared/contracts/snapshot';
import stored from '../../../../tests/fixtures/snapshots/lead-standard-stored-before-typing.json';
import { ResultStatementPanel } from './result-statement-panel';

// A snapshot as the previous code stored it, ν_eff = ∞ written as null (tests/fixtures/snapshots/README.md).
const { budget } = snapshotSchema.parse(JSON.parse(stored.snapshotJson));

afterEach(cleanup);

const degreesShown = () => screen.getByText('Effective degrees of freedom').nextElementSibling?.textContent;

describe('the record’s result panel', () => {
  it('shows ν_eff = ∞ for a snapshot stored with null', () => {
    render(<ResultStatementPanel budget={budget} />);
    expect(degreesShown()).toBe('∞');
  });

  it('shows ν_eff truncated, as the coverage factor used it (8.7 → 8)', () => {
    render(<ResultStatementPanel budget={{ ...budget, effectiveDegreesOfFreedom: 8.7 }} />);
    expect(degreesShown()).toBe('8');
  });
});
