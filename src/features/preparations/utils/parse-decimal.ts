/**
 * Reads a number as a chemist types it: "0.1599", "0,1599", " 25 ", "1e-3".
 * Returns null for empty text and NaN for text that is not a number.
 */
export function parseDecimal(text: string): number | null {
  const trimmed = text.trim().replace(/\s+/g, '');
  if (trimmed === '') return null;
  const normalised = /^[-+]?\d*,\d+$/.test(trimmed) ? trimmed.replace(',', '.') : trimmed;
  return /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(normalised) ? Number(normalised) : Number.NaN;
}
