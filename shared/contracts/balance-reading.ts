/**
 * A mass as the balance shows it, to its scale interval d: 0.16 g on a d = 0.00001 g balance reads "0.16000".
 * With no readability known, four decimals.
 *
 * @example formatToReadability(0.1599, 0.00001) // "0.15990"
 */
export function formatToReadability(massG: number, readabilityG: number): string {
  const decimals = readabilityG > 0 ? Math.max(0, Math.round(-Math.log10(readabilityG))) : 4;
  return massG.toFixed(decimals);
}
