import { inflateSync } from 'node:zlib';

/** The longest name shown for a certificate, extension included. */
export const CERTIFICATE_NAME_MAX_CHARS = 120;

/**
 * The name a certificate is shown and downloaded under: the uploader's name, NFC-normalised,
 * without path parts, control or formatting characters (bidi overrides, zero-width marks) or
 * characters file systems refuse, capped at CERTIFICATE_NAME_MAX_CHARS, and ending in the
 * extension of the type sniffed from the content (never the one the name claimed).
 * @example certificateDisplayName('..\\evil/x.html', 'pdf') // → 'x.pdf'
 */
export function certificateDisplayName(uploaded: string, extension: string): string {
  const base = uploaded.normalize('NFC').split(/[\\/]/).pop() ?? '';
  const cleaned = base
    .replace(/[\p{Cc}\p{Cf}\p{Zl}\p{Zp}]/gu, '')
    .replace(/[<>:"|?*]/g, '_')
    .replace(/\s+/g, ' ')
    .trim()
    .replace(/^\.+/, '');
  const stem = cleaned.replace(/\.[^.]*$/, '').trim();
  const room = CERTIFICATE_NAME_MAX_CHARS - extension.length - 1;
  const capped = Array.from(stem).slice(0, room).join('').trim();
  return `${capped || 'certificate'}.${extension}`;
}

/** Most inflated bytes looked at per PDF (a bound against compression bombs). */
const INFLATE_BUDGET_BYTES = 64 * 1024 * 1024;

/** The PDF's text and its Flate-compressed streams inflated (object streams can hide dictionaries). */
function pdfTexts(pdf: Buffer): string[] {
  const raw = pdf.toString('latin1');
  const texts = [raw];
  let budget = INFLATE_BUDGET_BYTES;
  for (const match of raw.matchAll(/stream\r?\n/g)) {
    const start = (match.index ?? 0) + match[0].length;
    const end = raw.indexOf('endstream', start);
    if (end < 0 || budget <= 0) break;
    try {
      const inflated = inflateSync(pdf.subarray(start, end), { maxOutputLength: budget });
      budget -= inflated.length;
      texts.push(inflated.toString('latin1'));
    } catch {
      // not Flate data, or over the budget: only the raw bytes are checked
    }
  }
  return texts;
}

/**
 * True when a PDF can run JavaScript: a /JS or /JavaScript name anywhere (an /OpenAction or /AA
 * that runs script names one of them), also when written with #xx escapes or inside compressed
 * object streams. A heuristic that errs towards flagging: the flag warns, it does not refuse.
 */
export function pdfHoldsJavaScript(pdf: Buffer): boolean {
  return pdfTexts(pdf).some((text) => {
    const names = text.replace(/\/[^\s/<>[\]()]+/g, (name) =>
      name.replace(/#([0-9A-Fa-f]{2})/g, (_m, hex: string) => String.fromCharCode(parseInt(hex, 16))),
    );
    return /\/(JS|JavaScript)(?![A-Za-z0-9])/.test(names);
  });
}
