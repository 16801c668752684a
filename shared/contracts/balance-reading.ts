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

/**
 * A mass recorded at a step, as its balance shows it: the record page and the PDF print readings through this one
 * function, so they agree to the last digit. A step without a balance gives four decimals.
 */
export function stepMassText(massG: number, step: object | undefined): string {
  return formatToReadability(massG, stepReadabilityG(step) ?? 0);
}

/** The readability d (g) of a computed step's balance; undefined for a step without one. */
export function stepReadabilityG(step: object | undefined): number | undefined {
  const balance = step && 'balance' in step ? (step.balance as { readabilityG?: unknown }) : undefined;
  return typeof balance?.readabilityG === 'number' ? balance.readabilityG : undefined;
}

/**
 * A balance's USP <41> minimum weight as every screen, warning and PDF prints it: three significant figures,
 * trailing zeros kept ("0.160 g"), so the library and the warning beside a step state the same number.
 */
export function minimumWeightText(minimumWeightG: number): string {
  return `${minimumWeightG.toPrecision(3)} g`;
}
