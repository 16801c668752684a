// @vitest-environment happy-dom
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { EquipmentItem } from '../../../../shared/contracts/library';
import { RouteFinderForm } from './route-finder-form';

afterEach(cleanup);

/** The invented Wellmere lab's 1000 mg/L selenium standard, as the equipment list answers it. */
const selenium: EquipmentItem = {
  id: 7,
  kind: 'solution-material',
  code: 'RM-SE-1000',
  status: 'active',
  retiredReason: null,
  current: {
    id: 70,
    number: 1,
    data: { name: 'Selenium standard 1000 mg/L', analyte: 'Se' },
    reason: '',
    createdBy: 'Lena Marsh',
    createdAt: '2026-11-02T09:00:00.000Z',
  },
  calibration: 'not-tracked',
  expiry: 'ok',
  minimumWeightG: null,
  certificateCount: 0,
  flags: [],
};

const show = () => {
  const onSubmit = vi.fn();
  render(<RouteFinderForm materials={[selenium]} pending={false} onSubmit={onSubmit} />);
  return onSubmit;
};
const errorOf = (control: HTMLElement) => document.getElementById(`${control.id}-error`)?.textContent;

describe('RouteFinderForm', () => {
  it('sends the request the shared schema gives: analyte from the material, decimal comma read, defaults filled', async () => {
    const onSubmit = show();
    const user = userEvent.setup();
    await user.type(screen.getByRole('textbox', { name: 'Target concentration' }), '0,5');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Unit' }), 'µg/L');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Reference material' }), '7');
    expect(screen.getByRole<HTMLInputElement>('textbox', { name: 'Analyte' }).value).toBe('Se');
    await user.click(screen.getByRole('button', { name: 'Find routes' }));
    await vi.waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0]).toEqual({
      target: { value: 0.5, unit: 'µg/L' },
      analyte: 'Se',
      materialLibraryId: '7',
      maximumDilutions: 3,
      limit: 10,
    });
  });

  it('puts each problem at its field in the chemist’s words and sends nothing', async () => {
    const onSubmit = show();
    const user = userEvent.setup();
    await user.type(screen.getByRole('textbox', { name: 'Target concentration' }), 'ten');
    await user.click(screen.getByRole('button', { name: 'Find routes' }));
    const target = screen.getByRole('textbox', { name: 'Target concentration' });
    await vi.waitFor(() => expect(target.getAttribute('aria-invalid')).toBe('true'));
    expect(errorOf(target)).toBe('Enter the target concentration as a number.');
    expect(errorOf(screen.getByRole('combobox', { name: 'Reference material' }))).toBe(
      'Choose the reference material.',
    );
    expect(errorOf(screen.getByRole('textbox', { name: 'Analyte' }))).toBe('Enter the analyte, e.g. Pb.');
    expect(document.activeElement).toBe(target);

    await user.clear(target);
    await user.type(target, '0');
    await vi.waitFor(() => expect(errorOf(target)).toBe('The target must be greater than zero.'));
    expect(onSubmit).not.toHaveBeenCalled();
  });
});
