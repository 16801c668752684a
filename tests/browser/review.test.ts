import { SAFETY_ADVICE } from '../../shared/contracts/safety-advice';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { toEngineEquipment } from '../../shared/contracts/engine-equipment';
import type { EquipmentItem } from '../../shared/contracts/library';
import { launchChromium, openCleanPage, screenshot, SCREENSHOT_DIR } from './support/chromium';
import { startDilutraceServer, type RunningServer } from './support/dilutrace-server';

/** Demo password for this run only; the seed gives it to every demo user. */
const DEMO_PASSWORD = 'wellmere-e2e-review-password';
const DEMO_DOMAIN = 'wellmere-water.example';
const APPROVED_TITLE = 'Pb 100 mg/L intermediate, lot PBN-24117';
const RETURNED_TITLE = 'Pb 100 mg/L intermediate, second flask';
const RETURN_COMMENT = 'Use the class A flask VF-100-A for the final make-up, as SOP-CHEM-014 asks.';
const APPROVAL_STATEMENT = 'Budget reviewed against SOP-CHEM-014; equipment in calibration.';

let server: RunningServer;
let browser: Awaited<ReturnType<typeof launchChromium>>;
let work: string;
/** What the analyst's API calls created: preparation ids and the approved one's result statement. */
const created: { approvedId?: number; returnedId?: number; statement?: string } = {};

beforeAll(async () => {
  server = await startDilutraceServer(DEMO_PASSWORD);
  browser = await launchChromium();
  work = mkdtempSync(join(tmpdir(), 'dt-review-'));
}, 60_000);

afterEach(async () => {
  await Promise.all(browser.context.pages().map((page) => page.close()));
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
  if (work) rmSync(work, { recursive: true, force: true });
});

const openPage = () => openCleanPage(browser.context);

