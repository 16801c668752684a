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
  return `${valueGPerMol.toPrecision(5)} g/mol`;
}

/** "M = 331.05 g/mol; Pb is 0.6254 g/g of it", or null when the formula cannot be read. */
export function compositionText(formula: string, analyte: string, lot?: LotAtomicWeight): string | null {
  const composition = readComposition(formula, analyte, lot);
  if (composition === null) return null;
  const fraction =
    composition.analyteMassFraction === null
      ? ''
      : `; ${analyte.trim()} is ${composition.analyteMassFraction.toPrecision(4)} g/g of it`;
  return `M = ${molarMassText(composition.molarMassGPerMol)}${fraction}`;
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
