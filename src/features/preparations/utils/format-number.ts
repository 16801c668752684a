/** A number to `digits` significant digits, in plain notation where that stays short ("0.000123", "1.2e-7"). */
export function formatSignificant(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return value === Infinity ? '∞' : '—';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-4 && magnitude < 1e7) return Number(value.toPrecision(digits)).toString();
  return value
    .toExponential(digits - 1)
    .replace('e', '×10^')
    .replace('+', '');
}

/** An uncertainty to `digits` significant digits, trailing zeros kept ("0.10", "0.0050"). */
export function formatUncertainty(value: number, digits = 2): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-4 && magnitude < 1e7) return value.toPrecision(digits).replace(/e\+?(-?\d+)$/, '×10^$1');
  return value
    .toExponential(digits - 1)
    .replace('e', '×10^')
    .replace('+', '');
}

/** "0.36 %" for 0.0036. */
export function formatPercent(fraction: number, digits = 2): string {
  return `${formatSignificant(fraction * 100, digits)} %`;
}
