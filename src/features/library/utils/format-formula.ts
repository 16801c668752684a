const SUBSCRIPT_DIGITS = '₀₁₂₃₄₅₆₇₈₉';

/** A formula as typed (Pb(NO3)2) with its counts as subscripts, as chemists write it: Pb(NO₃)₂. */
export function formatFormula(formula: string): string {
  return formula.replace(/(?<=[A-Za-z)\]])\d+/g, (digits) =>
    [...digits].map((digit) => SUBSCRIPT_DIGITS[Number(digit)]).join(''),
  );
}
