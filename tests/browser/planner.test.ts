import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { launchChromium, screenshot, watchForPageProblems } from './support/chromium';
import { startDilutraceServer, type RunningServer } from './support/dilutrace-server';

/** Demo password for this run only; the seed gives it to every demo user. */
const DEMO_PASSWORD = 'wellmere-planner-e2e-1';
const ANALYST = 'analyst@wellmere-water.example';

let server: RunningServer;
let browser: Awaited<ReturnType<typeof launchChromium>>;
let page: Page;
let problems: string[];
/** Ids of the lead standard and its variant, as the tests create them. */
const created: { lead?: number; variant?: number; route?: number } = {};

beforeAll(async () => {
  server = await startDilutraceServer(DEMO_PASSWORD);
  browser = await launchChromium();
  page = await browser.context.newPage();
  problems = watchForPageProblems(page);
  await page.goto(`${server.baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(ANALYST);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
}, 60_000);

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

/** Chooses the library item whose option starts with `code` (options read "GP-10-A (10 mL, class A, …)"). */
async function chooseItem(select: Locator, code: string) {
  const value = await select.evaluate((element, wanted) => {
    const option = [...(element as HTMLSelectElement).options].find((each) => each.text.startsWith(`${wanted} `));
    return option?.value ?? null;
  }, code);
  if (value === null) throw new Error(`No option ${code} in the select`);
  await select.selectOption(value);
}

const steps = () => page.locator('section[aria-labelledby="plan-heading"] ol > li');
const statement = () => page.getByTestId('result-statement');
const saveState = () => page.getByTestId('save-state');

async function addStep(kindLabel: string) {
  await page.getByLabel('Next step').selectOption({ label: kindLabel });
  await page.getByRole('button', { name: 'Add step' }).click();
}

describe('the analyst plans a lead standard', () => {
  it('builds the two-step plan from the library and sees the live budget', async () => {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Preparations' }).click();
    await page.getByRole('heading', { level: 1, name: 'Preparations' }).waitFor();
    await page.getByRole('link', { name: 'New preparation' }).click();
    await page.getByRole('heading', { level: 1, name: 'New preparation' }).waitFor();

    await page.getByLabel('Title').fill('Pb 100 mg/L working standard');
    await chooseItem(page.getByLabel('Reference material'), 'RM-PBN-01');
    await expect(page.getByLabel('Analyte').inputValue()).resolves.toBe('Pb');
    await expect(page.getByText('Hazards of RM-PBN-01').isVisible()).resolves.toBe(true);

    // Step 1 weighs on BAL-05, step 2 makes up in VF-100-A (both steps come with the material).
    await chooseItem(steps().nth(0).getByLabel('Balance'), 'BAL-05');
    await steps().nth(0).getByLabel('Net mass (g)').fill('0.1599');
    await chooseItem(steps().nth(1).getByLabel('Volumetric flask'), 'VF-100-A');
    await expect(statement().innerText()).resolves.toContain('mg/L');
    const stockStatement = await statement().innerText();
    expect(stockStatement).toMatch(/c\(Pb\) = \(999\.\d+ ± /);

    // Then a 10 mL aliquot with GP-10-A into VF-100-B.
    await addStep('Pipette an aliquot');
    await chooseItem(steps().nth(2).getByLabel('Pipette'), 'GP-10-A');
    await expect(steps().nth(2).getByLabel('Volume (mL)').inputValue()).resolves.toBe('10');
    await addStep('Make up to volume');
    await chooseItem(steps().nth(3).getByLabel('Volumetric flask'), 'VF-100-B');

    // 0.1599 g · 0.9998 · 207.04/331.2 (the CIAAW 2021 interval midpoint for Pb) / 0.1 L / 10 ≈ 99.98 mg/L, times the
    // default policy's air-buoyancy factor for lead nitrate (1 − 1.2/8000)/(1 − 1.2/4530) = 1.000115 (OIML R 111) ≈ 99.99.
    await expect(statement().innerText()).resolves.toMatch(
      /^c\(Pb\) = \(99\.99 ± 0\.\d\d\) mg\/L at 20 °C, k = 2\.00, coverage probability ≈ 95\.45 %$/,
    );
    await expect(steps().nth(1).innerText()).resolves.toMatch(/after step 2\s+999\.9 mg\/L/i);
    const table = page.getByRole('table', { name: /Uncertainty budget of c\(Pb\)/ });
    await expect(
      table.getByRole('rowheader', { name: /^Step 3 · Pipette an aliquot \(GP-10-A\)$/ }).count(),
    ).resolves.toBe(1);
    await expect(table.getByText('Atomic weight of Pb').count()).resolves.toBe(1);

    await saveState().filter({ hasText: /Saved/ }).waitFor({ timeout: 15_000 });
    expect(new URL(page.url()).pathname).toMatch(/^\/preparations\/\d+$/);
    created.lead = Number(new URL(page.url()).pathname.split('/')[2]);
    await screenshot(page, 'planner-lead-standard');
  });

  it('flags an invalid mass on its field and keeps the last valid budget greyed', async () => {
    const mass = steps().nth(0).getByLabel('Net mass (g)');
    await mass.fill('0,1599x');
    await expect(mass.getAttribute('aria-invalid')).resolves.toBe('true');
    await page.getByText('Last valid result, shown until the marked field is fixed.').waitFor();
    await screenshot(page, 'planner-invalid-mass');
    await mass.fill('0.1599');
    await expect(mass.getAttribute('aria-invalid')).resolves.toBeNull();
  });

  it('runs Monte Carlo in a worker while the title stays responsive, and states the verdict', async () => {
    await page.getByRole('button', { name: 'Run Monte Carlo' }).click();
    await page.getByRole('button', { name: 'Cancel Monte Carlo' }).waitFor();
    // Input latency while the Monte Carlo verdict run goes on: keydown to the next painted frame, per key.
    await page.evaluate(() => {
      const latencies: number[] = [];
      (window as unknown as { latencies: number[] }).latencies = latencies;
      document.addEventListener('keydown', (event) => {
        const start = event.timeStamp;
        requestAnimationFrame(() => setTimeout(() => latencies.push(performance.now() - start), 0));
      });
    });
    await page.getByLabel('Title').press('End');
    await page.getByLabel('Title').pressSequentially(' (lot PBN-24117)', { delay: 15 });
    const latencies = await page.evaluate(() => (window as unknown as { latencies: number[] }).latencies);
    const worst = Math.max(...latencies);
    console.log(
      `Input latency during the Monte Carlo run: ${latencies.length} keys, median ${latencies.sort((a, b) => a - b)[latencies.length >> 1].toFixed(1)} ms, worst ${worst.toFixed(1)} ms`,
    );
    expect(worst).toBeLessThan(200);

    const verdict = page.getByTestId('validation-verdict');
    await verdict.waitFor({ timeout: 60_000 });
    // The record's words (shared/contracts/validation-words.ts), after the adaptive verdict run.
    await expect(verdict.innerText()).resolves.toMatch(
      /^GUM result (confirmed|not confirmed|not decided)\s+(Confirmed|Not confirmed|Not decided): /,
    );
    await page
      .getByText(/trials in \d+ batches/)
      .first()
      .waitFor();
    // Both Monte Carlo intervals carry the unit, as the record page states them.
    for (const term of [/^Symmetric 95\.45 % interval$/, /^Shortest interval$/]) {
      const interval = page.locator('dt', { hasText: term }).locator('xpath=following-sibling::dd');
      await expect(interval.innerText()).resolves.toMatch(/^\[\d+\.\d+, \d+\.\d+\] mg\/L$/);
    }
    await saveState()
      .filter({ hasText: /Saved at/ })
      .waitFor({ timeout: 15_000 });
    await page.getByRole('heading', { name: 'Monte Carlo check' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'planner-monte-carlo');
  });

  it('reopens exactly after a reload', async () => {
    const before = await statement().innerText();
    const seed = await page.getByLabel('Seed').inputValue();
    await page.reload();
    await statement().waitFor();
    await expect(statement().innerText()).resolves.toBe(before);
    await expect(page.getByLabel('Title').inputValue()).resolves.toBe('Pb 100 mg/L working standard (lot PBN-24117)');
    await expect(steps().count()).resolves.toBe(4);
    await expect(steps().nth(0).getByLabel('Net mass (g)').inputValue()).resolves.toBe('0.1599');
    await expect(page.getByLabel('Seed').inputValue()).resolves.toBe(seed);
    await expect(saveState().innerText()).resolves.toContain('Saved');
    expect(problems).toEqual([]);
  });

  it('duplicates the plan into a variant with one more dilution and compares the two', async () => {
    await page.getByRole('button', { name: 'Duplicate as a variant' }).click();
    await page.getByRole('link', { name: 'Compare with the original' }).waitFor();
    created.variant = Number(new URL(page.url()).pathname.split('/')[2]);
    expect(created.variant).not.toBe(created.lead);
    await page.getByLabel('Title').fill('Pb 10 mg/L via 25 mL into 250 mL, then 10 mL into 100 mL');
    await chooseItem(steps().nth(2).getByLabel('Pipette'), 'GP-25-A');
    await chooseItem(steps().nth(3).getByLabel('Volumetric flask'), 'VF-250-A');
    await addStep('Pipette an aliquot');
    await chooseItem(steps().nth(4).getByLabel('Pipette'), 'GP-10-A');
    await addStep('Make up to volume');
    await chooseItem(steps().nth(5).getByLabel('Volumetric flask'), 'VF-100-B');
    // One tenth of the 99.99 mg/L above (air buoyancy corrected by the default policy): 9.999 mg/L.
    await expect(statement().innerText()).resolves.toMatch(/^c\(Pb\) = \(9\.999 ± 0\.0\d+\) mg\/L/);
    await saveState()
      .filter({ hasText: /Saved at/ })
      .waitFor({ timeout: 15_000 });

    await page.getByRole('link', { name: 'Compare with the original' }).click();
    await page.getByRole('heading', { level: 1, name: 'Compare preparations' }).waitFor();
    const answer = page.getByTestId('dilution-answer');
    await expect(answer.innerText()).resolves.toMatch(
      /uses 1 more dilution step than “Pb 100 mg\/L working standard \(lot PBN-24117\)” \(2 against 1\); relative U \d\.\d+ % against \d\.\d+ %: the extra step (raises|lowers|does not change) the total uncertainty\./,
    );
    const table = page.getByRole('table', { name: 'The preparations compared' });
    await expect(table.getByRole('row', { name: /^Material consumed/ }).innerText()).resolves.toMatch(
      /0\.1599 g of RM-PBN-01\s+0\.1599 g of RM-PBN-01/,
    );
    // The dominant step is named as the record page and the PDF name budget groups (the step-kind registry).
    await expect(table.getByRole('row', { name: /^Dominant step/ }).innerText()).resolves.toMatch(
      /Step \d · (Weigh the solid|Make up to volume|Pipette an aliquot) \([A-Z0-9-]+\): \d+ %/,
    );
    // Waste: the original throws away 90 mL of stock; the variant 75 mL of stock and 240 mL of the intermediate.
    await expect(table.getByRole('row', { name: /^Waste/ }).innerText()).resolves.toMatch(/90 mL\s+315 mL/);
    await screenshot(page, 'planner-compare');
    expect(problems).toEqual([]);
  });

  it('finds the routes to 10 µg/L Se from the 1000 mg/L standard and plans the best one', async () => {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Route finder' }).click();
    await page.getByRole('heading', { level: 1, name: 'Route finder' }).waitFor();
    const form = page.getByRole('form', { name: 'Find routes' });
    await form.getByLabel('Target concentration').fill('10');
    await form.getByLabel('Unit').selectOption('µg/L');
    await chooseItem(form.getByLabel('Reference material'), 'RM-SE-1000');
    await expect(form.getByLabel('Analyte').inputValue()).resolves.toBe('Se');
    await form.getByRole('button', { name: 'Find routes' }).click();
    const table = page.getByRole('table', { name: 'Routes to the target, best first' });
    await table.waitFor({ timeout: 30_000 });
    const rows = table.locator('tbody tr');
    expect(await rows.count()).toBeGreaterThan(1);
    // Ranked by relative expanded uncertainty, smallest first.
    const shares = await rows.evaluateAll((each) =>
      each.map((row) => Number.parseFloat(row.children[1].textContent ?? '')),
    );
    expect([...shares].sort((a, b) => a - b)).toEqual(shares);
    await screenshot(page, 'route-finder');

    await page.getByRole('button', { name: 'Plan route 1', exact: true }).click();
    await page.getByRole('heading', { level: 1, name: /^Se 10 µg\/L, route 1/ }).waitFor({ timeout: 15_000 });
    await expect(statement().innerText()).resolves.toMatch(/^c\(Se\) = \((9\.9\d*|10\.0\d*) ± 0\.\d+\) µg\/L/);
    await expect(page.getByText('Hazards of RM-SE-1000').isVisible()).resolves.toBe(true);
    created.route = Number(new URL(page.url()).pathname.split('/')[2]);
    await screenshot(page, 'route-finder-planned');
    expect(problems).toEqual([]);
  });

  it('shows the route finder’s sentence when its search stopped early', async () => {
    const note = 'The search stopped after 2 000 000 candidate routes, so a better route may exist.';
    // The demo library is small enough for a complete search, so the server's answer is marked as stopped here.
    await page.route('**/route-finder', async (route) => {
      const response = await route.fetch();
      await route.fulfill({ response, json: { ...(await response.json()), stoppedEarly: true, searchNote: note } });
    });
    try {
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Route finder' }).click();
      const form = page.getByRole('form', { name: 'Find routes' });
      await form.getByLabel('Target concentration').fill('10');
      await form.getByLabel('Unit').selectOption('µg/L');
      await chooseItem(form.getByLabel('Reference material'), 'RM-SE-1000');
      await form.getByRole('button', { name: 'Find routes' }).click();
      const status = page.getByRole('status').filter({ hasText: 'Search stopped early' });
      await status.waitFor({ timeout: 30_000 });
      await expect(status.innerText()).resolves.toContain(note);
    } finally {
      await page.unroute('**/route-finder');
    }
    expect(problems).toEqual([]);
  });

  it('prints a bench sheet with targets to the balance readability, the hazards and blanks for the readings', async () => {
    await page.goto(`${server.baseUrl}/preparations/${created.lead}`);
    await statement().waitFor();
    await page.getByRole('link', { name: 'Bench sheet' }).click();
    const sheet = page.getByRole('article');
    await sheet.getByText('Bench sheet', { exact: true }).waitFor();
    await expect(sheet.innerText()).resolves.toContain(
      'Weigh 0.15990 g of Lead(II) nitrate, certified reference material — RM-PBN-01 — by difference on BAL-05.',
    );
    await expect(sheet.innerText()).resolves.toContain(
      'Pipette 10 mL from the solution of step 2 with the one-mark pipette GP-10-A, class A.',
    );
    await expect(sheet.getByText(/Follow the safety data sheet/).count()).resolves.toBe(1);
    await expect(
      sheet.getByRole('table', { name: 'Readings for step 1' }).getByRole('columnheader').allInnerTexts(),
    ).resolves.toEqual(['Tare (g)', 'Gross (g)', 'Net (g)', 'Time', 'Initials']);
    await page.emulateMedia({ media: 'print' });
    await expect(page.getByRole('navigation', { name: 'Main' }).isVisible()).resolves.toBe(false);
    await screenshot(page, 'bench-sheet-print');
    await page.emulateMedia({ media: 'screen' });
    expect(problems).toEqual([]);
  });

  it('takes a piston-pipette volume in µL and bottles a stock before its flask is reused', async () => {
    // The variant: 0.1599 g → VF-100-A, 25 mL (GP-25-A) → VF-250-A, then 1000 µL with PP-1000 back into VF-250-A.
    await page.goto(`${server.baseUrl}/preparations/${created.variant}`);
    await statement().waitFor();
    await chooseItem(steps().nth(4).getByLabel('Pipette'), 'PP-1000');
    const volume = steps().nth(4).getByLabel('Volume (µL)');
    await volume.fill('1000');
    await chooseItem(steps().nth(5).getByLabel('Volumetric flask'), 'VF-250-A');
    // VF-250-A still holds the solution of step 4, which step 5 pipettes from: refused at that flask.
    const flask = steps().nth(5).getByLabel('Volumetric flask');
    await expect(flask.getAttribute('aria-invalid')).resolves.toBe('true');
    await steps()
      .nth(5)
      .getByText(/^Flask VF-250-A still holds the solution made up in it at step 4/)
      .waitFor();
    await steps()
      .nth(5)
      .getByLabel(/^Before this step, the solution made in VF-250-A at step 4 is poured into a labelled storage bottle/)
      .check();
    await expect(flask.getAttribute('aria-invalid')).resolves.toBeNull();
    // 999.92 mg/L (buoyancy-corrected stock) · 25/250 · 1/250 = 0.39997 mg/L (the 1000 µL stored as 1 mL); a 1000 µL
    // read as 1000 mL would give 400 mg/L.
    await expect(statement().innerText()).resolves.toMatch(/^c\(Pb\) = \(0\.4000 ± 0\.\d+\) mg\/L at 20 °C/);
    await saveState()
      .filter({ hasText: /Saved at/ })
      .waitFor({ timeout: 15_000 });
    await page.reload();
    await statement().waitFor();
    await expect(steps().nth(4).getByLabel('Volume (µL)').inputValue()).resolves.toBe('1000');

    await page.getByRole('link', { name: 'Bench sheet' }).click();
    const sheet = page.getByRole('article');
    await sheet.getByText('Bench sheet', { exact: true }).waitFor();
    const text = await sheet.innerText();
    expect(text).toContain(
      'First transfer the solution of step 4 from VF-250-A into a labelled storage bottle, and rinse VF-250-A; take this aliquot from that bottle.',
    );
    expect(text).toContain(
      'Set the piston pipette PP-1000 to 1000 µL and deliver the aliquot from the solution of step 4.',
    );
    expect(text.indexOf('First transfer')).toBeLessThan(text.indexOf('Set the piston pipette'));
    await screenshot(page, 'bench-sheet-flask-reused');
    expect(problems).toEqual([]);
  });
});
