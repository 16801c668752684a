import { atomicWeightOf, standardAtomicWeights, type AtomicWeightTable } from './atomic-weights';
import { findMistypedZero } from './formula-zero-check';
import { PlanError, type PlanPathSegment } from './plan-error';
import { MAXIMUM_FORMULA_LENGTH, MAXIMUM_FORMULA_NESTING } from './plan-limits';

/** Number of atoms of each element in one formula unit. */
export type Composition = ReadonlyMap<string, number>;

/**
 * Parses a chemical formula into its composition. Understands element symbols, counts,
 * nested parentheses or brackets with a multiplier, and hydrates or adducts joined by
 * `·`, `•`, `.` or `*` with an optional leading count: `Pb(NO3)2`, `CuSO4·5H2O`, `K2Cr2O7`.
 * At most MAXIMUM_FORMULA_LENGTH characters and MAXIMUM_FORMULA_NESTING levels of brackets, checked before
 * reading (the reader recurses once per level). A 0 typed for the letter O ("K2Cr207") is refused with the
 * formula read with an O in its place (rules in formula-zero-check.ts).
 * @throws PlanError for an unknown element, unbalanced brackets, a mistyped zero, or a formula beyond those caps
 * @example parseFormula('CuSO4·5H2O') // Map { Cu → 1, S → 1, O → 9, H → 10 }
 */
export function parseFormula(
  formula: string,
  path: PlanPathSegment[] = ['formula'],
  table: AtomicWeightTable = standardAtomicWeights,
): Composition {
  const text = formula.replace(/\s+/g, '');
  if (text.length === 0) throw new PlanError(path, 'The formula is empty.');
  if (text.length > MAXIMUM_FORMULA_LENGTH) {
    throw new PlanError(
      path,
      `A formula can have at most ${MAXIMUM_FORMULA_LENGTH} characters; this one has ${text.length}.`,
    );
  }
  if (nestingDepth(text) > MAXIMUM_FORMULA_NESTING) {
    throw new PlanError(
      path,
      `"${text}" nests brackets more than ${MAXIMUM_FORMULA_NESTING} deep; a formula can nest them at most ${MAXIMUM_FORMULA_NESTING} levels.`,
    );
  }
  const mistyped = findMistypedZero(text);
  if (mistyped) {
    throw new PlanError(
      path,
      `"${text}" ${mistyped.problem}; a 0 was probably typed for the letter O.${suggestion(mistyped.corrected, table)}`,
    );
  }
  const total = new Map<string, number>();
  for (const part of text.split(/[·•.*]/)) {
    if (part.length === 0) throw new PlanError(path, `"${formula}" has an empty part around a hydrate dot.`);
    const leading = /^(\d+)(.*)$/.exec(part);
    const multiplier = leading ? Number(leading[1]) : 1;
    const body = leading ? leading[2] : part;
    const { composition, end } = parseGroup(body, 0, formula, path, table);
    if (end !== body.length)
      throw new PlanError(path, `"${formula}" has a closing parenthesis without an opening one.`);
    for (const [symbol, count] of composition) total.set(symbol, (total.get(symbol) ?? 0) + count * multiplier);
  }
  return total;
}

/** ' Did you mean "K2Cr2O7"?' when the text with every mistyped 0 read as O is a formula; else nothing. */
function suggestion(corrected: string | undefined, table: AtomicWeightTable): string {
  let candidate = corrected;
  for (let round = 0; candidate !== undefined && round < MAXIMUM_FORMULA_LENGTH; round += 1) {
    const next = findMistypedZero(candidate);
    if (next === undefined) break;
    candidate = next.corrected;
  }
  if (candidate === undefined) return '';
  try {
    parseFormula(candidate, [], table);
    return ` Did you mean "${candidate}"?`;
  } catch {
    return '';
  }
}

/** Deepest level of brackets, counted in one pass (unbalanced brackets are reported by the reader). */
function nestingDepth(text: string): number {
  let depth = 0;
  let deepest = 0;
  for (const character of text) {
    if (character === '(' || character === '[') deepest = Math.max(deepest, (depth += 1));
    else if (character === ')' || character === ']') depth -= 1;
  }
  return deepest;
}

function parseGroup(
  text: string,
  start: number,
  formula: string,
  path: PlanPathSegment[],
  table: AtomicWeightTable,
): { composition: Map<string, number>; end: number } {
  const composition = new Map<string, number>();
  let position = start;
  const readCount = () => {
    const match = /^\d+/.exec(text.slice(position));
    if (!match) return 1;
    position += match[0].length;
    return Number(match[0]);
  };
  while (position < text.length) {
    const character = text[position];
    if (character === '(' || character === '[') {
      const inner = parseGroup(text, position + 1, formula, path, table);
      const closing = text[inner.end];
      if (closing !== (character === '(' ? ')' : ']'))
        throw new PlanError(path, `"${formula}" has an unclosed "${character}".`);
      position = inner.end + 1;
      const count = readCount();
      for (const [symbol, atoms] of inner.composition)
        composition.set(symbol, (composition.get(symbol) ?? 0) + atoms * count);
    } else if (character === ')' || character === ']') {
      return { composition, end: position };
    } else {
      const match = /^[A-Z][a-z]?/.exec(text.slice(position));
      if (!match)
        throw new PlanError(
          path,
          `"${formula}" cannot be read at "${text.slice(position)}"; write element symbols with a capital first letter.`,
        );
      atomicWeightOf(match[0], path, table);
      position += match[0].length;
      const count = readCount();
      composition.set(match[0], (composition.get(match[0]) ?? 0) + count);
    }
  }
  if (start > 0) throw new PlanError(path, `"${formula}" has an unclosed parenthesis.`);
  return { composition, end: position };
}

/** Molar mass with its standard uncertainty. */
export interface MolarMass {
  valueGPerMol: number;
  standardUncertaintyGPerMol: number;
  composition: Composition;
}

/**
 * Molar mass M = Σ nᵢ·Aᵢ (g/mol) with u(M) = √Σ (nᵢ·u(Aᵢ))², u(Aᵢ) = halfWidthᵢ/√3 (rectangular),
 * the atomic weights of different elements independent (EURACHEM/CITAC CG4 3rd ed. Example A2).
 * @throws PlanError for an unknown element
 * @example molarMass('NaCl').valueGPerMol // 58.44127
 */
export function molarMass(
  formula: string,
  table: AtomicWeightTable = standardAtomicWeights,
  path: PlanPathSegment[] = ['formula'],
): MolarMass {
  const composition = parseFormula(formula, path, table);
  let value = 0;
  let variance = 0;
  for (const [symbol, count] of composition) {
    const weight = atomicWeightOf(symbol, path, table);
    value += count * weight.value;
    variance += ((count * weight.halfWidth) / Math.sqrt(3)) ** 2;
  }
  return { valueGPerMol: value, standardUncertaintyGPerMol: Math.sqrt(variance), composition };
}
