/** A signed figure with a true minus sign, and no sign for zero: "+0.30", "−0.30", "0.00". */
function signed(text: string): string {
  if (/^-?0(\.0*)?$/.test(text)) return text.replace('-', '');
  return text.startsWith('-') ? `−${text.slice(1)}` : `+${text}`;
}

/**
 * How far a weighed mass is from the planned one: Δm = m_weighed − m_planned in mg (as text without the unit), to the balance's readability
 * (d = 0.00001 g → 0.01 mg; two decimals when d is not known), and Δm / m_planned in per cent to two significant digits.
 *
 * @example massDifference(0.1599, 0.1602, 0.00001) // { mg: "+0.30", percent: "+0.19" }
 */
export function massDifference(
  plannedG: number,
  weighedG: number,
  readabilityG?: number,
): { mg: string; percent: string } {
  const differenceMg = (weighedG - plannedG) * 1000;
  const decimals = readabilityG && readabilityG > 0 ? Math.max(0, Math.round(-Math.log10(readabilityG)) - 3) : 2;
  const mg = signed(differenceMg.toFixed(decimals));
  const relativePercent = plannedG > 0 ? ((weighedG - plannedG) / plannedG) * 100 : Number.NaN;
  const percent = !Number.isFinite(relativePercent)
    ? '—'
    : mg.replace(/^[+−]/, '') === (0).toFixed(decimals)
      ? '0'
      : signed(
          Math.abs(relativePercent) >= 10
            ? String(Number(relativePercent.toPrecision(2)))
            : relativePercent.toPrecision(2),
        );
  return { mg, percent };
}
