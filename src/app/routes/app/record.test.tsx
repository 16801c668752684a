// @vitest-environment happy-dom
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Me } from '../../../../shared/contracts/auth';
import type { AllowedActions, PreparationDetail } from '../../../../shared/contracts/preparations';
import type { Role } from '../../../../shared/contracts/roles';
import { paths } from '../../../config/paths';
import { authKeys } from '../../../features/auth/api/auth-keys';
import { preparationKeys } from '../../../lib/api/preparation';
import {
  meOf,
  preparationAt,
  renderAt,
  stubServer,
  type Answer,
  type SentRequest,
} from '../../../test-support/component-harness';
import { Component as RecordRoute } from './record';

type Stage = Parameters<typeof preparationAt>[0];

const ACTIONS = [
  'Submit for review',
  'Withdraw from review',
  'Approve and sign',
  'Return with comments',
  'Start a new version',
] as const;
const STATUS_WORDS: Record<Stage, string> = {
  draft: 'Draft',
  prepared: 'Prepared (readings recorded)',
  submitted: 'Waiting for review',
  approved: 'Approved',
};
const approveUrl = '/api/labs/1/preparations/1/versions/1/approve';
const emptyAuditPage = (request: SentRequest): Answer | undefined =>
  request.method === 'GET' && request.url.startsWith('/api/labs/1/audit-events?')
    ? { status: 200, body: { events: [], total: 0 } }
    : undefined;

/** `me` with other roles in the demo lab (and, when given, another user id). */
const withRoles = (me: Me, roles: Role[], userId = me.user.id): Me => ({
  ...me,
  user: { ...me.user, id: userId },
  labs: me.labs.map((lab) => ({ ...lab, roles })),
});

/** `detail` as the server would answer a reader allowed `allowed`. */
const allowing = (detail: PreparationDetail, allowed: Partial<AllowedActions>): PreparationDetail => ({
  ...detail,
  current: { ...detail.current, allowedActions: { ...detail.current.allowedActions, ...allowed } },
});

/** The record page of version 1 as the server answered (`detail`), for `me`, with the answers already in the cache. */
async function showRecord(
  detail: PreparationDetail,
  me: Me,
  answer: (request: SentRequest) => Answer | undefined = emptyAuditPage,
) {
  const sent = stubServer(answer);
  renderAt(<RecordRoute />, {
    pattern: paths.app.record.path,
    path: paths.app.record.href(detail.id, 1),
    seed: (client) => {
      client.setQueryData(authKeys.me(), me);
      client.setQueryData(preparationKeys.detail(1, detail.id), detail);
      client.setQueryData(preparationKeys.version(1, detail.id, 1), detail.current);
    },
  });
  await screen.findByRole('heading', { level: 1, name: detail.title });
  return sent;
}

/** The record actions on screen, in the order of ACTIONS. */
const actionsShown = () => ACTIONS.filter((name) => screen.queryByRole('button', { name }) !== null);

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('record actions by role and state', () => {
  it('the fixture is the analyst’s own preparation, read by the demo people', () => {
    expect(preparationAt('draft').createdById).toBe(meOf('analyst').user.id);
    expect(meOf('qa').user.id).not.toBe(meOf('analyst').user.id);
    expect(meOf('auditor').labs[0].roles).toEqual(['auditor']);
  });

  it.each([
    ['draft', 'analyst', ['Submit for review']],
    ['prepared', 'analyst', ['Submit for review']],
    ['submitted', 'analyst', ['Withdraw from review']],
    ['approved', 'analyst', ['Start a new version']],
    ['draft', 'qa', []],
    ['submitted', 'qa', ['Approve and sign', 'Return with comments']],
    ['approved', 'qa', []],
    ['submitted', 'auditor', []],
    ['approved', 'auditor', []],
  ] as const)('%s version, seen by the %s: actions %j', async (stage, person, expected) => {
    await showRecord(preparationAt(stage, person), meOf(person));
    expect(screen.getAllByText(STATUS_WORDS[stage]).length).toBeGreaterThan(0); // the page shows the version in that state
    expect(actionsShown()).toEqual(expected);
  });

  it('offers only what the server allows, whatever the reader’s roles: no submission of another analyst’s draft', async () => {
    // The server answers another analyst's read of the draft with nothing allowed (server/reviews/allowed-actions.test.ts).
    const theirs = allowing(preparationAt('draft'), { edit: false, submit: false, recordReadings: false });
    await showRecord(theirs, withRoles(meOf('analyst'), ['analyst'], 99));
    expect(actionsShown()).toEqual([]);
  });

  it('tells a QA member who submitted the version that someone else must review it, and offers no approval', async () => {
    const refusal = 'You submitted this version; another member of QA must review it.';
    const author = withRoles(meOf('analyst'), ['analyst', 'qa']);
    await showRecord(allowing(preparationAt('submitted', 'analyst'), { reviewRefusal: refusal }), author);
    expect(screen.getByText(refusal)).toHaveProperty('tagName', 'P');
    expect(actionsShown()).toEqual(['Withdraw from review']); // as its owner, they may take it back
  });

  it('offers no withdrawal to another analyst reading a submitted version', async () => {
    await showRecord(
      allowing(preparationAt('submitted'), { withdraw: false }),
      withRoles(meOf('analyst'), ['analyst'], 99),
    );
    expect(actionsShown()).toEqual([]);
  });

  it('offers no approval to a QA member who submitted the version but does not own it (the server’s rule)', async () => {
    // The page used to check only the owner, so this reviewer was offered Approve and Return, which the server refused.
    const refusal = 'You submitted this version; another member of QA must review it.';
    await showRecord(
      allowing(preparationAt('submitted', 'analyst'), { reviewRefusal: refusal, withdraw: false }),
      meOf('qa'),
    );
    expect(screen.getByText(refusal)).toHaveProperty('tagName', 'P');
    expect(actionsShown()).toEqual([]);
  });
});

