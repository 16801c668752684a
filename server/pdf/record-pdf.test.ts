import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { snapshotSchema } from '../../shared/contracts/snapshot';
import { itemIn, snapshotStepNamer, stepInstruction } from '../../shared/contracts/step-kinds';
import { resultStatement } from '../../shared/uncertainty';
import { leadPlan, libraryByCode } from '../test-support/demo-plans';
import { itemReference } from './item-reference';
import { buildTestApp, demo, DEMO_PASSWORD, signIn, type Client, type TestApp } from '../test-support/test-app';

let t: TestApp;
let labId: number;
let analyst: Client;
let preparationId: number;
const work = mkdtempSync(join(tmpdir(), 'dilutrace-pdf-'));

const url = (path: string) => `/api/labs/${labId}${path}`;
const binary = (
  res: NodeJS.ReadableStream & { setEncoding(e: string): void; on(e: string, cb: (c?: unknown) => void): void },
  cb: (e: Error | null, body: Buffer) => void,
) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk) => chunks.push(chunk as Buffer));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

async function downloadPdf(client: Client, number = 1): Promise<Buffer> {
  const res = await client.agent
    .get(url(`/preparations/${preparationId}/versions/${number}/record.pdf`))
    .buffer(true)
    .parse(binary as never)
    .expect(200);
  expect(res.headers['content-type']).toBe('application/pdf');
  return res.body as Buffer;
}

/** Text of a PDF through poppler's pdftotext (Debian poppler-utils, installed by the test command). */
/** The PDF's text; `nodiag` leaves out the diagonal draft watermark, whose letters otherwise fall into the lines they cross. */
function pdfText(pdf: Buffer, name: string, { nodiag = false } = {}): string {
  const file = join(work, `${name}.pdf`);
  writeFileSync(file, pdf);
  execFileSync('pdftotext', ['-layout', ...(nodiag ? ['-nodiag'] : []), file, join(work, `${name}.txt`)]);
  return readFileSync(join(work, `${name}.txt`), 'utf8');
}

/** A snapshot stored while warnings were English sentences: 0.1599 g on BAL-04, below its minimum weight. */
const storedWithTextWarnings = JSON.parse(
  readFileSync(
    new URL('../../tests/fixtures/snapshots/lead-standard-stored-with-text-warnings.json', import.meta.url),
    'utf8',
  ),
) as { snapshotSha256: string; snapshotJson: string };
const MINIMUM_WEIGHT_SENTENCE = (JSON.parse(storedWithTextWarnings.snapshotJson) as { warnings: string[] }).warnings[0];

beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  analyst = await signIn(t.app, demo('analyst'));
  const library = await libraryByCode(analyst, labId);
  preparationId = (
    await analyst
      .post(url('/preparations'), { title: 'Pb 100 mg/L intermediate', plan: leadPlan(library), seed: 77 })
      .expect(201)
  ).body.id;
});
afterEach(async () => {
  await t.close();
});

