// @vitest-environment happy-dom
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { preparationAt, renderAt, stubServer } from '../../../test-support/component-harness';
import { ReadingsForm } from './readings-form';

const readingsUrl = '/api/labs/1/preparations/1/versions/1/readings';
const box = (name: string) => screen.getByRole('textbox', { name }) as HTMLInputElement;

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('ReadingsForm on a computed draft', () => {
  const draft = preparationAt('draft');
  const show = () => renderAt(<ReadingsForm labId={1} detail={draft} recordHref="/records/1/v/1" />);

  it('offers one row per weighing step, with tare, gross and net boxes named by step', () => {
    stubServer(() => undefined);
    show();
    expect(screen.getByRole('heading', { name: 'Record the readings' })).toHaveProperty('tagName', 'H2');
    const table = screen.getByRole('table', { name: 'Masses weighed, one row per weighing step' });
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(2); // the header and the lead nitrate weighing (the plan's other steps are volumes)
    expect(within(rows[1]).getByRole('rowheader').textContent).toMatch(/^Step 1On BAL-05/);
    expect(within(rows[1]).getByRole('cell', { name: /^0\.1599/ })).toHaveProperty('tagName', 'TD');
    for (const name of ['Step 1 tare (g)', 'Step 1 gross (g)', 'Step 1 net weighed (g)'])
      expect(box(name).value).toBe('');
    expect(screen.getByRole('button', { name: 'Record the readings' })).toHaveProperty('disabled', false);
  });

  it('fills the net in as gross − tare and sends the readings, then says the version is prepared', async () => {
    const sent = stubServer((request) =>
      request.method === 'POST' && request.url === readingsUrl
        ? { status: 200, body: preparationAt('prepared') }
        : undefined,
    );
    const user = userEvent.setup();
    show();
    await user.type(box('Step 1 tare (g)'), '12.38115');
    await user.type(box('Step 1 gross (g)'), '12.54157');
    expect(box('Step 1 net weighed (g)').value).toBe('0.16042');
    await user.type(
      screen.getByRole('textbox', { name: 'Deviations from the plan' }),
      'Weighed 0.45 mg over the target.',
    );
    await user.click(screen.getByRole('button', { name: 'Record the readings' }));

    const confirmation = await screen.findByRole('status');
    expect(confirmation.textContent).toMatch(/Readings recorded: version 1 is prepared/);
    expect(
      within(confirmation)
        .getByRole('link', { name: 'Open the record to check it and submit it for review' })
        .getAttribute('href'),
    ).toBe('/records/1/v/1');
    expect(sent).toEqual([
      {
        method: 'POST',
        url: readingsUrl,
        csrf: 'test-csrf-token',
        body: {
          readings: [{ stepIndex: 0, actualMassG: 0.16042, tareG: 12.38115, grossG: 12.54157 }],
          deviations: 'Weighed 0.45 mg over the target.',
        },
      },
    ]);
  });

  it('sends nothing while a mass is missing: the net box is marked invalid, says why and takes the focus', async () => {
    const sent = stubServer(() => undefined);
    const user = userEvent.setup();
    show();
    await user.click(screen.getByRole('button', { name: 'Record the readings' }));
    const net = box('Step 1 net weighed (g)');
    expect(net.getAttribute('aria-invalid')).toBe('true');
    const described = (net.getAttribute('aria-describedby') ?? '')
      .split(' ')
      .map((id) => document.getElementById(id)?.textContent);
    expect(described).toContain('Enter the net mass weighed, or the tare and gross.');
    expect(document.activeElement).toBe(net);
    expect(sent).toEqual([]);
  });

  it('refuses a gross that is not more than the tare before asking the server', async () => {
    const sent = stubServer(() => undefined);
    const user = userEvent.setup();
    show();
    await user.type(box('Step 1 tare (g)'), '10');
    await user.type(box('Step 1 gross (g)'), '9.5');
    await user.type(box('Step 1 net weighed (g)'), '0.5');
    await user.click(screen.getByRole('button', { name: 'Record the readings' }));
    const gross = box('Step 1 gross (g)');
    expect(gross.getAttribute('aria-invalid')).toBe('true');
    expect(document.getElementById(`${gross.id}-error`)?.textContent).toMatch(/gross must be more than the tare/);
    expect(sent).toEqual([]);
  });

  it('puts the server’s refusal of a reading on that reading’s box', async () => {
    const message = 'The net mass must equal gross minus tare.';
    stubServer(() => ({
      status: 400,
      body: {
        error: {
          code: 'validation_failed',
          message: 'Check the readings.',
          details: [{ path: 'readings.0.actualMassG', message }],
        },
      },
    }));
    const user = userEvent.setup();
    show();
    await user.type(box('Step 1 net weighed (g)'), '0.16');
    await user.click(screen.getByRole('button', { name: 'Record the readings' }));
    const net = box('Step 1 net weighed (g)');
    await vi.waitFor(() => expect(net.getAttribute('aria-invalid')).toBe('true'));
    expect(document.getElementById(`${net.id}-error`)?.textContent).toBe(message);
    expect(screen.queryByRole('status')).toBeNull(); // no "recorded" confirmation
  });
});

describe('ReadingsForm once readings are recorded', () => {
  it('shows who recorded them, fills the boxes with what was recorded, and offers a correction', () => {
    stubServer(() => undefined);
    const prepared = preparationAt('prepared');
    renderAt(<ReadingsForm labId={1} detail={prepared} recordHref="/records/1/v/1" />);
    expect(screen.getByRole('heading', { name: 'Correct the readings' })).toHaveProperty('tagName', 'H2');
    expect(screen.getByText(/^Recorded by Dev Okonjo/)).toHaveProperty('tagName', 'P');
    expect([box('Step 1 tare (g)').value, box('Step 1 gross (g)').value, box('Step 1 net weighed (g)').value]).toEqual([
      '12.38115',
      '12.54157',
      '0.16042',
    ]);
    expect(screen.getByRole<HTMLTextAreaElement>('textbox', { name: 'Deviations from the plan' }).value).toBe(
      'Weighed 0.45 mg over the target.',
    );
    expect(screen.getByRole('button', { name: 'Save the corrected readings' })).toHaveProperty('disabled', false);
    expect(screen.queryByRole('button', { name: 'Record the readings' })).toBeNull();
  });
});

describe('ReadingsForm on a plan that cannot be computed', () => {
  it('offers no boxes and says why', () => {
    stubServer(() => undefined);
    const draft = preparationAt('draft');
    const broken = {
      ...draft,
      current: {
        ...draft.current,
        snapshot: null,
        problem: { path: ['steps', 1, 'flask'], message: 'Step 2 needs a flask.' },
      },
    };
    renderAt(<ReadingsForm labId={1} detail={broken} recordHref="/records/1/v/1" />);
    expect(screen.getByText(/cannot be computed yet \(Step 2 needs a flask\.\)/)).toHaveProperty('tagName', 'P');
    expect(screen.queryAllByRole('textbox')).toEqual([]);
    expect(screen.queryByRole('button')).toBeNull();
  });
});
