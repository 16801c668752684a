import { PlanError, type PlanPathSegment } from './plan-error';

/** What kind of composition a unit expresses. */
export type UnitDimension = 'massConcentration' | 'amountConcentration' | 'massFraction' | 'molality';

/**
 * Every unit the engine accepts, with its factor to the dimension's base unit
 * (mg/L, mol/L, mg/kg of solution, mol/kg of solvent): value_in_base = value · factorToBase.
 */
export const concentrationUnits = {
  'g/L': { dimension: 'massConcentration', factorToBase: 1e3 },
  'mg/L': { dimension: 'massConcentration', factorToBase: 1 },
  'µg/L': { dimension: 'massConcentration', factorToBase: 1e-3 },
  'ng/L': { dimension: 'massConcentration', factorToBase: 1e-6 },
  'mol/L': { dimension: 'amountConcentration', factorToBase: 1 },
  'mmol/L': { dimension: 'amountConcentration', factorToBase: 1e-3 },
  'µmol/L': { dimension: 'amountConcentration', factorToBase: 1e-6 },
  'g/kg': { dimension: 'massFraction', factorToBase: 1e3 },
  'mg/kg': { dimension: 'massFraction', factorToBase: 1 },
  'µg/kg': { dimension: 'massFraction', factorToBase: 1e-3 },
  'mol/kg': { dimension: 'molality', factorToBase: 1 },
} as const satisfies Record<string, { dimension: UnitDimension; factorToBase: number }>;

export type ConcentrationUnit = keyof typeof concentrationUnits;

export const concentrationUnitNames = Object.keys(concentrationUnits) as [ConcentrationUnit, ...ConcentrationUnit[]];

/**
 * Looks a unit up; the Greek μ (U+03BC) is read as the micro sign µ (U+00B5). Anything else unknown is an error.
 * @throws PlanError
 */
export function unitOf(
  text: string,
  path: PlanPathSegment[],
): (typeof concentrationUnits)[ConcentrationUnit] & { name: ConcentrationUnit } {
  const name = text.replace(/\u03bc/g, '\u00b5');
  if (name in concentrationUnits) {
    const unit = name as ConcentrationUnit;
    return { ...concentrationUnits[unit], name: unit };
  }
  const hint = /^u/.test(name) ? ` Did you mean "µ${name.slice(1)}"?` : '';
  throw new PlanError(path, `Unknown unit "${text}".${hint} Use one of: ${concentrationUnitNames.join(', ')}.`);
}
