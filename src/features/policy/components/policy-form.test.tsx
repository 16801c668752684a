// @vitest-environment happy-dom
import { cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DEFAULT_LAB_POLICY, type LabPolicy } from '../../../../shared/contracts/library';
import { renderAt, stubServer } from '../../../test-support/component-harness';
import { PolicyForm } from './policy-form';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

/** A server that keeps what the form saves. */
function policyServer() {
  return stubServer((request) =>
    request.url === '/api/labs/1/policy' && request.method === 'PUT'
      ? { status: 200, body: { ...(request.body as LabPolicy), updatedAt: null, updatedBy: 'QA' } }
      : undefined,
  );
}

const type = (label: string, value: string) => fireEvent.input(screen.getByLabelText(label), { target: { value } });

describe('the policy form: air buoyancy and the density of certified solutions', () => {
  it('QA bounds buoyancy instead, adds a matrix row and takes water for the rest; the PUT carries exactly that', async () => {
    const sent = policyServer();
    renderAt(<PolicyForm labId={1} policy={DEFAULT_LAB_POLICY} />);
    expect(screen.getByText('The table is empty.')).toBeTruthy();

    fireEvent.click(screen.getByLabelText(/Do not correct; count it as an uncertainty/));
    type('Air density', '1,18');
    fireEvent.click(screen.getByRole('button', { name: 'Add a matrix' }));
    type('Matrix, row 1', '2 % HNO3');
    // Density of 2 % nitric acid at 20 °C ≈ 1.0098 g/mL (from memory).
    type('Density in g/mL, row 1', '1.0098');
    type('Standard uncertainty in g/mL, row 1', '0.0005');
    fireEvent.click(screen.getByLabelText(/Use water's density, with an uncertainty, and warn/));
    type('Standard uncertainty of the assumed density', '0.004');
    fireEvent.click(screen.getByRole('button', { name: 'Save lab policy' }));

    await waitFor(() => expect(sent.filter((request) => request.method === 'PUT')).toHaveLength(1));
    const body = sent.find((request) => request.method === 'PUT')?.body as LabPolicy;
    expect(body.airBuoyancy).toEqual({
      treatment: 'boundAsUncertainty',
      airDensityKgPerM3: 1.18,
      airDensityHalfRangeKgPerM3: 0.05,
    });
    expect(body.solutionDensity).toEqual({
      matrixDensities: [{ matrix: '2 % HNO3', densityGPerMl: 1.0098, standardUncertaintyGPerMl: 0.0005 }],
      otherwise: 'assumeWater',
      waterStandardUncertaintyGPerMl: 0.004,
    });
  });

  it('a row can be removed, and a row without its density is refused before anything is sent', async () => {
    const sent = policyServer();
    renderAt(<PolicyForm labId={1} policy={DEFAULT_LAB_POLICY} />);
    fireEvent.click(screen.getByRole('button', { name: 'Add a matrix' }));
    fireEvent.click(screen.getByRole('button', { name: 'Add a matrix' }));
    fireEvent.click(screen.getByRole('button', { name: 'Remove row 2' }));
    expect(screen.queryByLabelText('Matrix, row 2')).toBeNull();
    type('Matrix, row 1', '5 % HNO3');
    fireEvent.click(screen.getByRole('button', { name: 'Save lab policy' }));
    await waitFor(() => expect(screen.getByText(/Enter the density as a number/)).toBeTruthy());
    expect(sent.filter((request) => request.method === 'PUT')).toEqual([]);
  });
});
