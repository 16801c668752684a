import type PDFDocument from 'pdfkit';
import { significant } from './format';

type Doc = InstanceType<typeof PDFDocument>;

/** Horizontal bars of each step's share of the variance, labelled with the figure (readable in grey print). */
export function drawContributionBars(
  doc: Doc,
  input: { x: number; width: number; groups: { label: string; indexPercent: number }[] },
) {
  const labelWidth = input.width * 0.42;
  const barWidth = input.width - labelWidth - 50;
  doc.font('regular').fontSize(8).fillColor('#17323b');
  for (const group of input.groups) {
    const y = doc.y;
    doc.text(group.label, input.x, y, { width: labelWidth - 6, lineBreak: false, ellipsis: true });
    const w = Math.max(0.5, (barWidth * Math.min(100, group.indexPercent)) / 100);
    doc.rect(input.x + labelWidth, y + 1, w, 8).fill('#a85a24');
    doc
      .rect(input.x + labelWidth, y + 1, barWidth, 8)
      .lineWidth(0.4)
      .strokeColor('#b9b2a2')
      .stroke();
    doc.fillColor('#17323b').text(`${group.indexPercent.toFixed(1)} %`, input.x + labelWidth + barWidth + 6, y, {
      width: 44,
      lineBreak: false,
    });
    doc.y = y + 13;
  }
  doc.x = input.x;
  doc.moveDown(0.5);
}

/**
 * The Monte Carlo histogram as bars, with the GUM interval y ± U (dashed) and the Monte Carlo
 * probabilistically symmetric interval (solid) drawn over it, and a scale under it.
 */
export function drawHistogram(
  doc: Doc,
  input: {
    x: number;
    width: number;
    height: number;
    histogram: { lowerEdge: number; binWidth: number; counts: number[] };
    gum: { low: number; high: number };
    monteCarlo: { low: number; high: number };
    unit: string;
  },
) {
  const { histogram } = input;
  const top = doc.y;
  const lowest = Math.min(histogram.lowerEdge, input.gum.low);
  const highest = Math.max(histogram.lowerEdge + histogram.binWidth * histogram.counts.length, input.gum.high);
  const span = highest - lowest || 1;
  const xOf = (value: number) => input.x + ((value - lowest) / span) * input.width;
  const peak = Math.max(...histogram.counts, 1);
  histogram.counts.forEach((count, i) => {
    const left = xOf(histogram.lowerEdge + i * histogram.binWidth);
    const right = xOf(histogram.lowerEdge + (i + 1) * histogram.binWidth);
    const h = (count / peak) * input.height;
    doc.rect(left, top + input.height - h, Math.max(0.3, right - left), h).fill('#c9c1ae');
  });
  doc
    .moveTo(input.x, top + input.height)
    .lineTo(input.x + input.width, top + input.height)
    .lineWidth(0.6)
    .strokeColor('#17323b')
    .stroke();
  const line = (value: number, dashed: boolean) => {
    doc.save();
    if (dashed) doc.dash(3, { space: 2 });
    doc
      .moveTo(xOf(value), top - 2)
      .lineTo(xOf(value), top + input.height)
      .lineWidth(1.1)
      .strokeColor(dashed ? '#a3322b' : '#17323b')
      .stroke();
    doc.undash().restore();
  };
  line(input.gum.low, true);
  line(input.gum.high, true);
  line(input.monteCarlo.low, false);
  line(input.monteCarlo.high, false);
  doc.font('regular').fontSize(7).fillColor('#17323b');
  doc.text(significant(lowest, 5), input.x, top + input.height + 3, { width: 80, lineBreak: false });
  doc.text(`${significant(highest, 5)} ${input.unit}`, input.x + input.width - 100, top + input.height + 3, {
    width: 100,
    align: 'right',
    lineBreak: false,
  });
  doc.y = top + input.height + 14;
  doc.x = input.x;
  doc
    .fontSize(7.5)
    .text(
      'Dashed lines: GUM interval y ± U. Solid lines: Monte Carlo probabilistically symmetric coverage interval.',
      input.x,
      doc.y,
      { width: input.width },
    );
  doc.moveDown(0.5);
}
