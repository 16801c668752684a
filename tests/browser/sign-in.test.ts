import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { launchChromium, openCleanPage, screenshot } from './support/chromium';
import { startDilutraceServer, type RunningServer } from './support/dilutrace-server';

/** Demo password for this run only; the seed gives it to every demo user. */
const DEMO_PASSWORD = 'wellmere-e2e-password-1';
const DEMO_DOMAIN = 'wellmere-water.example';
const LAB_NAME = 'Wellmere Regional Water Laboratory';

let server: RunningServer;
let browser: Awaited<ReturnType<typeof launchChromium>>;
let context: BrowserContext;

beforeAll(async () => {
  server = await startDilutraceServer(DEMO_PASSWORD);
  browser = await launchChromium();
  context = browser.context;
}, 60_000);

// A test that fails midway leaves its tab open; close it so the next test starts clean.
afterEach(async () => {
  await Promise.all(context.pages().map((page) => page.close()));
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const openPage = () => openCleanPage(context);

async function signIn(page: Page, email: string, password: string) {
  await page.goto(`${server.baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

async function signOut(page: Page) {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
}

const mainNavigation = (page: Page) => page.getByRole('navigation', { name: 'Main' });

describe('signing in', () => {
  const roles = [
    { local: 'admin', card: 'Lab administrator', admin: true },
    { local: 'qa', card: 'Quality assurance', admin: false },
    { local: 'analyst', card: 'Analyst', admin: false },
    { local: 'analyst2', card: 'Analyst', admin: false },
    { local: 'auditor', card: 'Auditor', admin: false },
  ];

  for (const role of roles) {
    it(`shows ${role.local}@ the navigation and dashboard of their roles, then signs out`, async () => {
      const { page, problems } = await openPage();
      await signIn(page, `${role.local}@${DEMO_DOMAIN}`, DEMO_PASSWORD);
      await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
      expect(new URL(page.url()).pathname).toBe('/');

      const navigation = mainNavigation(page);
      await expect(navigation.getByRole('link', { name: 'Dashboard' }).count()).resolves.toBe(1);
      await expect(navigation.getByRole('link', { name: 'Members' }).count()).resolves.toBe(role.admin ? 1 : 0);
      await expect(navigation.getByRole('link', { name: 'Delivery log' }).count()).resolves.toBe(role.admin ? 1 : 0);
      // The demo admin account is also the instance operator, the only one who reads captured mail.
      await expect(navigation.getByRole('link', { name: 'Captured mail' }).count()).resolves.toBe(role.admin ? 1 : 0);
      await expect(page.getByRole('heading', { level: 2, name: role.card }).count()).resolves.toBe(1);
      await expect(page.getByText(LAB_NAME).first().isVisible()).resolves.toBe(true);
      await screenshot(page, `dashboard-${role.local}`);

      await signOut(page);
      expect(new URL(page.url()).pathname).toBe('/sign-in');
      expect(problems).toEqual([]);
      await page.close();
    });
  }

  it('shows a wrong password as the server words it, in place, and stays on sign-in', async () => {
    const { page, problems } = await openPage();
    await signIn(page, `qa@${DEMO_DOMAIN}`, 'not-the-password');
    const alert = page.getByRole('alert');
    await alert.waitFor();
    expect((await alert.innerText()).trim().length).toBeGreaterThan(0);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await screenshot(page, 'sign-in-wrong-password');
    expect(problems).toEqual([]);
  });

  it('checks the form before asking the server', async () => {
    const { page } = await openPage();
    await page.goto(`${server.baseUrl}/sign-in`);
    await page.getByRole('button', { name: 'Sign in' }).click();
    const email = page.getByLabel('E-mail');
    await expect(email.getAttribute('aria-invalid')).resolves.toBe('true');
    const describedBy = (await email.getAttribute('aria-describedby')) ?? '';
    await expect(page.locator(`[id="${describedBy}"]`).innerText()).resolves.toContain('e-mail address');
  });

  it('gives keyboard users a skip link first, then the form fields in order', async () => {
    const { page } = await openPage();
    await page.goto(`${server.baseUrl}/sign-in`);
    await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
    const focusedText = () => page.evaluate(() => document.activeElement?.textContent ?? '');
    const focusedLabel = () =>
      page.evaluate(() => (document.activeElement as HTMLInputElement | null)?.labels?.[0]?.textContent ?? '');
    await page.keyboard.press('Tab');
    await expect(focusedText()).resolves.toBe('Skip to content');
    await page.keyboard.press('Tab');
    await expect(focusedLabel()).resolves.toBe('E-mail');
    await page.keyboard.press('Tab');
    await expect(focusedLabel()).resolves.toBe('Password');
  });

  it('sends a signed-out visitor to sign-in and back to the page they asked for', async () => {
    const { page, problems } = await openPage();
    await page.goto(`${server.baseUrl}/members`);
    await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).searchParams.get('redirectTo')).toBe('/members');
    await page.getByLabel('E-mail').fill(`admin@${DEMO_DOMAIN}`);
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { level: 1, name: 'Members' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/members');
    await signOut(page);
    expect(problems).toEqual([]);
  });

  it('tells an analyst the members page is not for them', async () => {
    const { page } = await openPage();
    await signIn(page, `analyst@${DEMO_DOMAIN}`, DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
    await page.goto(`${server.baseUrl}/members`);
    await page.getByText('Not permitted').waitFor();
    await expect(page.getByRole('table').count()).resolves.toBe(0);
    await screenshot(page, 'members-not-permitted');
    await signOut(page);
  });
});

describe('inviting a new analyst', () => {
  it('goes from the invite form through the captured mail to a signed-in analyst', async () => {
    const { page, problems } = await openPage();
    const newEmail = `jory.trevail@${DEMO_DOMAIN}`;
    const newName = 'Jory Trevail';
    const newPassword = 'a burette of good coffee';

    await signIn(page, `admin@${DEMO_DOMAIN}`, DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
    await mainNavigation(page).getByRole('link', { name: 'Members' }).click();
    await page.getByRole('heading', { level: 1, name: 'Members' }).waitFor();
    await expect(page.getByRole('row').count()).resolves.toBe(6); // header + five demo members

    const form = page.getByRole('form', { name: 'Invite a member' });
    await form.getByLabel('Name').fill(newName);
    await form.getByLabel('E-mail').fill(newEmail);
    await form.getByLabel('Role').selectOption('analyst');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText(`Invitation sent to ${newEmail}`).waitFor();
    await page.getByText(newEmail, { exact: true }).waitFor(); // listed under pending invitations
    await screenshot(page, 'members-after-invitation');

    // The lab's delivery log lists the invitation without its body or link.
    await mainNavigation(page).getByRole('link', { name: 'Delivery log' }).click();
    await page.getByRole('heading', { level: 1, name: 'Delivery log' }).waitFor();
    await page.getByRole('cell', { name: newEmail }).first().waitFor();
    await expect(page.getByRole('link', { name: /\/invitation\// }).count()).resolves.toBe(0);
    await screenshot(page, 'delivery-log');

    // The operator (here the same demo account) reads the captured message itself.
    await mainNavigation(page).getByRole('link', { name: 'Captured mail' }).click();
    await page.getByRole('heading', { level: 1, name: 'Captured mail' }).waitFor();
    const newest = page.getByRole('list', { name: 'Captured mail' }).getByRole('link').first();
    await expect(newest.innerText()).resolves.toContain(newEmail);
    await newest.click();
    const invitationLink = page.getByRole('article').getByRole('link', { name: /\/invitation\// });
    await invitationLink.waitFor();
    await screenshot(page, 'captured-mail-invitation');

    // The invitee's own browser session: sign the admin out first, then follow the mailed link.
    const href = (await invitationLink.getAttribute('href')) ?? '';
    expect(new URL(href).pathname).toMatch(/^\/invitation\/[A-Za-z0-9_-]{20,100}$/);
    await signOut(page);
    await page.goto(href);
    await page.getByRole('heading', { level: 1, name: `Join ${LAB_NAME}` }).waitFor();
    await expect(page.getByText(newEmail).count()).resolves.toBe(1);
    await screenshot(page, 'invitation-accept');

    await page.getByLabel('Your name').fill(newName);
    await page.getByLabel('Choose a password').fill(newPassword);
    await page.getByLabel('Password again').fill(newPassword);
    await page.getByRole('button', { name: 'Join the lab' }).click();

    await page.getByRole('heading', { level: 1, name: `Welcome, ${newName}` }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/');
    await expect(page.getByRole('heading', { level: 2, name: 'Analyst' }).count()).resolves.toBe(1);
    await expect(mainNavigation(page).getByRole('link', { name: 'Members' }).count()).resolves.toBe(0);
    await screenshot(page, 'dashboard-new-analyst');

    // The new password works for a later sign-in, too.
    await signOut(page);
    await signIn(page, newEmail, newPassword);
    await page.getByRole('heading', { level: 1, name: `Welcome, ${newName}` }).waitFor();
    await signOut(page);
    expect(problems).toEqual([]);
  });
});

describe('administering members', () => {
  it('gives a member a second role and removes another from the lab after confirming', async () => {
    const { page, problems } = await openPage();
    await signIn(page, `admin@${DEMO_DOMAIN}`, DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
    await page.goto(`${server.baseUrl}/members`);

    const analyst2Roles = page.getByRole('group', { name: /^Roles of Lucía/ });
    const qaBox = analyst2Roles.getByRole('checkbox', { name: 'QA' });
    const saved = page.waitForResponse((response) => response.request().method() === 'PATCH');
    await qaBox.check();
    expect((await saved).status()).toBe(200);
    await expect(qaBox.isChecked()).resolves.toBe(true);

    const auditorRow = page.getByRole('row').filter({ hasText: `auditor@${DEMO_DOMAIN}` });
    await auditorRow.getByRole('button', { name: /^Remove/ }).click();
    const dialog = page.getByRole('dialog', { name: /^Remove / });
    await dialog.waitFor();
    await screenshot(page, 'members-confirm-remove');
    await dialog.getByRole('button', { name: 'Remove' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await auditorRow.waitFor({ state: 'detached' });
    await signOut(page);

    // Lucía now sees the QA card beside her analyst card.
    await signIn(page, `analyst2@${DEMO_DOMAIN}`, DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
    await expect(page.getByRole('heading', { level: 2, name: 'Quality assurance' }).count()).resolves.toBe(1);
    await expect(page.getByRole('heading', { level: 2, name: 'Analyst' }).count()).resolves.toBe(1);
    await signOut(page);
    expect(problems).toEqual([]);

    // The removed auditor's account still signs in, but the lab and its records are gone from it.
    await signIn(page, `auditor@${DEMO_DOMAIN}`, DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
    await expect(mainNavigation(page).getByRole('link', { name: 'Approved records' }).count()).resolves.toBe(0);
    await expect(mainNavigation(page).getByRole('link', { name: 'Audit trail' }).count()).resolves.toBe(0);
    await signOut(page);

    // Invited back, the auditor accepts signed in as herself: the link asks for no password.
    await signIn(page, `admin@${DEMO_DOMAIN}`, DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
    await page.goto(`${server.baseUrl}/members`);
    const form = page.getByRole('form', { name: 'Invite a member' });
    await form.getByLabel('Name').fill('Harriet Vance');
    await form.getByLabel('E-mail').fill(`auditor@${DEMO_DOMAIN}`);
    await form.getByLabel('Role').selectOption('auditor');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText(`Invitation sent to auditor@${DEMO_DOMAIN}`).waitFor();
    await mainNavigation(page).getByRole('link', { name: 'Captured mail' }).click();
    await page.getByRole('list', { name: 'Captured mail' }).getByRole('link').first().click();
    const invitationLink = page.getByRole('article').getByRole('link', { name: /\/invitation\// });
    const href = (await invitationLink.getAttribute('href')) ?? '';
    await signOut(page);

    await page.goto(href);
    await page.getByRole('heading', { level: 1, name: `Join ${LAB_NAME}` }).waitFor();
    await expect(page.getByLabel(/password/i).count()).resolves.toBe(0);
    await screenshot(page, 'invitation-existing-account');
    await page.getByRole('link', { name: `Sign in as auditor@${DEMO_DOMAIN} to accept` }).click();
    await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
    await page.getByLabel('E-mail').fill(`auditor@${DEMO_DOMAIN}`);
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { level: 1, name: `Join ${LAB_NAME}` }).waitFor();
    await page.getByRole('button', { name: 'Join the lab' }).click();
    await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
    await expect(page.getByRole('heading', { level: 2, name: 'Auditor' }).count()).resolves.toBe(1);
    await signOut(page);
  });
});

describe('resetting a forgotten password', () => {
  it('mails a link that sets a new password, and the new one signs in', async () => {
    const { page, problems } = await openPage();
    const newPassword = 'volumetric flask at twenty degrees';
    await page.goto(`${server.baseUrl}/forgot-password`);
    await page.getByLabel('E-mail').fill(`qa@${DEMO_DOMAIN}`);
    await page.getByRole('button', { name: 'Send reset link' }).click();
    await page.getByRole('status').filter({ hasText: /\S/ }).first().waitFor();

    await signIn(page, `admin@${DEMO_DOMAIN}`, DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
    // Only the instance operator reads the reset mail (the demo admin account is the operator).
    await page.goto(`${server.baseUrl}/captured-mail`);
    await page
      .getByRole('list', { name: 'Captured mail' })
      .getByRole('link')
      .filter({ hasText: `qa@${DEMO_DOMAIN}` })
      .first()
      .click();
    const resetLink = page.getByRole('article').getByRole('link', { name: /\/reset-password\// });
    await resetLink.waitFor();
    const href = (await resetLink.getAttribute('href')) ?? '';
    await signOut(page);

    await page.goto(href);
    await page.getByLabel('New password', { exact: true }).fill(newPassword);
    await page.getByLabel('New password again').fill(newPassword);
    await page.getByRole('button', { name: 'Set new password' }).click();
    await page.getByText('Password changed.').waitFor();
    await screenshot(page, 'reset-password-done');

    await signIn(page, `qa@${DEMO_DOMAIN}`, newPassword);
    await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
    await signOut(page);
    expect(problems).toEqual([]);
  });
});

describe('the instance operator', () => {
  it('disables an account everywhere and enables it again from the Accounts screen', async () => {
    const { page, problems } = await openPage();
    await signIn(page, `admin@${DEMO_DOMAIN}`, DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
    await mainNavigation(page).getByRole('link', { name: 'Accounts' }).click();
    await page.getByRole('heading', { level: 1, name: 'Accounts' }).waitFor();

    const analystRow = page.getByRole('row').filter({ hasText: `analyst@${DEMO_DOMAIN}` });
    await analystRow.getByRole('button', { name: /^Disable/ }).click();
    const dialog = page.getByRole('dialog', { name: /^Disable / });
    await dialog.getByText(LAB_NAME).waitFor();
    await screenshot(page, 'accounts-confirm-disable');
    await dialog.getByRole('button', { name: 'Disable' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await analystRow.getByText('Disabled').waitFor();
    await signOut(page);

    // Disabled everywhere: the refusal is shown in place.
    await signIn(page, `analyst@${DEMO_DOMAIN}`, DEMO_PASSWORD);
    await page.getByRole('alert').waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');

    await signIn(page, `admin@${DEMO_DOMAIN}`, DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
    await page.goto(`${server.baseUrl}/accounts`);
    await analystRow.getByRole('button', { name: /^Enable/ }).click();
    await page
      .getByRole('dialog', { name: /^Enable / })
      .getByRole('button', { name: 'Enable' })
      .click();
    await analystRow.getByText('Active').waitFor();
    await signOut(page);

    await signIn(page, `analyst@${DEMO_DOMAIN}`, DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
    await signOut(page);
    expect(problems).toEqual([]);
  });
});

describe('pages without a session', () => {
  it('renders the password reset request, the reset page and the 404 page', async () => {
    const { page, problems } = await openPage();
    await page.goto(`${server.baseUrl}/sign-in`);
    await page.getByRole('link', { name: 'Forgot password?' }).click();
    await page.getByRole('heading', { level: 1, name: 'Reset your password' }).waitFor();
    await page.getByLabel('E-mail').fill(`qa@${DEMO_DOMAIN}`);
    await page.getByRole('button', { name: 'Send reset link' }).click();
    await page.getByRole('status').filter({ hasText: /\S/ }).first().waitFor();
    await screenshot(page, 'forgot-password-sent');

    await page.goto(`${server.baseUrl}/reset-password/not-a-real-token-but-long-enough`);
    await page.getByRole('heading', { level: 1, name: 'Choose a new password' }).waitFor();
    await screenshot(page, 'reset-password');

    await page.goto(`${server.baseUrl}/no/such/page`);
    await page.getByRole('heading', { level: 1, name: 'Page not found' }).waitFor();
    await screenshot(page, 'not-found');
    expect(problems).toEqual([]);
  });
});
