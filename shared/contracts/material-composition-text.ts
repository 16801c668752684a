import {
  materialComposition,
  molarMassAgreement,
  type LotAtomicWeight,
  type MaterialComposition,
} from '../uncertainty/material-composition';
import { PlanError } from '../uncertainty/plan-error';

/**
 * How a material's molar mass and analyte mass fraction are printed (library, planner): 5 significant digits for
 * M in g/mol (CIAAW 2021 weights give M to at least that), 4 for the mass fraction ("Pb: 0.6254 g/g").
 */
export function molarMassText(valueGPerMol: number): string {
  return `${molarMassFigures(valueGPerMol)} g/mol`;
}

/** The figures of a molar mass without its unit, for a column headed "(g/mol)": "331.05". */
export function molarMassFigures(valueGPerMol: number): string {
  return valueGPerMol.toPrecision(5);
}

/** The molar mass a solid material's library data give (with its lot's atomic weight), or undefined. */
export function molarMassOf(data: Record<string, unknown>): number | undefined {
  const summary = readComposition(typeof data.formula === 'string' ? data.formula : '', '', lotOf(data));
  return summary?.molarMassGPerMol;
}

/**
 * What the library and the planner show while a formula is typed: "M = 331.05 g/mol; Pb is 0.6254 g/g of it", the
 * engine's words when the formula cannot be read, or null while it is empty. `lot`: the analyte's atomic weight
 * from the lot's certificate, when the library holds one.
 */
export function compositionSummary(
  formula: string,
  analyte: string,
  lot?: LotAtomicWeight,
): { text: string } | { problem: string } | null {
  if (formula.trim() === '') return null;
  try {
    const composition = materialComposition(formula, analyte, lot);
    const fraction =
      composition.analyteMassFraction === null
        ? ''
        : `; ${analyte.trim()} is ${composition.analyteMassFraction.toPrecision(4)} g/g of it`;
    return { text: `M = ${molarMassText(composition.molarMassGPerMol)}${fraction}` };
  } catch (error) {
    if (error instanceof PlanError) return { problem: error.message };
    throw error;
  }
}

/** compositionSummary of a solid material's library data, for the plan's analyte when given (else the material's). */
export function compositionSummaryOf(
  data: Record<string, unknown>,
  analyte?: string,
): { text: string } | { problem: string } | null {
  const materialAnalyte = typeof data.analyte === 'string' ? data.analyte.trim() : '';
  return compositionSummary(
    typeof data.formula === 'string' ? data.formula : '',
    analyte ?? materialAnalyte,
    lotOf(data),
  );
}

/** The lot's atomic weight of the material's analyte in its library data, when QA entered one. */
function lotOf(data: Record<string, unknown>): LotAtomicWeight | undefined {
  const element = typeof data.analyte === 'string' ? data.analyte.trim() : '';
  const atomicWeight = data.analyteAtomicWeightGPerMol;
  return typeof atomicWeight === 'number' && /^[A-Z][a-z]?$/.test(element)
    ? { element, valueGPerMol: atomicWeight }
    : undefined;
}

/**
 * The words refusing a certificate molar mass the formula does not give, naming both numbers; null when they agree
 * (within 0.05 %, or the span of the standard atomic weights where wider) or the formula cannot be read.
 */
export function molarMassDisagreement(
  formula: string,
  certificateGPerMol: number,
  lot?: LotAtomicWeight,
): string | null {
  const composition = readComposition(formula, '', lot);
  if (composition === null) return null;
  const { agrees, differenceGPerMol, allowedGPerMol } = molarMassAgreement(composition, certificateGPerMol);
  if (agrees) return null;
  const percent = (value: number) => `${((100 * value) / composition.molarMassGPerMol).toPrecision(2)} %`;
  return `The formula ${formula.trim()} gives ${molarMassText(composition.molarMassGPerMol)} but the certificate states ${molarMassText(certificateGPerMol)}: they differ by ${percent(differenceGPerMol)}, more than the ${percent(allowedGPerMol)} allowed. Check the formula (a hydrate, a count) and the value.`;
}

function readComposition(formula: string, analyte: string, lot?: LotAtomicWeight): MaterialComposition | null {
  try {
    return materialComposition(formula, analyte, lot);
  } catch (error) {
    if (error instanceof PlanError) return null;
    throw error;
  }
}
