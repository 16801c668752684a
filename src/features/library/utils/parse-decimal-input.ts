/**
 * Reads a number typed into a form: "0,06" and "0.06" both give 0.06, surrounding spaces are
 * ignored, an empty box gives null (the schema then asks for the number, or accepts "none"),
 * and anything else gives NaN so the schema says it is not a number.
 */
export function parseDecimalInput(text: unknown): number | null {
  if (typeof text === 'number') return text;
  if (typeof text !== 'string') return null;
  const trimmed = text.trim();
  if (trimmed === '') return null;
  const normalised = /^[+-]?\d*,\d+$/.test(trimmed) ? trimmed.replace(',', '.') : trimmed;
  return /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(normalised) ? Number(normalised) : Number.NaN;
}
