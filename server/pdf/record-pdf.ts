import { stepMassText } from '../../shared/contracts/balance-reading';
import { RECORD_CAUTIONS } from '../../shared/contracts/safety-advice';
import PDFDocument from 'pdfkit';
import type { VersionDetail } from '../../shared/contracts/preparations';
import { warningText } from '../../shared/contracts/warning-text';
import {
  firstInstructions,
  itemIn,
  readingWords,
  snapshotStepNamer,
  stepInstruction,
} from '../../shared/contracts/step-kinds';
import { formatDegreesOfFreedom, resultStatement } from '../../shared/uncertainty';
import { validationWords } from '../../shared/contracts/validation-words';
import { PDF_FONTS } from './fonts';
import { percent, significant, utc } from './format';
import { drawContributionBars, drawHistogram } from './pdf-charts';
import { drawTable } from './pdf-table';
import { itemReference } from './item-reference';

export interface RecordPdfInput {
  labName: string;
  preparation: { id: number; title: string; createdBy: string };
  version: VersionDetail;
  generatedAt: string;
}

const MARGIN = 48;
const PAGE = { width: 595.28, height: 841.89 };
const CONTENT_WIDTH = PAGE.width - 2 * MARGIN;
const BOTTOM = PAGE.height - MARGIN - 24;
const INK = '#17323b';

/** A dimensionless quantity (unit '1') prints without a unit. */
const withUnit = (text: string, unit: string) => (unit === '1' || unit === '' ? text : `${text} ${unit}`);

const DISTRIBUTION_NAMES: Record<string, string> = {
  normal: 'normal',
  rectangular: 'rectangular',
  triangular: 'triangular',
  arcsine: 'arcsine',
  studentT: 'Student t',
};

/** How the review history words each action, in plain words. */
const REVIEW_VERBS: Record<VersionDetail['reviews'][number]['action'], string> = {
  submitted: 'Submitted for review',
  withdrawn: 'Withdrawn from review',
  returned: 'Returned with comments',
  approved: 'Approved and signed (password confirmed)',
};

/**
 * The PDF record of one preparation version: plan, inputs, budget, charts, Monte Carlo and its
 * validation, the GUM result statement, review and signatures, the snapshot's SHA-256, cautions.
 * A version that is not approved is watermarked as a draft on every page.
 */