describe('the PDF record', () => {
  it('marks an unapproved version as a draft on every page', async () => {
    const text = pdfText(await downloadPdf(analyst), 'draft');
    expect(text).toContain('DRAFT — not approved');
    expect(text).toMatch(/page 1 of \d/);
  });

  it('holds the result statement, budget rows, signatures, hash and cautions of an approved version, and page 1 is not blank', async () => {
    await analyst
      .post(url(`/preparations/${preparationId}/versions/1/readings`), {
        readings: [{ stepIndex: 0, actualMassG: 0.16011 }],
        deviations: 'None.',
      })
      .expect(200);
    await analyst.post(url(`/preparations/${preparationId}/versions/1/submit`), {}).expect(200);
    const qa = await signIn(t.app, demo('qa'));
    const approved = (
      await qa
        .post(url(`/preparations/${preparationId}/versions/1/approve`), {
          password: DEMO_PASSWORD,
          statement: 'Reviewed against SOP-CHEM-014.',
        })
        .expect(200)
    ).body;
    const auditor = await signIn(t.app, demo('auditor'));
    const pdf = await downloadPdf(auditor);
    const text = pdfText(pdf, 'approved');
    const flat = text.replace(/\s+/g, ' ');
    expect(flat).toContain(approved.current.snapshot.budget.statement.replace(/\s+/g, ' '));
    expect(flat).not.toContain('DRAFT');
    expect(flat).toContain('Wellmere Regional Water Laboratory');
    const firstRows = approved.current.snapshot.budget.rows.slice(0, 5);
    expect(firstRows).toHaveLength(5);
    for (const row of firstRows) expect(flat).toContain(row.label);
    expect(flat).toContain('BAL-05 (revision 1, certificate WCS-26-0412)');
    expect(flat).toContain('Approved and signed (password confirmed) by Imogen Tasker');
    expect(flat).toContain(approved.current.snapshotSha256);
    expect(flat).toContain('safety data sheet');
    expect(flat).toMatch(/Lead compounds are toxic/);
    expect(flat).toMatch(/seed 77/);
    expect(flat).toContain('Step 1 · Weigh the solid (BAL-05), net mass: planned 0.15990 g, weighed 0.16011 g.');

    const png = join(work, 'page');
    execFileSync('pdftoppm', ['-png', '-r', '40', '-f', '1', '-l', '1', join(work, 'approved.pdf'), png]);
    const image = readFileSync(`${png}-1.png`);
    // A blank A4 page at 40 dpi compresses to well under 1 kB; text, tables and lines make it several kB.
    expect(image.length).toBeGreaterThan(4000);
  });

  it('words the plan and names the budget subtotals as the step-kind registry does, items with revision and certificate', async () => {
    const detail = (await analyst.get(url(`/preparations/${preparationId}`)).expect(200)).body;
    const snapshot = snapshotSchema.parse(detail.current.snapshot);
    // pdftotext breaks lines (even inside "NRM-PBN-24117"), so the text is compared without any white space.
    const bare = (text: string) => text.replace(/\s+/g, '');
    const text = bare(pdfText(await downloadPdf(analyst), 'plan', { nodiag: true }));
    const sentences = snapshot.plan.steps.map((step, stepIndex) =>
      stepInstruction(step, {
        item: (slot) => itemReference(itemIn(step, slot), snapshot.items),
        stepIndex,
        labTemperatureC: snapshot.plan.settings.labTemperatureC,
      }),
    );
    expect(sentences).toHaveLength(4);
    for (const [index, sentence] of sentences.entries()) expect(text).toContain(bare(`${index + 1}. ${sentence}`));
    expect(sentences[0]).toBe(
      'Weigh 0.15990 g of Lead(II) nitrate, certified reference material — RM-PBN-01 (revision 1, certificate NRM-PBN-24117) — by difference on BAL-05 (revision 1, certificate WCS-26-0412).',
    );
    const stepName = snapshotStepNamer(snapshot);
    expect(snapshot.budget.byStep.length).toBeGreaterThan(0);
    for (const group of snapshot.budget.byStep) expect(text).toContain(bare(`Subtotal, ${stepName(group.key)}`));
    expect(text).toContain(bare('Subtotal, Step 3 · Pipette an aliquot (GP-10-A)'));
  });

  it('lists a withdrawal in the review history in plain words, and the approval after it still reads as signed', async () => {
    const v1 = (action: string) => url(`/preparations/${preparationId}/versions/1/${action}`);
    await analyst.post(v1('submit'), {}).expect(200);
    await analyst.post(v1('withdraw'), { comment: 'Wrong flask entered.' }).expect(200);
    await analyst.post(v1('submit'), { comment: 'Flask corrected.' }).expect(200);
    const qa = await signIn(t.app, demo('qa'));
    await qa.post(v1('approve'), { password: DEMO_PASSWORD, statement: 'Reviewed against SOP-CHEM-014.' }).expect(200);
    const flat = pdfText(await downloadPdf(analyst), 'withdrawn').replace(/\s+/g, ' ');
    const history = [
      'Submitted for review by Dev Okonjo',
      'Withdrawn from review by Dev Okonjo, ',
      '“Wrong flask entered.”',
      'Submitted for review by Dev Okonjo, ',
      '“Flask corrected.”',
      'Approved and signed (password confirmed) by Imogen Tasker',
      '“Reviewed against SOP-CHEM-014.”',
    ];
    // Each line found after the one before it: the history is in order.
    let from = 0;
    for (const line of history) {
      from = flat.indexOf(line, from);
      expect(from, line).toBeGreaterThanOrEqual(0);
    }
    expect(flat).not.toContain('DRAFT');
  });

  it('states the Monte Carlo interval and why, in the words of the record page, when Monte Carlo does not validate GUM (JCGM 101:2008 §8)', async () => {
    const library = await libraryByCode(analyst, labId);
    const plan = leadPlan(library);
    // A dominant rectangular source (±2 %): its 95.45 % Monte Carlo interval is about ±2.0 %, the GUM one ±2.3 %, so the
    // ends differ by tenths of a mg/L, far more than δ = 0.05 mg/L (a dominant rectangular input, as in JCGM 101:2008 §9.2, from memory).
    Object.assign(plan.steps[3], {
      extraSources: [
        { name: 'Evaporation before use', effect: 'relative', distribution: { shape: 'rectangular', halfWidth: 0.02 } },
      ],
    });
    const created = (
      await analyst
        .post(url('/preparations'), { title: 'Pb with a dominant rectangular source', plan, seed: 5 })
        .expect(201)
    ).body;
    preparationId = created.id;
    const snapshot = snapshotSchema.parse(created.current.snapshot);
    expect(snapshot.validation.passed).toBe(false);
    const statement = resultStatement(snapshot);
    expect(statement.method).toBe('monteCarlo');
    expect(statement.text).toMatch(
      /^c\(Pb\) = 100\.0 mg\/L at 20 °C, 95\.45 % coverage interval \[98\.0, 102\.0\] mg\/L, Monte Carlo interval/,
    );
    // The list, the e-mail and the audit trail read the same words, stored with the version.
    expect(created.current.resultStatement).toBe(statement.text);
    const flat = pdfText(await downloadPdf(analyst), 'monte-carlo').replace(/\s+/g, ' ');
    expect(flat).toContain(statement.text);
    expect(flat).toContain(statement.reason);
    expect(flat).not.toContain(snapshot.budget.statement);
  });

  it('prints ν_eff truncated to the integer the coverage factor was read at (8.7 → 8, never 9)', async () => {
    const library = await libraryByCode(analyst, labId);
    const plan = leadPlan(library);
    // A dominant Type A source with 8 degrees of freedom makes ν_eff ≈ 8.7 by Welch–Satterthwaite (JCGM 100:2008 G.4.1).
    Object.assign(plan.steps[0], {
      extraSources: [
        {
          name: 'Drift between weighings',
          effect: 'relative',
          distribution: { shape: 'normal', standardUncertainty: 0.0091, degreesOfFreedom: 8 },
        },
      ],
    });
    const created = (
      await analyst.post(url('/preparations'), { title: 'Pb with a Type A source', plan, seed: 5 }).expect(201)
    ).body;
    preparationId = created.id;
    const budget = created.current.snapshot.budget;
    expect(budget.effectiveDegreesOfFreedom).toBeGreaterThan(8.5);
    expect(budget.effectiveDegreesOfFreedom).toBeLessThan(9);
    // k = t at 8 degrees of freedom for 95.45 %: 2.37 (JCGM 100:2008 Table G.2 gives 2.37 for ν = 8, p = 95.45 %).
    expect(budget.coverageFactor.toFixed(2)).toBe('2.37');
    const flat = pdfText(await downloadPdf(analyst), 'type-a').replace(/\s+/g, ' ');
    expect(flat).toContain('effective degrees of freedom ν_eff = 8; coverage factor k = 2.37');
    expect(flat).not.toContain('ν_eff = 9');
  });

  it('prints ν_eff = ∞ from a snapshot stored before snapshots were typed, where it is null', async () => {
    const legacy = JSON.parse(
      readFileSync(
        new URL('../../tests/fixtures/snapshots/lead-standard-stored-before-typing.json', import.meta.url),
        'utf8',
      ),
    );
    await t
      .db('preparation_versions')
      .where({ preparation_id: preparationId, number: 1 })
      .update({ snapshot_json: legacy.snapshotJson, snapshot_sha256: legacy.snapshotSha256 });
    const flat = pdfText(await downloadPdf(analyst), 'stored-before-typing').replace(/\s+/g, ' ');
    expect(flat).toContain('effective degrees of freedom ν_eff = ∞; coverage factor k = 2.00');
    expect(flat).toContain(legacy.snapshotSha256);
  });

  it('prints a warning in the words it was stored with, for a snapshot stored while warnings were sentences', async () => {
    const legacy = storedWithTextWarnings;
    expect(MINIMUM_WEIGHT_SENTENCE).toMatch(/^Step 1: 0\.1599 g is below the minimum weight of Balance BAL-04/);
    await t
      .db('preparation_versions')
      .where({ preparation_id: preparationId, number: 1 })
      .update({ snapshot_json: legacy.snapshotJson, snapshot_sha256: legacy.snapshotSha256 });
    const flat = pdfText(await downloadPdf(analyst), 'text-warnings').replace(/\s+/g, ' ');
    expect(flat).toContain(`Warning: ${MINIMUM_WEIGHT_SENTENCE}`);
    const verified = await analyst.get(url(`/preparations/${preparationId}/versions/1/verify`)).expect(200);
    expect(verified.body.computedSha256).toBe(legacy.snapshotSha256);
    expect(verified.body.storedSha256).toBe(legacy.snapshotSha256);
  });

  it('prints a warning computed today in the same words', async () => {
    const library = await libraryByCode(analyst, labId);
    preparationId = (
      await analyst
        .post(url('/preparations'), { title: 'Pb on BAL-04', plan: leadPlan(library, { balance: 'BAL-04' }), seed: 5 })
        .expect(201)
    ).body.id;
    const flat = pdfText(await downloadPdf(analyst), 'code-warnings').replace(/\s+/g, ' ');
    expect(flat).toContain(`Warning: ${MINIMUM_WEIGHT_SENTENCE}`);
  });

  it('bottles the stock before its flask is used again, in the words of the bench sheet (common practice)', async () => {
    const library = await libraryByCode(analyst, labId);
    const plan = leadPlan(library, { aliquotFlask: 'VF-100-A' });
    Object.assign(plan.steps[3], { flaskEmptiedBefore: true });
    preparationId = (await analyst.post(url('/preparations'), { title: 'Pb bottled stock', plan, seed: 5 }).expect(201))
      .body.id;
    const flat = pdfText(await downloadPdf(analyst), 'flask-reused').replace(/\s+/g, ' ');
    // The draft's watermark letters fall between words of the layout text: the sentence is checked in pieces.
    expect(flat).toContain(
      '3. First transfer the solution of step 2 from VF-100-A into a labelled storage bottle, and rinse VF-100-A; take',
    );
    expect(flat).toContain('this aliquot from that bottle. Pipette 10 mL from the solution of step 2');
    expect(flat).toMatch(
      /4\. Transfer quantitatively into the 100 mL flask VF-100-A .*\(its earlier solution bottled and/,
    );
  });

  it('is refused for a version with no computed budget', async () => {
    const library = await libraryByCode(analyst, labId);
    const plan = leadPlan(library);
    (plan.steps[0] as { netMassG: number }).netMassG = 1000;
    const broken = (await analyst.post(url('/preparations'), { title: 'Too much', plan }).expect(201)).body;
    const res = await analyst.get(url(`/preparations/${broken.id}/versions/1/record.pdf`)).expect(400);
    expect(res.body.error.message).toMatch(/no record to print/);
  });
});
