/** A value and its uncertainty rounded for a report. */
export interface RoundedResult {
  value: number;
  uncertainty: number;
  /** Decimal places kept (negative when rounding to tens, hundreds…). */
  decimals: number;
  valueText: string;
  uncertaintyText: string;
}

/**
 * Rounds an uncertainty to `significantDigits` significant digits (two by default, JCGM 100:2008 7.2.6)
 * and the value to the same decimal place, rounding half away from zero.
 * decimals = significantDigits − 1 − ⌊log₁₀ u⌋.
 * @example roundToUncertainty(1002.6997, 1.6706) // { value: 1002.7, uncertainty: 1.7, decimals: 1, valueText: '1002.7', uncertaintyText: '1.7' }
 */
export function roundToUncertainty(value: number, uncertainty: number, significantDigits = 2): RoundedResult {
  if (!(uncertainty > 0) || !Number.isFinite(uncertainty)) {
    return { value, uncertainty, decimals: 0, valueText: String(value), uncertaintyText: String(uncertainty) };
  }
  let decimals = significantDigits - 1 - Math.floor(Math.log10(uncertainty));
  let roundedUncertainty = roundToDecimals(uncertainty, decimals);
  // 0.0996 to two digits is 0.10: one digit fewer after rounding up past a power of ten.
  if (roundedUncertainty >= 10 ** (significantDigits - decimals)) {
    decimals -= 1;
    roundedUncertainty = roundToDecimals(uncertainty, decimals);
  }
  const roundedValue = roundToDecimals(value, decimals);
  const places = Math.max(decimals, 0);
  return {
    value: roundedValue,
    uncertainty: roundedUncertainty,
    decimals,
    valueText: roundedValue.toFixed(places),
    uncertaintyText: roundedUncertainty.toFixed(places),
  };
}

/** A value and a coverage interval rounded for a report. */
export interface RoundedInterval {
  decimals: number;
  valueText: string;
  lowText: string;
  highText: string;
}

/**
 * Rounds a value and a coverage interval [low, high] for a report: the half-width (high − low)/2 sets the decimal
 * place as an expanded uncertainty does (roundToUncertainty, JCGM 100:2008 7.2.6), and the value and both ends are
 * rounded to it, half away from zero.
 * @example roundIntervalToUncertainty(10.0123, { low: 9.95812, high: 10.06634 }) // { decimals: 3, valueText: '10.012', lowText: '9.958', highText: '10.066' }
 */
export function roundIntervalToUncertainty(
  value: number,
  interval: { low: number; high: number },
  significantDigits = 2,
): RoundedInterval {
  const halfWidth = (interval.high - interval.low) / 2;
  const rounded = roundToUncertainty(value, halfWidth, significantDigits);
  // A zero or non-finite width has no decimal place to round to: the ends print as they are.
  const end = (bound: number) =>
    halfWidth > 0 && Number.isFinite(halfWidth)
      ? roundToDecimals(bound, rounded.decimals).toFixed(Math.max(rounded.decimals, 0))
      : String(bound);
  return {
    decimals: rounded.decimals,
    valueText: rounded.valueText,
    lowText: end(interval.low),
    highText: end(interval.high),
  };
}

function roundToDecimals(value: number, decimals: number): number {
  const factor = 10 ** Math.abs(decimals);
  const scaled = decimals >= 0 ? value * factor : value / factor;
  // Nudge by a few ulps so that 2.675 (stored as 2.67499999…) still rounds to 2.68.
  const rounded = Math.sign(scaled) * Math.round(Math.abs(scaled) * (1 + 4 * Number.EPSILON));
  return decimals >= 0 ? rounded / factor : rounded * factor;
}

/**
 * The sentence that states a result, e.g.
 * "c(Pb) = (10.012 ± 0.054) mg/L at 20 °C, k = 2.00, coverage probability ≈ 95.45 %".
 * The expanded uncertainty is rounded to two significant digits and the value to match; a quantity per volume
 * names the reference temperature it is stated at.
 */
export function formatResultStatement(input: {
  measurand: string;
  value: number;
  expandedUncertainty: number;
  unit: string;
  coverageFactor: number;
  coverageProbability: number;
  referenceTemperatureC?: number;
}): string {
  const rounded = roundToUncertainty(input.value, input.expandedUncertainty);
  const percent = (input.coverageProbability * 100).toFixed(2);
  const temperature = input.referenceTemperatureC === undefined ? '' : ` at ${input.referenceTemperatureC} °C`;
  return `${input.measurand} = (${rounded.valueText} ± ${rounded.uncertaintyText}) ${input.unit}${temperature}, k = ${input.coverageFactor.toFixed(2)}, coverage probability ≈ ${percent} %`;
}

/**
 * A figure of the GUM-against-Monte-Carlo comparison (end differences, the numerical tolerance δ), to two
 * significant digits without trailing zeros, so δ = ½·10^ℓ (JCGM 101:2008 7.9.2) reads as the exact 0.005 it is;
 * without exponent for everyday magnitudes. The verdict and the result statement's reason both print with it.
 * @example verdictFigure(0.005) // '0.005'
 * @example verdictFigure(0.00712) // '0.0071'
 */
export function verdictFigure(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-4 && magnitude < 1e6) return Number(value.toPrecision(2)).toString();
  return value.toExponential(1).replace('e', ' × 10^');
}
