import type PDFDocument from 'pdfkit';

export interface PdfColumn {
  header: string;
  width: number;
  align?: 'left' | 'right';
}

type Doc = InstanceType<typeof PDFDocument>;

/**
 * Draws a table that breaks across pages, repeating its header row on each new page.
 * `bottom` is the lowest y a row may reach before a page break; rows marked `strong` print bold
 * (subtotals).
 */
export function drawTable(
  doc: Doc,
  input: {
    columns: PdfColumn[];
    rows: { cells: string[]; strong?: boolean }[];
    x: number;
    bottom: number;
    fontSize?: number;
  },
) {
  const size = input.fontSize ?? 8;
  const padding = 3;
  const header = () => {
    const y = doc.y;
    doc.font('bold').fontSize(size).fillColor('#17323b');
    const height = rowHeight(
      input.columns.map((c) => c.header),
      'bold',
    );
    doc.rect(input.x, y, totalWidth, height).fill('#e9e5da');
    doc.fillColor('#17323b');
    cellsAt(
      input.columns.map((c) => c.header),
      y,
      'bold',
    );
    doc.y = y + height;
  };
  const totalWidth = input.columns.reduce((w, c) => w + c.width, 0);
  const rowHeight = (cells: string[], font: string) => {
    doc.font(font).fontSize(size);
    return (
      Math.max(...cells.map((text, i) => doc.heightOfString(text, { width: input.columns[i].width - 2 * padding }))) +
      2 * padding
    );
  };
  const cellsAt = (cells: string[], y: number, font: string) => {
    let x = input.x;
    doc.font(font).fontSize(size);
    cells.forEach((text, i) => {
      const column = input.columns[i];
      doc.text(text, x + padding, y + padding, {
        width: column.width - 2 * padding,
        align: column.align ?? 'left',
        lineBreak: true,
      });
      x += column.width;
    });
  };

  if (doc.y + 40 > input.bottom) doc.addPage();
  header();
  input.rows.forEach((row, index) => {
    const font = row.strong ? 'bold' : 'regular';
    const height = rowHeight(row.cells, font);
    if (doc.y + height > input.bottom) {
      doc.addPage();
      header();
    }
    const y = doc.y;
    if (index % 2 === 1) doc.rect(input.x, y, totalWidth, height).fill('#f6f4ee');
    doc.fillColor('#17323b');
    cellsAt(row.cells, y, font);
    doc
      .moveTo(input.x, y + height)
      .lineTo(input.x + totalWidth, y + height)
      .lineWidth(0.3)
      .strokeColor('#d9d4c7')
      .stroke();
    doc.y = y + height;
  });
  doc.x = input.x;
  doc.moveDown(0.6);
}
