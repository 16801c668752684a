import { PlanError, type PlanPathSegment } from './plan-error';

/** How much of something a step holds, as the plan states it: a volume (mL) or a mass (g). */
export type Amount = { unit: 'mL' | 'g'; value: number };

/** Two amounts equal to this relative tolerance are one amount (binary remainders of typed decimals). */
const RELATIVE_TOLERANCE = 1e-9;

/** An amount as the plan states it, without binary remainders: 0.30000000000000004 → "0.3". */
const stated = (value: number) => String(Number(value.toPrecision(10)));
/** A converted amount or a density, to four significant digits: 24.95508… → "24.96". */
const figure = (value: number) => String(Number(value.toPrecision(4)));

/** The amount in the other unit, through the solution's density (g/mL). */
function convert(amount: Amount, unit: Amount['unit'], densityGPerMl: number): number {
  if (amount.unit === unit) return amount.value;
  return unit === 'g' ? amount.value * densityGPerMl : amount.value / densityGPerMl;
}

/** "25 g" or, when it must be compared in another unit, "25 g, about 25.04 mL at 0.9982 g/mL". */
function described(amount: Amount, comparedIn: Amount['unit'], densityGPerMl: number): string {
  const asStated = `${stated(amount.value)} ${amount.unit}`;
  if (amount.unit === comparedIn) return asStated;
  return `${asStated}, about ${figure(convert(amount, comparedIn, densityGPerMl))} ${comparedIn} at ${figure(densityGPerMl)} g/mL`;
}

/**
 * Refuses an aliquot that is not smaller than the solution it is drawn from (common practice: a pipette or a
 * weighing bottle cannot take all of a solution, let alone more). Volume and mass are compared through the
 * solution's density estimate (water ≈ 1 g/mL). A certified solution (no known amount) is not checked.
 * @throws PlanError at `path`, naming the step and both amounts
 */
export function checkAliquotFromSolution(input: {
  stepIndex: number;
  aliquot: Amount;
  source: { amount: Amount; stepIndex: number } | undefined;
  densityGPerMl: number;
  path: PlanPathSegment[];
}): void {
  const { stepIndex, aliquot, source, densityGPerMl, path } = input;
  if (source === undefined) return;
  const aliquotInSourceUnit = convert(aliquot, source.amount.unit, densityGPerMl);
  if (aliquotInSourceUnit < source.amount.value * (1 - RELATIVE_TOLERANCE)) return;
  const madeUp = source.amount.unit === 'mL' ? 'made up to volume' : 'made up to mass';
  throw new PlanError(
    path,
    `Step ${stepIndex + 1}: the aliquot (${described(aliquot, source.amount.unit, densityGPerMl)}) is not smaller than ` +
      `the solution it is taken from (${stated(source.amount.value)} ${source.amount.unit}, ${madeUp} at step ${source.stepIndex + 1}); ` +
      `take a smaller aliquot, or make up more solution at step ${source.stepIndex + 1}.`,
  );
}

/**
 * Refuses a make-up that holds less than the portion put into it (common practice: a dilution dilutes).
 * To volume: the portion must fit in the flask (an aliquot equal to the flask is accepted, as before).
 * To mass: the final solution mass must exceed the portion's mass.
 * A weighed solid made up to volume is not checked (its volume in solution is not known).
 * @throws PlanError at `path`, naming the step and both amounts
 */
export function checkPortionFitsMakeUp(input: {
  stepIndex: number;
  portion: Amount | undefined;
  /** What was put in: an aliquot of a solution, or the weighed solid itself. */
  portionKind: 'aliquot' | 'solid';
  made: Amount;
  densityGPerMl: number;
  path: PlanPathSegment[];
}): void {
  const { stepIndex, portion, portionKind, made, densityGPerMl, path } = input;
  if (portion === undefined) return;
  const portionWords = portionKind === 'aliquot' ? 'aliquot' : 'weighed solid';
  const smaller = portionKind === 'aliquot' ? 'a smaller aliquot' : 'less of the solid';
  const portionInMadeUnit = convert(portion, made.unit, densityGPerMl);
  const portionText = described(portion, made.unit, densityGPerMl);
  if (made.unit === 'mL') {
    if (portionInMadeUnit <= made.value * (1 + RELATIVE_TOLERANCE)) return;
    throw new PlanError(
      path,
      `Step ${stepIndex + 1}: the ${portionWords} (${portionText}) does not fit in the ${stated(made.value)} mL flask it is to be made up in; ` +
        `choose a larger flask or ${smaller}.`,
    );
  }
  const strictlyLess = portion.unit === 'g';
  const limit = strictlyLess ? made.value * (1 - RELATIVE_TOLERANCE) : made.value * (1 + RELATIVE_TOLERANCE);
  if (strictlyLess ? portionInMadeUnit < limit : portionInMadeUnit <= limit) return;
  throw new PlanError(
    path,
    `Step ${stepIndex + 1}: the final solution mass (${stated(made.value)} g) is not more than the ${portionWords} it is made up from (${portionText}); ` +
      `make up to a larger mass, or take ${smaller}.`,
  );
}