describe('approving a submitted version', () => {
  const approveDialog = () => screen.getByRole('dialog', { name: 'Approve and sign version 1' });

  it('asks for a statement and the password before sending anything', async () => {
    const sent = await showRecord(preparationAt('submitted', 'qa'), meOf('qa'));
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: 'Approve and sign' }));
    const dialog = approveDialog();
    await user.click(within(dialog).getByRole('button', { name: 'Approve and sign' }));
    const statement = within(dialog).getByRole('textbox', { name: 'What you approve' });
    await vi.waitFor(() => expect(statement.getAttribute('aria-invalid')).toBe('true'));
    expect(dialog.textContent).toMatch(/State what you approve/);
    expect(dialog.textContent).toMatch(/Re-enter your password to sign the approval/);
    expect(sent.filter((request) => request.method === 'POST')).toEqual([]);
  });

  it('keeps the dialog open with the password emptied when the server refuses the password, then signs with the right one', async () => {
    let attempts = 0;
    const sent = await showRecord(preparationAt('submitted', 'qa'), meOf('qa'), (request) => {
      if (request.method !== 'POST' || request.url !== approveUrl) return emptyAuditPage(request);
      attempts += 1;
      if (attempts === 1) {
        return {
          status: 400,
          body: {
            error: {
              code: 'validation_failed',
              message: 'The password is not right; the approval was not signed.',
              details: [{ path: 'password', message: 'This is not your password.' }],
            },
          },
        };
      }
      return { status: 200, body: preparationAt('approved') };
    });
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: 'Approve and sign' }));
    const dialog = approveDialog();
    const password = within(dialog).getByLabelText('Your password') as HTMLInputElement;
    await user.type(
      within(dialog).getByRole('textbox', { name: 'What you approve' }),
      'Budget reviewed; equipment in calibration.',
    );
    await user.type(password, 'not-my-password');
    await user.click(within(dialog).getByRole('button', { name: 'Approve and sign' }));

    await vi.waitFor(() => expect(password.getAttribute('aria-invalid')).toBe('true'));
    expect(dialog.textContent).toMatch(/This is not your password/);
    expect(password.value).toBe('');
    expect(dialog).toHaveProperty('open', true);

    await user.type(password, 'the-right-password');
    await user.click(within(dialog).getByRole('button', { name: 'Approve and sign' }));
    await vi.waitFor(() => expect(dialog).toHaveProperty('open', false));
    expect(
      sent.filter((request) => request.method === 'POST').map(({ url, body, csrf }) => ({ url, body, csrf })),
    ).toEqual([
      {
        url: approveUrl,
        body: { statement: 'Budget reviewed; equipment in calibration.', password: 'not-my-password' },
        csrf: 'test-csrf-token',
      },
      {
        url: approveUrl,
        body: { statement: 'Budget reviewed; equipment in calibration.', password: 'the-right-password' },
        csrf: 'test-csrf-token',
      },
    ]);
  });
});

