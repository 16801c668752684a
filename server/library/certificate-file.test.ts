import { deflateSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { certificateDisplayName, pdfHoldsJavaScript } from './certificate-file';

describe('certificateDisplayName', () => {
  it('keeps a plain name and puts the sniffed extension on it', () => {
    expect(certificateDisplayName('Calibration 2026.pdf', 'pdf')).toBe('Calibration 2026.pdf');
    expect(certificateDisplayName('scan.html', 'png')).toBe('scan.png');
  });
  it('drops path parts, control characters, bidi and zero-width marks and leading dots', () => {
    expect(certificateDisplayName('C:\\Users\\x\\..\\.hidden\u0000\u0007\u001b[31m\u202Egpj\u200B.exe', 'pdf')).toBe(
      'hidden[31mgpj.pdf',
    );
  });
  it('normalises to NFC and caps the length by characters', () => {
    expect(certificateDisplayName('Pru\u0308fung.pdf', 'pdf')).toBe('Prüfung.pdf');
    const long = certificateDisplayName(`${'µ'.repeat(500)}.pdf`, 'jpg');
    expect(Array.from(long)).toHaveLength(120);
    expect(long.endsWith('µ.jpg')).toBe(true);
  });
  it('names a file that had no usable name', () => {
    expect(certificateDisplayName('\u202E/..', 'pdf')).toBe('certificate.pdf');
  });
});

describe('pdfHoldsJavaScript', () => {
  const pdf = (body: string) => Buffer.from(`%PDF-1.7\n${body}\n%%EOF\n`, 'latin1');
  it('finds /JS and /JavaScript, also written with #xx escapes', () => {
    expect(pdfHoldsJavaScript(pdf('1 0 obj<</OpenAction<</S/JavaScript/JS(x)>>>>endobj'))).toBe(true);
    expect(pdfHoldsJavaScript(pdf('1 0 obj<</AA<</O<</S/J#61v#61Script/#4A#53(x)>>>>>>endobj'))).toBe(true);
  });
  it('finds them inside a compressed object stream', () => {
    const hidden = deflateSync(Buffer.from('<</S/JavaScript/JS(app.launchURL("http://x"))>>'));
    const file = Buffer.concat([
      Buffer.from('%PDF-1.7\n1 0 obj<</Type/ObjStm/Filter/FlateDecode>>stream\n'),
      hidden,
      Buffer.from('\nendstream endobj\n%%EOF\n'),
    ]);
    expect(pdfHoldsJavaScript(file)).toBe(true);
  });
  it('passes a PDF without script, even with look-alike names', () => {
    expect(pdfHoldsJavaScript(pdf('1 0 obj<</Type/Catalog/JSONData(1)/Title(JavaScript guide)>>endobj'))).toBe(false);
  });
});
