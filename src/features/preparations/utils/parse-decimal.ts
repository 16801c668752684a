/**
 * Reads a number as a chemist types it: "0.1599", "0,1599", " 25 ", "1e-3", times 10^powerOfTen, shifted in
 * the decimal text itself so that a change of unit adds no binary remainder: parseDecimal("250", -3) is 0.25
 * exactly as JavaScript reads "0.25", and parseDecimal("123.4", -3) is 0.1234 (123.4 / 1000 would not be).
 * Returns null for empty text and NaN for text that is not a number.
 */
export function parseDecimal(text: string, powerOfTen = 0): number | null {
  const trimmed = text.trim().replace(/\s+/g, '');
  if (trimmed === '') return null;
  const normalised = /^[-+]?\d*,\d+$/.test(trimmed) ? trimmed.replace(',', '.') : trimmed;
  const match = /^([-+]?(?:\d+\.?\d*|\.\d+))(?:e([-+]?\d+))?$/i.exec(normalised);
  if (!match) return Number.NaN;
  return Number(`${match[1]}e${Number(match[2] ?? 0) + powerOfTen}`);
}