describe('withdrawing a submitted version from review', () => {
  const withdrawUrl = '/api/labs/1/preparations/1/versions/1/withdraw';
  /** The server's answer: the version back as prepared (it has bench readings), its trail ending in the withdrawal. */
  const withdrawn = (): PreparationDetail => {
    const prepared = preparationAt('prepared');
    const submission = preparationAt('submitted').current.reviews;
    const reviews = [
      ...submission,
      { ...submission[0], id: 2, action: 'withdrawn' as const, comment: 'Wrong flask entered.' },
    ];
    return { ...prepared, current: { ...prepared.current, reviews } };
  };

  it('asks to confirm, sends the optional reason, then shows the version back as prepared with the withdrawal in its trail', async () => {
    const answer = withdrawn();
    const sent = await showRecord(preparationAt('submitted'), meOf('analyst'), (request) => {
      if (request.method === 'POST' && request.url === withdrawUrl) return { status: 200, body: answer };
      if (request.method === 'GET' && request.url === '/api/labs/1/preparations/1/versions/1')
        return { status: 200, body: answer.current };
      return emptyAuditPage(request);
    });
    expect(screen.getAllByText(STATUS_WORDS.submitted).length).toBeGreaterThan(0);
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: 'Withdraw from review' }));
    const dialog = screen.getByRole('dialog', { name: 'Withdraw version 1 from review' });
    expect(sent.filter((request) => request.method === 'POST')).toEqual([]); // nothing sent before confirming
    await user.type(within(dialog).getByRole('textbox', { name: 'Reason (optional)' }), 'Wrong flask entered.');
    await user.click(within(dialog).getByRole('button', { name: 'Withdraw from review' }));

    await vi.waitFor(() => expect(dialog).toHaveProperty('open', false));
    expect(sent.filter((request) => request.method === 'POST').map(({ url, body }) => ({ url, body }))).toEqual([
      { url: withdrawUrl, body: { comment: 'Wrong flask entered.' } },
    ]);
    const trail = screen.getByRole('region', { name: 'Review trail' });
    await within(trail).findByText('Withdrawn from review');
    expect(within(trail).getByText('Wrong flask entered.')).toBeTruthy();
    expect(within(screen.getByRole('banner')).getByText('Withdrawn from review')).toHaveProperty('tagName', 'DT');
    expect(screen.getAllByText(STATUS_WORDS.prepared).length).toBeGreaterThan(0);
    expect(actionsShown()).toEqual(['Submit for review']);
  });

  it('re-reads the version when QA signs one the analyst has just withdrawn, and stops offering the approval', async () => {
    const answer = withdrawn();
    // What QA is told about the version once it is back with its analyst.
    const forQa = allowing(answer, { review: false, withdraw: false, submit: false, recordReadings: false });
    let withdrawnNow = false;
    await showRecord(preparationAt('submitted', 'qa'), meOf('qa'), (request) => {
      if (request.method === 'POST' && request.url === approveUrl) {
        withdrawnNow = true;
        return {
          status: 409,
          body: {
            error: {
              code: 'not_submitted',
              message: 'Version 1 is prepared; only a submitted version can be reviewed.',
            },
          },
        };
      }
      if (request.method === 'GET' && request.url === '/api/labs/1/preparations/1' && withdrawnNow)
        return { status: 200, body: forQa };
      if (request.method === 'GET' && request.url === '/api/labs/1/preparations/1/versions/1' && withdrawnNow)
        return { status: 200, body: forQa.current };
      if (request.method === 'GET' && request.url.startsWith('/api/labs/1/review-queue'))
        return { status: 200, body: [] };
      return emptyAuditPage(request);
    });
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: 'Approve and sign' }));
    const dialog = screen.getByRole('dialog', { name: 'Approve and sign version 1' });
    await user.type(within(dialog).getByRole('textbox', { name: 'What you approve' }), 'Budget reviewed.');
    await user.type(within(dialog).getByLabelText('Your password'), 'the-right-password');
    await user.click(within(dialog).getByRole('button', { name: 'Approve and sign' }));

    await within(dialog).findByText(/only a submitted version can be reviewed/);
    await vi.waitFor(() => expect(screen.getAllByText(STATUS_WORDS.prepared).length).toBeGreaterThan(0));
    expect(actionsShown()).toEqual([]);
  });
});
