/** A number to `digits` significant digits, without exponent for everyday magnitudes ("0.0012", "3.4"). */
export function formatSignificant(value: number, digits = 2): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-4 && magnitude < 1e6) return Number(value.toPrecision(digits)).toString();
  return value.toExponential(digits - 1).replace('e', ' × 10^');
}

/** "12.3 %" for a percentage already scaled to 0–100. */
export const formatPercentOfVariance = (indexPercent: number) =>
  `${indexPercent < 0.1 && indexPercent > 0 ? '< 0.1' : indexPercent.toFixed(1)} %`;

/** The first and last characters of a SHA-256, enough to tell records apart at a glance. */
export const shortHash = (sha256: string) => `${sha256.slice(0, 8)}…${sha256.slice(-4)}`;