export function renderRecordPdf(input: RecordPdfInput): Promise<Buffer> {
  const { version } = input;
  const snapshot = version.snapshot;
  if (!snapshot) return Promise.reject(new Error('A version without a computed snapshot has no record to print.'));
  const { budget, monteCarlo, validation, items } = snapshot;
  const stepName = snapshotStepNamer(snapshot);
  const approved = version.status === 'approved';
  const statement = resultStatement(snapshot);

  return new Promise((resolve, reject) => {
    const doc = new PDFDocument({
      size: 'A4',
      margins: { top: MARGIN + 18, bottom: MARGIN, left: MARGIN, right: MARGIN },
      bufferPages: true,
      info: {
        Title: `${input.preparation.title} — version ${version.number}`,
        Author: input.labName,
        Subject: 'Dilutrace preparation record',
        Creator: 'Dilutrace',
      },
    });
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.registerFont('regular', PDF_FONTS.regular);
    doc.registerFont('bold', PDF_FONTS.bold);
    doc.registerFont('mono', PDF_FONTS.mono);

    const heading = (text: string, keepWithNext = 60) => {
      if (doc.y + keepWithNext > BOTTOM) doc.addPage();
      doc.moveDown(0.4).font('bold').fontSize(11).fillColor(INK).text(text, MARGIN, doc.y, { width: CONTENT_WIDTH });
      doc.moveDown(0.25);
    };
    const paragraph = (text: string, options: { size?: number; font?: string; color?: string } = {}) => {
      doc
        .font(options.font ?? 'regular')
        .fontSize(options.size ?? 9)
        .fillColor(options.color ?? INK)
        .text(text, MARGIN, doc.y, { width: CONTENT_WIDTH });
    };

    // Title block
    doc.font('bold').fontSize(16).fillColor(INK).text(input.preparation.title, MARGIN, doc.y, { width: CONTENT_WIDTH });
    paragraph(
      `${input.labName} · preparation ${input.preparation.id}, version ${version.number} · status: ${approved ? 'APPROVED' : version.status.toUpperCase() + ' — not approved'}`,
    );
    paragraph(
      `Planned by ${input.preparation.createdBy} · version created ${utc(version.createdAt)} · computed ${utc(snapshot.computedAt)} · printed ${utc(input.generatedAt)}`,
      { size: 8, color: '#4a5a60' },
    );

    // Result statement
    heading('Result');
    const boxTop = doc.y;
    doc
      .font('bold')
      .fontSize(12)
      .fillColor(INK)
      .text(statement.text, MARGIN + 8, boxTop + 8, { width: CONTENT_WIDTH - 16 });
    if (statement.reason)
      doc
        .font('regular')
        .fontSize(9)
        .text(statement.reason, MARGIN + 8, doc.y + 3, { width: CONTENT_WIDTH - 16 });
    doc
      .font('regular')
      .fontSize(8.5)
      .text(
        `Combined standard uncertainty u_c = ${significant(budget.standardUncertainty, 3)} ${budget.unit} (relative ${percent(100 * budget.relativeStandardUncertainty, 3)}); ` +
          `effective degrees of freedom ν_eff = ${formatDegreesOfFreedom(budget.effectiveDegreesOfFreedom)}; ` +
          `coverage factor k = ${budget.coverageFactor.toFixed(2)} for a coverage probability of ${(100 * budget.coverageProbability).toFixed(2)} %; ` +
          `expanded uncertainty U = ${significant(budget.expandedUncertainty, 3)} ${budget.unit} (relative ${percent(100 * budget.relativeExpandedUncertainty, 2)}).`,
        MARGIN + 8,
        doc.y + 3,
        { width: CONTENT_WIDTH - 16 },
      );
    doc
      .rect(MARGIN, boxTop, CONTENT_WIDTH, doc.y - boxTop + 8)
      .lineWidth(1)
      .strokeColor('#a85a24')
      .stroke();
    doc.y += 14;
    for (const warning of snapshot.warnings)
      paragraph(`Warning: ${warningText(warning)}`, { size: 8.5, color: '#8a5a00' });

    // Plan
    heading('Plan');
    const { steps, settings } = snapshot.plan;
    const firstLines = firstInstructions(steps);
    steps.forEach((step, index) => {
      const checkpoint = budget.checkpoints.find((c) => c.stepIndex === index);
      const after = checkpoint ? ` → ${significant(checkpoint.value, 5)} ${checkpoint.unit}` : '';
      const instruction = stepInstruction(step, {
        item: (slot) => itemReference(itemIn(step, slot), items),
        stepIndex: index,
        labTemperatureC: settings.labTemperatureC,
      });
      const first = firstLines.get(index);
      paragraph(`${index + 1}. ${first ? `${first} ` : ''}${instruction}${after}`);
      doc.moveDown(0.15);
    });
    paragraph(
      `Lab temperature ${settings.labTemperatureC} °C ± ${settings.temperatureHalfRangeC} °C (rectangular); glassware tolerances taken as ${settings.defaultGlasswareDistribution} unless an item says otherwise. Engine ${snapshot.engineVersion}.`,
      { size: 8, color: '#4a5a60' },
    );

    if (version.readings) {
      heading('Actual readings');
      paragraph(
        `Recorded at the bench by ${version.readings.recordedBy}, ${utc(version.readings.recordedAt)}. The budget above is computed on these masses.`,
        { size: 8.5 },
      );
      for (const reading of version.readings.readings) {
        const step = steps.at(reading.stepIndex);
        const grams = (massG: number) => `${stepMassText(massG, step)} g`;
        const parts = [
          reading.tareG !== null ? `tare ${grams(reading.tareG)}` : '',
          reading.grossG !== null ? `gross ${grams(reading.grossG)}` : '',
        ]
          .filter(Boolean)
          .join(', ');
        paragraph(
          `${stepName(String(reading.stepIndex))}, ${step ? readingWords(step.kind) : 'mass'}: planned ${grams(reading.plannedG)}, weighed ${grams(reading.actualG)}${parts ? ` (${parts})` : ''}.`,
        );
      }
      if (version.readings.deviations) paragraph(`Deviations: ${version.readings.deviations}`);
    }

    // Inputs
    heading('Inputs');
    drawTable(doc, {
      x: MARGIN,
      bottom: BOTTOM,
      columns: [
        { header: 'Source', width: 190 },
        { header: 'Type', width: 34 },
        { header: 'Distribution', width: 66 },
        { header: 'Estimate', width: 78, align: 'right' },
        { header: 'Standard uncertainty', width: 86, align: 'right' },
        { header: 'ν', width: 45, align: 'right' },
      ],
      rows: budget.rows.map((row) => ({
        cells: [
          row.label,
          row.evaluationType,
          DISTRIBUTION_NAMES[row.distribution] ?? row.distribution,
          withUnit(significant(row.estimate, 6), row.unit),
          withUnit(significant(row.standardUncertainty, 3), row.unit),
          Number.isFinite(row.degreesOfFreedom) ? String(row.degreesOfFreedom) : '∞',
        ],
      })),
    });

    // Budget grouped by step
    heading('Uncertainty budget');
    const budgetRows: { cells: string[]; strong?: boolean }[] = [];
    for (const group of budget.byStep) {
      for (const row of budget.rows.filter((r) => r.stepIndices.join('+') === group.key)) {
        budgetRows.push({
          cells: [
            row.label,
            significant(row.sensitivityCoefficient, 4),
            significant(row.contribution, 3),
            percent(row.indexPercent),
          ],
        });
      }
      budgetRows.push({
        cells: [
          `Subtotal, ${stepName(group.key)}`,
          '',
          significant(group.contribution, 3),
          percent(group.indexPercent),
        ],
        strong: true,
      });
    }
    budgetRows.push({
      cells: ['Combined standard uncertainty u_c', '', significant(budget.standardUncertainty, 3), '100.0 %'],
      strong: true,
    });
    drawTable(doc, {
      x: MARGIN,
      bottom: BOTTOM,
      columns: [
        { header: 'Source', width: 250 },
        { header: 'Sensitivity coefficient cᵢ', width: 100, align: 'right' },
        { header: `Contribution uᵢ(y), ${budget.unit}`, width: 90, align: 'right' },
        { header: '% of variance', width: 59, align: 'right' },
      ],
      rows: budgetRows,
    });

    heading('Contribution to the variance by step');
    drawContributionBars(doc, {
      x: MARGIN,
      width: CONTENT_WIDTH,
      groups: budget.byStep.map((g) => ({ label: stepName(g.key), indexPercent: g.indexPercent })),
    });

    // Monte Carlo
    heading('Monte Carlo (JCGM 101)', 200);
    paragraph(
      `${monteCarlo.trials.toLocaleString('en-GB')} trials, seed ${monteCarlo.seed} (xoshiro128**). Mean ${significant(monteCarlo.mean, 6)} ${monteCarlo.unit}, standard deviation ${significant(monteCarlo.standardDeviation, 3)} ${monteCarlo.unit}. ` +
        `${(100 * monteCarlo.coverageProbability).toFixed(2)} % intervals: probabilistically symmetric [${significant(monteCarlo.symmetricInterval.low, 6)}, ${significant(monteCarlo.symmetricInterval.high, 6)}], shortest [${significant(monteCarlo.shortestInterval.low, 6)}, ${significant(monteCarlo.shortestInterval.high, 6)}] ${monteCarlo.unit}.`,
    );
    doc.moveDown(0.4);
    drawHistogram(doc, {
      x: MARGIN,
      width: CONTENT_WIDTH,
      height: 90,
      histogram: monteCarlo.histogram,
      gum: { low: budget.value - budget.expandedUncertainty, high: budget.value + budget.expandedUncertainty },
      monteCarlo: monteCarlo.symmetricInterval,
      unit: monteCarlo.unit,
    });
    heading('Validation of the GUM result (JCGM 101 §8)');
    // The record page's words (one voice): the verdict, the end differences and δ.
    paragraph(validationWords(validation, budget.unit, resultStatement(snapshot).method === 'monteCarlo'), {
      font: 'bold',
    });

    // Review and signatures
    heading('Review and signatures');
    if (version.reviews.length === 0) paragraph('Not yet submitted for review.');
    for (const review of version.reviews) {
      const verb = REVIEW_VERBS[review.action];
      paragraph(`${verb} by ${review.actor}, ${utc(review.at)}${review.comment ? ` — “${review.comment}”` : ''}`);
      doc.moveDown(0.15);
    }

    heading('Integrity');
    paragraph(
      'SHA-256 of the stored snapshot (canonical JSON of plan, equipment revisions, engine version, seed and results):',
      { size: 8.5 },
    );
    paragraph(version.snapshotSha256 ?? '—', { font: 'mono', size: 8.5 });
    if (version.recordSha256 && version.approvedAs) {
      paragraph(
        `SHA-256 signed at approval (the snapshot hash with the title, analyte “${version.approvedAs.analyte}”, preparation name “${version.approvedAs.preparationName}” and laboratory name shown here):`,
        { size: 8.5 },
      );
      paragraph(version.recordSha256, { font: 'mono', size: 8.5 });
    }

    heading('Hazards and cautions');
    for (const item of items.filter((i) => i.hazardNotes))
      paragraph(`${item.code}: ${item.hazardNotes}`, { size: 8.5 });
    for (const caution of RECORD_CAUTIONS) paragraph(caution, { size: 8.5 });

    // Running header, footer, page numbers and the draft watermark on every page.
    const range = doc.bufferedPageRange();
    for (let i = range.start; i < range.start + range.count; i += 1) {
      doc.switchToPage(i);
      // Header and footer sit in the margins; without this pdfkit would open a new page for the footer.
      doc.page.margins.bottom = 0;
      doc
        .font('bold')
        .fontSize(8)
        .fillColor('#a85a24')
        .text('Dilutrace · preparation record', MARGIN, MARGIN - 14, { width: CONTENT_WIDTH / 2, lineBreak: false });
      doc
        .font('regular')
        .fillColor('#4a5a60')
        .text(input.labName, MARGIN + CONTENT_WIDTH / 2, MARGIN - 14, {
          width: CONTENT_WIDTH / 2,
          align: 'right',
          lineBreak: false,
        });
      const footer = `${input.preparation.title} · version ${version.number} · ${approved ? 'approved' : 'not approved'} · page ${i - range.start + 1} of ${range.count}`;
      doc.text(footer, MARGIN, PAGE.height - MARGIN + 10, { width: CONTENT_WIDTH, align: 'center', lineBreak: false });
      if (!approved) {
        doc.save();
        doc.rotate(-35, { origin: [PAGE.width / 2, PAGE.height / 2] });
        doc
          .font('bold')
          .fontSize(44)
          .fillColor('#a3322b')
          .fillOpacity(0.13)
          .text('DRAFT — not approved', 0, PAGE.height / 2 - 30, {
            width: PAGE.width,
            align: 'center',
            lineBreak: false,
          });
        doc.restore();
      }
    }
    doc.end();
  });
}
