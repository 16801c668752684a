import PDFDocument from 'pdfkit';
import { PDF_FONTS } from '../pdf/fonts';

/**
 * A one-page certificate for a demo item, so the demo library has files to open. Every figure and
 * name on it is invented and it says so on the page.
 */
export function demoCertificatePdf(input: {
  title: string;
  issuer: string;
  reference: string;
  issuedOn: string;
  lines: [string, string][];
}): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const doc = new PDFDocument({ size: 'A4', margin: 56, info: { Title: input.title, Author: input.issuer } });
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.registerFont('regular', PDF_FONTS.regular);
    doc.registerFont('bold', PDF_FONTS.bold);
    doc.font('bold').fontSize(16).fillColor('#17323b').text(input.title);
    doc
      .moveDown(0.3)
      .font('regular')
      .fontSize(10)
      .fillColor('#444')
      .text(`${input.issuer} · certificate ${input.reference} · issued ${input.issuedOn}`);
    doc.moveDown(1);
    for (const [label, value] of input.lines) {
      const y = doc.y;
      doc.font('regular').fontSize(11).fillColor('#17323b').text(label, 56, y, { width: 220 });
      doc.font('bold').text(value, 290, y, { width: 250 });
      doc.moveDown(0.4);
    }
    doc
      .moveDown(2)
      .font('regular')
      .fontSize(9)
      .fillColor('#a3322b')
      .text('DEMONSTRATION DOCUMENT — invented for the Dilutrace demo lab. Not a real certificate.', 56);
    doc.end();
  });
}
