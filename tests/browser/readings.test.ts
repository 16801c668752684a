import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { toEngineEquipment } from '../../shared/contracts/engine-equipment';
import type { EquipmentItem } from '../../shared/contracts/library';
import { launchChromium, screenshot, watchForPageProblems } from './support/chromium';
import { startDilutraceServer, type RunningServer } from './support/dilutrace-server';

/** Demo password for this run only; the seed gives it to every demo user. */
const DEMO_PASSWORD = 'wellmere-e2e-readings-password';
const ANALYST = { email: 'analyst@wellmere-water.example', name: 'Dev Okonjo' };
const TITLE = 'Pb 100 mg/L intermediate, readings at the bench';
const DEVIATION = 'Balance BAL-05 re-levelled before the weighing; 0.3 mg more salt than planned.';
// What BAL-05 showed: the weighing boat, then boat and lead nitrate. Net 0.16020 g against 0.15990 g planned.
const TARE = '12.18577';
const GROSS = '12.34597';

let server: RunningServer;
let browser: Awaited<ReturnType<typeof launchChromium>>;
let page: Page;
let problems: string[];
const created: { id?: number; plannedValue?: number } = {};

beforeAll(async () => {
  server = await startDilutraceServer(DEMO_PASSWORD);
  browser = await launchChromium();
  page = await browser.context.newPage();
  problems = watchForPageProblems(page);
  await page.goto(`${server.baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(ANALYST.email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
}, 60_000);

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

/** The value in "c(Pb) = (99.98 ± 0.36) mg/L, …". */
const valueOf = (statement: string) => Number(/= \(([\d.]+) ±/.exec(statement)?.[1]);

/** The demo lead plan (server/test-support/demo-plans.ts): 0.1599 g of lead nitrate to 100 mL, then 10 mL to 100 mL. */
async function createLeadPreparation(): Promise<{ id: number; statement: string }> {
  const me = (await (await page.request.get(`${server.baseUrl}/api/auth/me`)).json()) as {
    activeLabId: number;
    csrfToken: string;
  };
  const items = (await (
    await page.request.get(`${server.baseUrl}/api/labs/${me.activeLabId}/equipment?status=all`)
  ).json()) as EquipmentItem[];
  const use = (code: string) => {
    const item = items.find((each) => each.code === code);
    if (!item) throw new Error(`The demo library has no ${code}`);
    return toEngineEquipment(item);
  };
  const plan = {
    formatVersion: 1,
    title: TITLE,
    analyte: { formula: 'Pb' },
    settings: { outputUnit: 'mg/L', labTemperatureC: 20 },
    steps: [
      { kind: 'weighSolid', material: use('RM-PBN-01'), balance: use('BAL-05'), netMassG: 0.1599 },
      { kind: 'makeUpToVolume', flask: use('VF-100-A') },
      { kind: 'pipetteAliquot', pipette: use('GP-10-A'), volumeMl: 10 },
      { kind: 'makeUpToVolume', flask: use('VF-100-B') },
    ],
  };
  const response = await page.request.post(`${server.baseUrl}/api/labs/${me.activeLabId}/preparations`, {
    headers: { 'X-CSRF-Token': me.csrfToken },
    data: { title: TITLE, plan, seed: 4242 },
  });
  expect(response.status()).toBe(201);
  const detail = (await response.json()) as { id: number; current: { resultStatement: string | null } };
  return { id: detail.id, statement: detail.current.resultStatement ?? '' };
}

const form = () => page.getByRole('form', { name: /the readings$/ });

describe('the analyst records what was weighed at the bench', () => {
  it('enters tare and gross on the bench sheet, sees the net filled in, and gets a field error for a net that does not add up', async () => {
    const { id, statement } = await createLeadPreparation();
    created.id = id;
    created.plannedValue = valueOf(statement);
    expect(created.plannedValue).toBeGreaterThan(99.9);

    await page.goto(`${server.baseUrl}/preparations/${id}/bench-sheet`);
    await page.getByRole('heading', { level: 2, name: 'Record the readings' }).waitFor();
    // Only the weighing step takes a reading; the flasks and the pipette do not.
    await expect(form().getByRole('row').count()).resolves.toBe(2);
    await expect(
      form()
        .getByRole('row', { name: /Step 1/ })
        .innerText(),
    ).resolves.toMatch(/On BAL-05: Lead\(II\) nitrate.*\s+0\.15990/);

    await form().getByLabel('Step 1 tare (g)').fill(TARE);
    await form().getByLabel('Step 1 gross (g)').fill(GROSS);
    // 12.34597 − 12.18577, to the five decimals the balance showed (no 0.16019999… from binary arithmetic).
    await expect(form().getByLabel('Step 1 net weighed (g)').inputValue()).resolves.toBe('0.16020');

    // A net typed over the computed one that gross − tare does not give: the server refuses it on that field.
    await form().getByLabel('Step 1 net weighed (g)').fill('0.1700');
    await form().getByRole('button', { name: 'Record the readings' }).click();
    const net = form().getByLabel('Step 1 net weighed (g)');
    await expect.poll(() => net.getAttribute('aria-invalid')).toBe('true');
    const errorId = (await net.getAttribute('aria-describedby'))?.split(' ')[0] ?? '';
    await expect(page.locator(`[id="${errorId}"]`).innerText()).resolves.toMatch(
      /^Gross − tare is 0\.1602 g, not 0\.17 g\.$/,
    );
    await expect.poll(() => net.evaluate((element) => element === document.activeElement)).toBe(true);
    await screenshot(page, 'readings-error');

    // Retyping the gross fills the net again and clears the error.
    await form().getByLabel('Step 1 gross (g)').fill('');
    await form().getByLabel('Step 1 gross (g)').fill(GROSS);
    await expect(net.inputValue()).resolves.toBe('0.16020');
    await expect(net.getAttribute('aria-invalid')).resolves.toBeNull();
    await form().getByLabel('Deviations from the plan').fill(DEVIATION);
    await page.getByRole('heading', { level: 2, name: 'Record the readings' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-form');
  });

  it('records the readings: the version is prepared and the result is recomputed on the mass weighed', async () => {
    await form().getByRole('button', { name: 'Record the readings' }).click();
    const confirmation = page.getByRole('status').filter({ hasText: 'Readings recorded: version 1 is prepared' });
    await confirmation.waitFor();
    await expect
      .poll(() => confirmation.evaluate((element) => element.parentElement === document.activeElement))
      .toBe(true);
    const recomputed = valueOf(await confirmation.innerText());
    // c ∝ m: 0.16020 / 0.15990 of the planned value, to the 0.01 mg/L the statement shows.
    expect(Math.abs(recomputed - (created.plannedValue ?? 0) * (0.1602 / 0.1599))).toBeLessThanOrEqual(0.0051);
    // Now it can be corrected, pre-filled with what was recorded.
    await page.getByRole('heading', { level: 2, name: 'Correct the readings' }).waitFor();
    await expect(form().getByLabel('Step 1 tare (g)').inputValue()).resolves.toBe(TARE);
    await expect(form().getByLabel('Step 1 net weighed (g)').inputValue()).resolves.toBe('0.16020');
    await expect(form().getByLabel('Deviations from the plan').inputValue()).resolves.toBe(DEVIATION);
    await expect(form().innerText()).resolves.toContain(`Recorded by ${ANALYST.name}`);
    // The printed sheet still gives the planned mass.
    await expect(page.getByRole('article').innerText()).resolves.toContain('Weigh 0.15990 g of Lead(II) nitrate');
    await screenshot(page, 'readings-recorded');
    // The form is for the screen only.
    await page.emulateMedia({ media: 'print' });
    await expect(page.getByRole('heading', { level: 2, name: 'Correct the readings' }).isVisible()).resolves.toBe(
      false,
    );
    await page.emulateMedia({ media: 'screen' });
    expect(problems.filter((problem) => !/^400 from .*\/readings$/.test(problem))).toEqual([]);
  });

  it('shows the planned and actual masses with the deviation on the record page', async () => {
    await page.getByRole('link', { name: 'Open the record to check it and submit it for review' }).click();
    await page.getByText('Preparation record', { exact: true }).waitFor();
    await expect(page.getByTestId('record-status').innerText()).resolves.toBe('Prepared (readings recorded)');
    const statement = await page.getByTestId('record-result-statement').innerText();
    expect(valueOf(statement)).toBeGreaterThan(created.plannedValue ?? Infinity);

    const table = page.getByRole('table', { name: 'Masses weighed beside the planned masses' });
    await expect(table.getByRole('columnheader').allInnerTexts()).resolves.toEqual([
      'Step',
      'Planned (g)',
      'Weighed (g)',
      'Difference (mg)',
      'Difference (%)',
      'Tare (g)',
      'Gross (g)',
    ]);
    const cells = await table.locator('tbody tr').first().locator('td').allInnerTexts();
    // +0.30 mg on BAL-05 (0.01 mg readability); 0.30 / 159.90 = +0.19 %.
    expect(cells.slice(1)).toEqual(['0.15990', '0.16020', '+0.30', '+0.19', TARE, GROSS]);
    expect(cells[0]).toMatch(/^Step 1 · Weigh the solid \(BAL-05\)\s+net mass$/);
    await expect(page.getByTestId('deviations').innerText()).resolves.toBe(`Deviations from the plan: ${DEVIATION}`);
    await expect(page.getByRole('region', { name: 'Planned and actual' }).innerText()).resolves.toContain(
      `Readings recorded by ${ANALYST.name}`,
    );
    await page.getByRole('heading', { name: 'Planned and actual' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-record');
  });

  it('explains the prepared state in the workspace, without a new version, and lists it under its status', async () => {
    await page.goto(`${server.baseUrl}/preparations/${created.id}`);
    await page.getByText('Version 1 has been prepared').waitFor();
    await expect(page.getByRole('button', { name: 'Start a new version' }).count()).resolves.toBe(0);
    await expect(
      page.getByRole('link', { name: 'Correct the readings on the bench sheet' }).getAttribute('href'),
    ).resolves.toBe(`/preparations/${created.id}/bench-sheet`);
    await expect(
      page.getByRole('link', { name: 'Submit it for review from the record page' }).getAttribute('href'),
    ).resolves.toBe(`/records/${created.id}/v/1`);
    await expect(page.getByRole('table', { name: 'Masses weighed beside the planned masses' }).count()).resolves.toBe(
      1,
    );
    await screenshot(page, 'readings-workspace');
    await page.getByRole('heading', { name: 'Planned and actual' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-workspace-table');

    await page.goto(`${server.baseUrl}/preparations`);
    await page.getByLabel('Status').selectOption({ label: 'Prepared (readings recorded)' });
    await page.waitForURL(/status=prepared/);
    const row = page.getByRole('row', { name: new RegExp(TITLE.replace(/[()]/g, '\\$&')) });
    await expect(row.innerText()).resolves.toContain('Prepared (readings recorded)');
  });

  it('submits the prepared version for review', async () => {
    await page.goto(`${server.baseUrl}/records/${created.id}/v/1`);
    await page.getByText('Preparation record', { exact: true }).waitFor();
    await page.getByRole('button', { name: 'Submit for review' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Submit for review' }).click();
    await page.getByTestId('record-status').filter({ hasText: 'Waiting for review' }).waitFor();
    // Submitted: the readings are part of the record and can no longer be corrected on the bench sheet.
    await page.goto(`${server.baseUrl}/preparations/${created.id}/bench-sheet`);
    await page.getByRole('article').getByText('Bench sheet', { exact: true }).waitFor();
    await expect(page.getByRole('heading', { name: /the readings$/ }).count()).resolves.toBe(0);
    expect(problems.filter((problem) => !/^400 from .*\/readings$/.test(problem))).toEqual([]);
  });
});
