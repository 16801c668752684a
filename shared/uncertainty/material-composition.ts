import { atomicWeightOf, standardAtomicWeights, type AtomicWeightTable } from './atomic-weights';
import { parseFormula } from './chemical-formula';
import { analyteCountIn } from './composition-nodes';
import { PlanError } from './plan-error';

/** What a material's formula says about it: its molar mass and how much of it is the analyte. */
export interface MaterialComposition {
  /** M = Σ nᵢ·Aᵢ, g/mol. */
  molarMassGPerMol: number;
  /** Largest difference the atomic weights' half-widths allow: Σ nᵢ·aᵢ, g/mol (0.90 per Pb for CIAAW 2021's interval). */
  molarMassSpanGPerMol: number;
  /** Analyte units per formula unit, or null when the analyte is not (a whole number of times) in the formula. */
  analyteCount: number | null;
  /** w = n·M(analyte)/M(compound), g/g, or null as for analyteCount. */
  analyteMassFraction: number | null;
}

/** An element's atomic weight for one lot, from the material's certificate (g/mol). */
export interface LotAtomicWeight {
  element: string;
  valueGPerMol: number;
}

/**
 * Molar mass of a material and the analyte's mass fraction in it, w = n·M(analyte)/M(compound), with the
 * CIAAW 2021 standard atomic weights (an interval's midpoint) or an element's lot value from the certificate.
 * The one computation the library and the planner show while a formula is typed.
 * @throws PlanError for a formula the engine cannot read
 * @example materialComposition('Pb(NO3)2', 'Pb').analyteMassFraction // 0.62540 (207.04/331.05)
 */
export function materialComposition(
  formula: string,
  analyte: string,
  lot?: LotAtomicWeight,
  table: AtomicWeightTable = standardAtomicWeights,
): MaterialComposition {
  const weights: AtomicWeightTable =
    lot === undefined ? table : { ...table, [lot.element]: { value: lot.valueGPerMol, halfWidth: 0 } };
  const compound = parseFormula(formula, ['formula'], weights);
  const massOf = (composition: ReadonlyMap<string, number>) =>
    [...composition].reduce((sum, [symbol, count]) => sum + count * atomicWeightOf(symbol, [], weights).value, 0);
  const molarMassGPerMol = massOf(compound);
  const molarMassSpanGPerMol = [...compound].reduce(
    (sum, [symbol, count]) => sum + count * atomicWeightOf(symbol, [], weights).halfWidth,
    0,
  );
  const analyteComposition = readOrNull(() => parseFormula(analyte, ['analyte'], weights));
  const analyteCount =
    analyteComposition === null ? null : readOrNull(() => analyteCountIn(compound, analyteComposition, undefined, []));
  return {
    molarMassGPerMol,
    molarMassSpanGPerMol,
    analyteCount,
    analyteMassFraction:
      analyteComposition === null || analyteCount === null
        ? null
        : (analyteCount * massOf(analyteComposition)) / molarMassGPerMol,
  };
}

/** Relative difference above which a certificate's molar mass and the formula's disagree (0.05 %; common practice). */
export const MOLAR_MASS_AGREEMENT = 0.0005;

/**
 * Whether the formula's molar mass agrees with the certificate's: within 0.05 %, or within the span the standard
 * atomic weights allow where that is wider (a lead compound's molar mass may lie anywhere in Pb's CIAAW interval).
 * Returns the allowed difference and the difference found, in g/mol.
 */
export function molarMassAgreement(
  composition: MaterialComposition,
  certificateGPerMol: number,
): { agrees: boolean; differenceGPerMol: number; allowedGPerMol: number } {
  const differenceGPerMol = Math.abs(composition.molarMassGPerMol - certificateGPerMol);
  const allowedGPerMol = Math.max(
    MOLAR_MASS_AGREEMENT * composition.molarMassGPerMol,
    composition.molarMassSpanGPerMol,
  );
  return { agrees: differenceGPerMol <= allowedGPerMol, differenceGPerMol, allowedGPerMol };
}

function readOrNull<T>(read: () => T): T | null {
  try {
    return read();
  } catch (error) {
    if (error instanceof PlanError) return null;
    throw error;
  }
}
