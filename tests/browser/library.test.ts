import { SAFETY_ADVICE } from '../../shared/contracts/safety-advice';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { launchChromium, openCleanPage, screenshot } from './support/chromium';
import { startDilutraceServer, type RunningServer } from './support/dilutrace-server';

/** Demo password for this run only; the seed gives it to every demo user. */
const DEMO_PASSWORD = 'wellmere-e2e-library-password';
const DEMO_DOMAIN = 'wellmere-water.example';
/** A code the demo library does not use (it holds VF-10-A … VF-1000-A and three class B flasks). */
const NEW_FLASK = 'VF-50-QA';
const REVISION_REASON = 'Fill check repeated on the new bench';

let server: RunningServer;
let browser: Awaited<ReturnType<typeof launchChromium>>;
let context: BrowserContext;

beforeAll(async () => {
  server = await startDilutraceServer(DEMO_PASSWORD);
  browser = await launchChromium();
  context = browser.context;
}, 60_000);

afterEach(async () => {
  await Promise.all(context.pages().map((page) => page.close()));
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const openPage = () => openCleanPage(context);

async function signIn(page: Page, local: string) {
  await page.goto(`${server.baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(`${local}@${DEMO_DOMAIN}`);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { level: 1, name: /^Welcome, / }).waitFor();
}

async function openLibraryTab(page: Page, tab: string) {
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Library' }).click();
  await page.getByRole('heading', { level: 1, name: 'Tolerance library' }).waitFor();
  await page.getByRole('navigation', { name: 'Kinds of item' }).getByRole('link', { name: tab }).click();
  await page.locator(`nav[aria-label="Kinds of item"] a[aria-current="page"]`, { hasText: tab }).waitFor();
}

/** The smallest file the server's content sniffing accepts as a PDF: a header, one empty page, a trailer. */
function minimalPdf(): Buffer {
  const body = [
    '%PDF-1.4',
    '1 0 obj << /Type /Catalog /Pages 2 0 R >> endobj',
    '2 0 obj << /Type /Pages /Kids [3 0 R] /Count 1 >> endobj',
    '3 0 obj << /Type /Page /Parent 2 0 R /MediaBox [0 0 200 200] >> endobj',
    'trailer << /Root 1 0 R >>',
    '%%EOF',
  ].join('\n');
  return Buffer.from(body, 'latin1');
}

/** Text of each row of the first table under the named region. */
async function rowTexts(page: Page, sectionHeading: string): Promise<string[]> {
  const section = page.locator('section', { has: page.getByRole('heading', { name: sectionHeading }) });
  return section.locator('tbody tr').allInnerTexts();
}

describe('the tolerance library, kept by QA', () => {
  it('adds a class A flask from the ISO 1042 template, revises it with a reason, and stores a certificate', async () => {
    const { page, problems } = await openPage();
    await signIn(page, 'qa');
    await openLibraryTab(page, 'Flasks');
    await expect(page.getByRole('link', { name: 'VF-100-A', exact: true }).count()).resolves.toBe(1);
    await screenshot(page, 'library-flasks-qa');

    await page.getByRole('link', { name: 'Add volumetric flask' }).click();
    await page.getByRole('heading', { level: 1, name: 'Add a volumetric flask' }).waitFor();
    // ISO 1042:1998 class A, 50 mL: ± 0.06 mL (the shared template table; read from a national verification table identical to it).
    await page.getByLabel('Template').selectOption({ label: 'ISO 1042 class A, 50 mL (± 0.06 mL)' });
    await expect(page.getByLabel('Tolerance (±)').inputValue()).resolves.toBe('0.06');
    await expect(page.getByLabel('Nominal volume').inputValue()).resolves.toBe('50');
    await expect(page.getByLabel('Class', { exact: true }).inputValue()).resolves.toBe('A');
    await page.getByLabel('ID', { exact: true }).fill(NEW_FLASK);
    await page.getByLabel('Description').fill('50 mL one-mark flask, class A, QA bench');
    // A decimal comma is accepted as typed by a European chemist.
    await page.getByLabel('Fill repeatability s').fill('0,012');
    await screenshot(page, 'library-add-flask');
    await page.getByRole('button', { name: 'Add to library' }).click();

    await page.getByRole('heading', { level: 1, name: NEW_FLASK }).waitFor();
    await page.getByRole('heading', { name: 'Current data · revision 1' }).waitFor();
    await expect(page.getByText('0.012 mL', { exact: true }).count()).resolves.toBe(1);

    await page.getByRole('link', { name: 'Edit', exact: true }).click();
    await page.getByRole('heading', { level: 1, name: `Edit ${NEW_FLASK}` }).waitFor();
    await page.getByLabel('Fill repeatability s').fill('0.010');
    await page.getByRole('button', { name: 'Save new revision' }).click();
    // No reason yet: the form says so on the field and saves nothing.
    const reason = page.getByLabel('Reason for this revision');
    await expect(reason.getAttribute('aria-invalid')).resolves.toBe('true');
    await reason.fill(REVISION_REASON);
    await page.getByRole('button', { name: 'Save new revision' }).click();

    await page.getByRole('heading', { name: 'Current data · revision 2' }).waitFor();
    const history = await rowTexts(page, 'Revision history');
    expect(history).toHaveLength(2);
    expect(history[0]).toContain('Revision 2 (current)');
    expect(history[0]).toContain(REVISION_REASON);
    expect(history[1]).toContain('Revision 1');
    expect(history[1]).toContain('First entry');

    await page.getByRole('link', { name: 'Revision 2 (current)' }).click();
    const changes = page.locator('h3', { hasText: 'Changed from revision 1' }).locator('..');
    await changes.waitFor();
    await expect(changes.innerText()).resolves.toMatch(/Fill repeatability s:.*0\.012 mL.*0\.01 mL/s);

    await page
      .getByLabel('Upload a certificate to revision 2')
      .setInputFiles({ name: 'vf-50-qa-certificate.pdf', mimeType: 'application/pdf', buffer: minimalPdf() });
    await page.getByRole('button', { name: 'Upload', exact: true }).click();
    const download = page.getByRole('link', { name: 'vf-50-qa-certificate.pdf' });
    await download.waitFor();
    await expect(page.getByText(/Revision 2 · 1 kB/).count()).resolves.toBe(1);
    const href = await download.getAttribute('href');
    const stored = await page.evaluate(async (url) => (await (await fetch(url!)).text()).slice(0, 8), href);
    expect(stored).toBe('%PDF-1.4');
    await screenshot(page, 'library-item-revised');
    expect(problems).toEqual([]);
  });

  it('shows a balance with its USP <41> minimum weight and a material with its hazard caution', async () => {
    const { page, problems } = await openPage();
    await signIn(page, 'qa');
    await openLibraryTab(page, 'Balances');
    // BAL-05: s = 0.015 mg, d = 0.01 mg, so m_min = 2000 · max(s, 0.41·d) = 0.0300 g, printed to three significant figures as the warnings print it (demo data, USP <41> Weights and Balances rule, read).
    const row = page.locator('tbody tr', { has: page.getByRole('link', { name: 'BAL-05' }) });
    await expect(row.innerText()).resolves.toContain('0.03');
    await screenshot(page, 'library-balances');
    await page.getByRole('link', { name: 'BAL-05' }).click();
    await page.getByRole('heading', { name: /Minimum weight: 0\.0300 g/ }).waitFor();
    await screenshot(page, 'library-item-balance');

    await openLibraryTab(page, 'Solid materials');
    await expect(page.locator('tbody tr', { hasText: 'RM-PBN-01' }).getByText('Hazard').count()).resolves.toBe(1);
    await screenshot(page, 'library-solid-materials');
    await page.getByRole('link', { name: 'RM-PBN-01' }).click();
    await page.getByRole('heading', { name: 'Caution: hazardous material' }).waitFor();
    await page.getByText(SAFETY_ADVICE).waitFor();
    await screenshot(page, 'library-item-material');
    expect(problems).toEqual([]);
  });

  it('retires an item after asking why, and lists it under retired only', async () => {
    const { page, problems } = await openPage();
    await signIn(page, 'qa');
    await openLibraryTab(page, 'Flasks');
    await page.getByRole('link', { name: 'VF-250-B' }).click();
    await page.getByRole('button', { name: 'Retire' }).click();
    const dialog = page.getByRole('dialog', { name: 'Retire VF-250-B?' });
    await dialog.getByLabel('Reason for retiring').fill('Chipped rim');
    await screenshot(page, 'library-retire-confirm');
    await dialog.getByRole('button', { name: 'Retire VF-250-B' }).click();
    await page.getByText('Retired: Chipped rim').waitFor();
    await expect(page.getByRole('link', { name: 'Edit', exact: true }).count()).resolves.toBe(0);

    await openLibraryTab(page, 'Flasks');
    await expect(page.getByRole('link', { name: 'VF-250-B' }).count()).resolves.toBe(0);
    await page.getByLabel('Show').selectOption('retired');
    await page.getByRole('link', { name: 'VF-250-B' }).waitFor();
    await expect(page.locator('tbody tr').count()).resolves.toBe(1);
    expect(problems).toEqual([]);
  });

  it('gives each kind its own form: piston points from ISO 8655-2, purity as U and k or a half-width, errors on the fields', async () => {
    const { page, problems } = await openPage();
    await signIn(page, 'qa');
    await openLibraryTab(page, 'Piston pipettes');
    await page.getByRole('link', { name: 'Add piston pipette' }).click();
    // ISO 8655-2:2002 at 100 µL: ± 0.8 µL systematic, 0.3 µL random (the shared template table; from memory, so the form says so).
    await page.getByLabel('Template').selectOption({ label: 'ISO 8655-2, 100 µL (± 0.8 µL, s 0.3 µL)' });
    await expect(page.getByLabel('Nominal (largest) volume').inputValue()).resolves.toBe('100');
    await expect(page.getByLabel('Systematic error (±)').inputValue()).resolves.toBe('0.8');
    await expect(page.getByLabel('Random error s').inputValue()).resolves.toBe('0.3');
    await page.getByText('Value recalled, check against your copy of ISO 8655-2.').waitFor();
    await page.getByRole('button', { name: 'Add a point' }).click();
    await expect(page.getByLabel('Set volume').count()).resolves.toBe(2);
    await screenshot(page, 'library-add-piston');

    await openLibraryTab(page, 'Solid materials');
    await page.getByRole('link', { name: 'Add solid reference material' }).click();
    await page.getByLabel('Purity uncertainty').selectOption('rectangular');
    await page.getByLabel('Half-width (±)').waitFor();
    await expect(page.getByLabel('Expanded uncertainty U').count()).resolves.toBe(0);
    await page.getByRole('button', { name: 'Add to library' }).click();
    // Checked in the browser with the shared schema before anything is sent.
    await page.getByText('Enter the lot number.').waitFor();
    await page.getByText('Enter the chemical formula, e.g. Pb(NO3)2.').waitFor();
    await screenshot(page, 'library-add-solid-errors');

    // An ID already in the library comes back from the server (409 code_taken) and lands on the ID field.
    await openLibraryTab(page, 'Flasks');
    await page.getByRole('link', { name: 'Add volumetric flask' }).click();
    await page.getByLabel('Template').selectOption({ label: 'ISO 1042 class A, 100 mL (± 0.1 mL)' });
    await page.getByLabel('ID', { exact: true }).fill('VF-100-A');
    await page.getByLabel('Fill repeatability s').fill('0.02');
    await page.getByRole('button', { name: 'Add to library' }).click();
    const id = page.getByLabel('ID', { exact: true });
    await page.getByText('The ID VF-100-A is already used by another item').waitFor();
    await expect(id.getAttribute('aria-invalid')).resolves.toBe('true');
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatch(/^409 from .+\/api\/labs\/\d+\/equipment$/);
  });

  it('checks a CSV file first and names the line of the broken row', async () => {
    const { page, problems } = await openPage();
    await signIn(page, 'qa');
    await openLibraryTab(page, 'Flasks');
    await page.getByRole('link', { name: 'Import CSV' }).click();
    await page.getByRole('heading', { level: 1, name: 'Import flasks from CSV' }).waitFor();
    await page.getByText('tolerance_ml', { exact: true }).waitFor();
    // Line 1 is the header; line 3 has a tolerance that is not a number (invented rows).
    const csv = [
      'code,description,nominal_ml,glass_class,tolerance_ml,fill_repeatability_ml',
      'VF-QA-CSV-1,Imported flask,100,A,0.10,0.02',
      'VF-QA-CSV-2,Broken tolerance,100,A,zero point one,0.02',
    ].join('\n');
    await page
      .getByLabel('CSV file', { exact: true })
      .setInputFiles({ name: 'flasks.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await page.getByRole('button', { name: 'Check the file' }).click();
    await page.getByRole('heading', { name: 'Check of flasks.csv' }).waitFor();
    const rows = await page
      .locator('section', { has: page.getByRole('heading', { name: 'Check of flasks.csv' }) })
      .locator('tbody tr')
      .allInnerTexts();
    expect(rows).toHaveLength(2);
    expect(rows[0]).toMatch(/^2\s+VF-QA-CSV-1\s+New item/);
    expect(rows[1]).toMatch(/^3\s+VF-QA-CSV-2\s+Error/);
    expect(rows[1]).toContain('tolerance_ml');
    await expect(page.getByRole('button', { name: /^Import \d+ rows?$/ }).isDisabled()).resolves.toBe(true);
    await screenshot(page, 'library-import-dry-run');

    // The corrected file passes its check; only then can it be imported, both rows in one go.
    const corrected = csv.replace('zero point one', '0.10');
    await page
      .getByLabel('CSV file', { exact: true })
      .setInputFiles({ name: 'flasks-corrected.csv', mimeType: 'text/csv', buffer: Buffer.from(corrected) });
    await page.getByRole('button', { name: 'Check the file' }).click();
    await page.getByRole('heading', { name: 'Check of flasks-corrected.csv' }).waitFor();
    await page.getByRole('button', { name: 'Import 2 rows' }).click();
    await page.getByText('2 new items and 0 new revisions were saved').waitFor();
    await openLibraryTab(page, 'Flasks');
    await page.getByRole('link', { name: 'VF-QA-CSV-2' }).waitFor();
    expect(problems).toEqual([]);
  });

  it('lets QA set the lab policy and shows who changed it', async () => {
    const { page, problems } = await openPage();
    await signIn(page, 'qa');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Lab policy' }).click();
    await page.getByRole('heading', { level: 1, name: 'Lab policy' }).waitFor();
    await page.getByText('The defaults apply; nobody has changed the policy yet.').waitFor();
    await page.getByLabel('Half-range around the lab temperature').fill('3');
    await expect(page.getByLabel('Reference temperature').inputValue()).resolves.toBe('20');
    await page.getByRole('radio', { name: /One shared lab temperature/ }).check();
    await page.getByLabel('Half-range of one operation around the lab temperature').fill('0.5');
    await page.getByRole('button', { name: 'Save lab policy' }).click();
    await page.getByText(/^Last changed by .+ on /).waitFor();
    await expect(page.getByLabel('Half-range around the lab temperature').inputValue()).resolves.toBe('3');
    await expect(page.getByRole('radio', { name: /One shared lab temperature/ }).isChecked()).resolves.toBe(true);
    await screenshot(page, 'policy-qa');
    expect(problems).toEqual([]);
  });
});

describe('the tolerance library, read by an analyst', () => {
  it('shows items, history and certificates with no controls to change them', async () => {
    const { page, problems } = await openPage();
    await signIn(page, 'analyst');
    await openLibraryTab(page, 'Flasks');
    await page.getByRole('link', { name: 'VF-100-A', exact: true }).waitFor();
    await expect(page.getByRole('link', { name: /^Add / }).count()).resolves.toBe(0);
    await expect(page.getByRole('link', { name: 'Import CSV' }).count()).resolves.toBe(0);
    await expect(page.getByRole('link', { name: 'Export CSV' }).count()).resolves.toBe(1);
    await page.getByLabel('Search ID or description').fill('VF-50-QA');
    await expect(page.locator('tbody tr').count()).resolves.toBe(1);
    await screenshot(page, 'library-flasks-analyst');

    await page.getByRole('link', { name: NEW_FLASK }).click();
    await page.getByRole('heading', { level: 1, name: NEW_FLASK }).waitFor();
    await page.getByRole('link', { name: 'vf-50-qa-certificate.pdf' }).waitFor();
    await expect(page.getByRole('link', { name: 'Edit', exact: true }).count()).resolves.toBe(0);
    await expect(page.getByRole('button', { name: 'Retire' }).count()).resolves.toBe(0);
    await expect(page.getByRole('button', { name: 'Upload', exact: true }).count()).resolves.toBe(0);
    await expect(page.getByText(REVISION_REASON).count()).resolves.toBe(1);

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Lab policy' }).click();
    await page
      .getByText(
        '± 3 °C around the lab temperature (rectangular), shared by every volume of a preparation, plus ± 0.5 °C per operation',
      )
      .waitFor();
    await page.getByText('Tare and gross readings independent').waitFor();
    await expect(page.getByRole('button', { name: 'Save lab policy' }).count()).resolves.toBe(0);
    await screenshot(page, 'policy-analyst');
    expect(problems).toEqual([]);
  });
});
