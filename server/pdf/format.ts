/** Number formatting for the printed record: significant digits, no exponent for ordinary magnitudes. */
export function significant(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return value > 0 ? '∞' : value < 0 ? '−∞' : '—';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-4 && magnitude < 1e7) {
    const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(magnitude)));
    return value.toFixed(Math.min(decimals, 12)).replace('-', '−');
  }
  const [mantissa, exponent] = value.toExponential(digits - 1).split('e');
  return `${mantissa.replace('-', '−')} × 10${superscript(Number(exponent))}`;
}

const SUPERSCRIPTS: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};
const superscript = (n: number) =>
  String(n)
    .split('')
    .map((c) => SUPERSCRIPTS[c] ?? c)
    .join('');

export const percent = (value: number, digits = 1) => `${value.toFixed(digits)} %`;

/** 2026-12-02T09:41:00.000Z → 2026-12-02 09:41 UTC */
export const utc = (iso: string | null | undefined) => (iso ? `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC` : '—');