async function signIn(page: Page, local: string) {
  await page.goto(`${server.baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(`${local}@${DEMO_DOMAIN}`);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
}

const mainNavigation = (page: Page) => page.getByRole('navigation', { name: 'Main' });

/** The demo lead plan of server/test-support/demo-plans.ts: 0.1599 g of lead nitrate to 100 mL, then 10 mL to 100 mL. */
function leadPlan(library: Map<string, EquipmentItem>, aliquotFlask: string) {
  const use = (code: string) => {
    const item = library.get(code);
    if (!item) throw new Error(`The demo library has no ${code}`);
    return toEngineEquipment(item);
  };
  return {
    formatVersion: 1,
    title: 'Pb 100 mg/L intermediate',
    analyte: { formula: 'Pb' },
    settings: { outputUnit: 'mg/L', labTemperatureC: 20 },
    steps: [
      { kind: 'weighSolid', material: use('RM-PBN-01'), balance: use('BAL-05'), netMassG: 0.1599 },
      { kind: 'makeUpToVolume', flask: use('VF-100-A') },
      { kind: 'pipetteAliquot', pipette: use('GP-10-A'), volumeMl: 10 },
      { kind: 'makeUpToVolume', flask: use(aliquotFlask) },
    ],
  };
}

/** Creates a computed preparation through the API, with the signed-in page's session and CSRF token. */
async function createPreparation(
  page: Page,
  title: string,
  aliquotFlask: string,
): Promise<{ id: number; statement: string }> {
  const me = (await (await page.request.get(`${server.baseUrl}/api/auth/me`)).json()) as {
    activeLabId: number;
    csrfToken: string;
  };
  const items = (await (
    await page.request.get(`${server.baseUrl}/api/labs/${me.activeLabId}/equipment?status=all`)
  ).json()) as EquipmentItem[];
  const library = new Map(items.map((item) => [item.code, item]));
  const response = await page.request.post(`${server.baseUrl}/api/labs/${me.activeLabId}/preparations`, {
    headers: { 'X-CSRF-Token': me.csrfToken },
    data: { title, plan: leadPlan(library, aliquotFlask), seed: 20260 },
  });
  expect(response.status()).toBe(201);
  const detail = (await response.json()) as { id: number; current: { resultStatement: string | null } };
  expect(detail.current.resultStatement).toMatch(/^c\(Pb\) = \(99\.\d+ ± 0\.\d+\) mg\/L/);
  return { id: detail.id, statement: detail.current.resultStatement ?? '' };
}

const statusBadge = (page: Page) => page.getByTestId('record-status');

async function openRecord(page: Page, preparationId: number) {
  await page.goto(`${server.baseUrl}/records/${preparationId}/v/1`);
  await page.getByText('Preparation record', { exact: true }).waitFor();
}

/** Asserts that nothing went wrong on the page except the one refusal the test provoked on purpose. */
function expectNoProblems(problems: string[], allowed: RegExp | null = null) {
  expect(problems.filter((problem) => !(allowed && allowed.test(problem)))).toEqual([]);
}

describe('review and approval of a preparation record', () => {
  it('lets the analyst submit a computed draft from its record page', async () => {
    const { page, problems } = await openPage();
    await signIn(page, 'analyst');
    const approved = await createPreparation(page, APPROVED_TITLE, 'VF-100-B');
    const returned = await createPreparation(page, RETURNED_TITLE, 'VF-100-B');
    created.approvedId = approved.id;
    created.returnedId = returned.id;
    created.statement = approved.statement;

    await openRecord(page, approved.id);
    await expect(page.getByRole('heading', { level: 1 }).innerText()).resolves.toBe(APPROVED_TITLE);
    await expect(statusBadge(page).innerText()).resolves.toBe('Draft');
    await expect(page.getByTestId('record-result-statement').innerText()).resolves.toBe(approved.statement);
    // The lead nitrate carries QA's hazard notes; the record repeats them with the standing advice.
    await expect(page.getByRole('complementary', { name: /Caution/ }).innerText()).resolves.toContain(SAFETY_ADVICE);
    await expect(page.getByRole('link', { name: 'Download draft PDF' }).count()).resolves.toBe(1);
    const stepRows = page.getByRole('table', { name: /by step/ }).locator('tbody tr');
    await expect(stepRows.count()).resolves.toBe(4);
    await expect(stepRows.nth(0).innerText()).resolves.toMatch(/^Step 1 · Weigh the solid \(BAL-05\)/);
    await screenshot(page, 'record-draft');

    await page.getByRole('button', { name: 'Submit for review' }).click();
    const dialog = page.getByRole('dialog', { name: /Submit version 1/ });
    await dialog.getByLabel('Note to the reviewer (optional)').fill('Lot PBN-24117, first use of the new bench.');
    await dialog.getByRole('button', { name: 'Submit for review' }).click();
    await statusBadge(page).filter({ hasText: 'Waiting for review' }).waitFor();
    await expect(page.getByRole('region', { name: 'Review trail' }).innerText()).resolves.toContain(
      'Lot PBN-24117, first use of the new bench.',
    );
    await expect(page.getByRole('button', { name: 'Submit for review' }).count()).resolves.toBe(0);

    await openRecord(page, returned.id);
    await page.getByRole('button', { name: 'Submit for review' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Submit for review' }).click();
    await statusBadge(page).filter({ hasText: 'Waiting for review' }).waitFor();

    // Submitted by mistake: the analyst takes it back before QA decides, then submits it again.
    await page.getByRole('button', { name: 'Withdraw from review' }).click();
    const withdraw = page.getByRole('dialog', { name: /Withdraw version 1 from review/ });
    await withdraw.getByLabel('Reason (optional)').fill('Wrong flask entered.');
    await withdraw.getByRole('button', { name: 'Withdraw from review' }).click();
    await statusBadge(page).filter({ hasText: 'Draft' }).waitFor();
    const trail = await page.getByRole('region', { name: 'Review trail' }).innerText();
    expect(trail).toContain('Withdrawn from review by Dev Okonjo');
    expect(trail).toContain('Wrong flask entered.');
    await expect(page.getByRole('button', { name: 'Withdraw from review' }).count()).resolves.toBe(0);
    await page.getByRole('button', { name: 'Submit for review' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Submit for review' }).click();
    await statusBadge(page).filter({ hasText: 'Waiting for review' }).waitFor();
    // The planner says how to take it back, and links to the record page.
    await page.goto(`${server.baseUrl}/preparations/${returned.id}`);
    await page.getByRole('link', { name: 'Withdraw it from review on the record page' }).click();
    await page.getByRole('button', { name: 'Withdraw from review' }).waitFor();
    expectNoProblems(problems);
  });

  it('lets QA find both in the review queue, refuses a wrong password on its field, and approves with the right one', async () => {
    const { page, problems } = await openPage();
    await signIn(page, 'qa');
    await mainNavigation(page).getByRole('link', { name: 'Review queue' }).click();
    await page.getByRole('heading', { level: 1, name: 'Review queue' }).waitFor();
    const rows = page.getByRole('table', { name: /waiting for review/ }).locator('tbody tr');
    await expect(rows.count()).resolves.toBe(2);
    // Oldest first: the first submission heads the queue; both waited under an hour.
    await expect(rows.nth(0).innerText()).resolves.toContain(APPROVED_TITLE);
    await expect(rows.nth(0).innerText()).resolves.toContain('under 1 h');
    await expect(rows.nth(0).innerText()).resolves.toContain('Dev Okonjo');
    await screenshot(page, 'review-queue');

    await rows
      .nth(0)
      .getByRole('link', { name: new RegExp(APPROVED_TITLE) })
      .click();
    await page.getByRole('heading', { level: 1, name: APPROVED_TITLE }).waitFor();
    await page.getByRole('button', { name: 'Approve and sign' }).click();
    const dialog = page.getByRole('dialog', { name: /Approve and sign version 1/ });
    await expect(dialog.innerText()).resolves.toContain('Your password is your signature');
    await dialog.getByLabel('What you approve').fill(APPROVAL_STATEMENT);
    await dialog.getByLabel('Your password').fill('not-the-password');
    await dialog.getByRole('button', { name: 'Approve and sign' }).click();
    const password = dialog.getByLabel('Your password');
    await dialog.getByText('This is not your password.').waitFor();
    await expect(password.getAttribute('aria-invalid')).resolves.toBe('true');
    await expect(password.inputValue()).resolves.toBe('');
    await screenshot(page, 'record-approve-wrong-password');

    await password.fill(DEMO_PASSWORD);
    await dialog.getByRole('button', { name: 'Approve and sign' }).click();
    await statusBadge(page).filter({ hasText: 'Approved' }).waitFor();
    const trail = await page.getByRole('region', { name: 'Review trail' }).innerText();
    expect(trail).toContain('Approved and signed by Imogen Tasker');
    expect(trail).toContain(APPROVAL_STATEMENT);
    await expect(page.getByRole('link', { name: 'Download signed PDF' }).count()).resolves.toBe(1);
    await screenshot(page, 'record-approved-qa');
    // The refused signature answers 400 on purpose; nothing else may fail.
    expectNoProblems(problems, /^400 from .*\/approve$/);
  });

  it('lets QA return the second one with comments, which the analyst then reads on its record page', async () => {
    const qa = await openPage();
    await signIn(qa.page, 'qa');
    await openRecord(qa.page, created.returnedId ?? 0);
    await qa.page.getByRole('button', { name: 'Return with comments' }).click();
    const dialog = qa.page.getByRole('dialog', { name: /Return version 1/ });
    // Empty comments are refused by the shared schema before anything is sent.
    await dialog.getByRole('button', { name: 'Return with comments' }).click();
    await dialog.getByText('Tell the analyst what to change, in a few words.').waitFor();
    await dialog.getByLabel('Comments for the analyst').fill(RETURN_COMMENT);
    await dialog.getByRole('button', { name: 'Return with comments' }).click();
    await statusBadge(qa.page).filter({ hasText: 'Returned with comments' }).waitFor();
    await qa.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Review queue' }).click();
    await qa.page.getByText('Nothing is waiting for review.').waitFor();
    expectNoProblems(qa.problems);
    await qa.page.close();

    const analyst = await openPage();
    await signIn(analyst.page, 'analyst');
    await openRecord(analyst.page, created.returnedId ?? 0);
    await expect(
      analyst.page.getByRole('status').filter({ hasText: 'Returned by Imogen Tasker' }).innerText(),
    ).resolves.toContain(RETURN_COMMENT);
    await expect(analyst.page.getByRole('region', { name: 'Review trail' }).innerText()).resolves.toContain(
      `Returned with comments by Imogen Tasker`,
    );
    // Returned and still computed: the analyst may submit it again.
    await expect(analyst.page.getByRole('button', { name: 'Submit for review' }).count()).resolves.toBe(1);
    await screenshot(analyst.page, 'record-returned-analyst');
    expectNoProblems(analyst.problems);
  });

  it('lets the auditor find the approved record, verify its hash and download the signed PDF, with no write action anywhere', async () => {
    const { page, problems } = await openPage();
    await signIn(page, 'auditor');
    await mainNavigation(page).getByRole('link', { name: 'Approved records' }).click();
    await page.getByRole('heading', { level: 1, name: 'Approved records' }).waitFor();
    await page.getByLabel('Search title, analyte, analyst or material').fill('PBN-24117');
    await page.getByRole('button', { name: 'Search' }).click();
    await page.waitForURL(/\/records\?q=PBN-24117$/);
    const rows = page.getByRole('table', { name: /Approved records/ }).locator('tbody tr');
    await expect(rows.count()).resolves.toBe(1);
    const row = await rows.nth(0).innerText();
    expect(row).toContain('Imogen Tasker');
    expect(row).toContain(created.statement);
    await screenshot(page, 'approved-records-auditor');

    await rows.nth(0).getByRole('link', { name: APPROVED_TITLE, exact: true }).click();
    await page.getByRole('heading', { level: 1, name: APPROVED_TITLE }).waitFor();
    await page.getByRole('button', { name: 'Verify' }).click();
    await page
      .getByRole('status')
      .filter({ hasText: 'The stored snapshot is exactly the one that was approved.' })
      .waitFor();
    for (const name of [
      'Submit for review',
      'Withdraw from review',
      'Approve and sign',
      'Return with comments',
      'Start a new version',
    ]) {
      await expect(page.getByRole('button', { name }).count()).resolves.toBe(0);
    }
    // The record's own audit history, for the auditor.
    await expect(
      page.getByRole('region', { name: 'Audit history of this preparation' }).innerText(),
    ).resolves.toContain('preparation.approved');
    await screenshot(page, 'record-approved-auditor');
    await page.screenshot({ path: join(SCREENSHOT_DIR, 'record-approved-auditor-full.png'), fullPage: true });

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Download signed PDF' }).click(),
    ]);
    expect(download.suggestedFilename()).toBe(`dilutrace-${created.approvedId}-v1.pdf`);
    const file = join(work, 'record.pdf');
    await download.saveAs(file);
    expect(readFileSync(file).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // pdftotext (poppler-utils) without -layout: the statement may wrap, so compare with spaces collapsed.
    const text = execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text).toContain(created.statement?.replace(/\s+/g, ' '));
    expect(text).toContain('Imogen Tasker');
    expectNoProblems(problems);
  });

  it('shows the approval in the audit trail, which filters by action and exports the same filter as CSV', async () => {
    const { page, problems } = await openPage();
    await signIn(page, 'auditor');
    await mainNavigation(page).getByRole('link', { name: 'Audit trail' }).click();
    await page.getByRole('heading', { level: 1, name: 'Audit trail' }).waitFor();
    const table = page.getByRole('table', { name: 'Audit events, newest first' });
    await expect(table.innerText()).resolves.toContain('preparation.approved');
    await expect(table.innerText()).resolves.toContain('auth.sign_in');

    await page.getByLabel('Action').selectOption({ label: 'Preparations: approved' });
    await page.getByRole('button', { name: 'Apply filters' }).click();
    await page.waitForURL(/\/audit\?action=preparation\.approved$/);
    const actions = await table.locator('tbody tr code').allInnerTexts();
    expect(actions).toEqual(['preparation.approved']);
    await table.getByRole('button', { name: /Show change/ }).click();
    await expect(table.innerText()).resolves.toContain('"status": "approved"');
    await expect(page.getByRole('link', { name: 'Export CSV' }).getAttribute('href')).resolves.toMatch(
      /\/audit-events\.csv\?action=preparation\.approved$/,
    );
    await screenshot(page, 'audit-trail-approved');

    // A start date after the end date is refused on its field by the shared schema.
    await page.getByLabel('From').fill('2030-02-01');
    await page.getByLabel('To').fill('2030-01-01');
    await page.getByRole('button', { name: 'Apply filters' }).click();
    await page.getByText('The start date is after the end date.').waitFor();
    await expect(page.getByLabel('From').getAttribute('aria-invalid')).resolves.toBe('true');
    expectNoProblems(problems);
  });

  it('lets the analyst start a new version after the approval, which opens the planner and leaves version 1 as signed', async () => {
    const { page, problems } = await openPage();
    await signIn(page, 'analyst');
    await openRecord(page, created.approvedId ?? 0);
    await page.getByRole('button', { name: 'Start a new version' }).click();
    await page.waitForURL(new RegExp(`/preparations/${created.approvedId}$`));

    await openRecord(page, created.approvedId ?? 0);
    const versions = page.getByRole('navigation', { name: 'Versions' });
    await expect(versions.getByRole('link').allInnerTexts()).resolves.toEqual([
      'Version 2 · draft',
      'Version 1 · approved',
    ]);
    await expect(
      versions.getByRole('link', { name: 'Version 1 · approved' }).getAttribute('aria-current'),
    ).resolves.toBe('page');
    await expect(statusBadge(page).innerText()).resolves.toBe('Approved');
    // Only the latest version may start another.
    await expect(page.getByRole('button', { name: 'Start a new version' }).count()).resolves.toBe(0);
    await versions.getByRole('link', { name: 'Version 2 · draft' }).click();
    await statusBadge(page).filter({ hasText: 'Draft' }).waitFor();
    await screenshot(page, 'record-new-version');
    expectNoProblems(problems);
  });
});
