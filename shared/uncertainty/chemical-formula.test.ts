import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseAtomicWeightTable, standardAtomicWeights } from './atomic-weights';
import { molarMass, parseFormula } from './chemical-formula';
import { PlanError } from './plan-error';

const handbook = JSON.parse(
  readFileSync(new URL('../../tests/fixtures/engine/handbook-molar-masses.json', import.meta.url), 'utf8'),
) as {
  cases: { formula: string; molarMassGPerMol: number; printedDecimals: number; note?: string }[];
};

describe('formula parsing', () => {
  it('reads parentheses, brackets and hydrates', () => {
    expect(Object.fromEntries(parseFormula('Pb(NO3)2'))).toEqual({ Pb: 1, N: 2, O: 6 });
    expect(Object.fromEntries(parseFormula('CuSO4·5H2O'))).toEqual({ Cu: 1, S: 1, O: 9, H: 10 });
    expect(Object.fromEntries(parseFormula('K3[Fe(CN)6]'))).toEqual({ K: 3, Fe: 1, C: 6, N: 6 });
    expect(Object.fromEntries(parseFormula('Na2CO3.10H2O'))).toEqual({ Na: 2, C: 1, O: 13, H: 20 });
  });

  it('rejects unknown elements and unbalanced parentheses with the field path', () => {
    expect(() => parseFormula('Xx2O', ['steps', 0, 'material', 'formula'])).toThrow(PlanError);
    try {
      parseFormula('Pq(NO3)2', ['steps', 0, 'material', 'formula']);
      expect.unreachable();
    } catch (error) {
      expect((error as PlanError).path).toEqual(['steps', 0, 'material', 'formula']);
      expect((error as PlanError).message).toContain('Pq');
    }
    expect(() => parseFormula('Pb(NO3')).toThrow(/unclosed/);
    expect(() => parseFormula('PbNO3)2')).toThrow(/closing/);
  });
});

describe('formulas with brackets that do not balance (common practice)', () => {
  it.each([
    ['Pb(NO3', /unclosed parenthesis/],
    ['Pb NO3)2', /closing parenthesis without an opening one/],
    ['K3[Fe(CN)6)', /unclosed "\["/],
    ['Pb(NO3]2', /unclosed "\("/],
  ])('refuses %s', (formula, message) => {
    expect(() => parseFormula(formula)).toThrow(message);
  });
});

describe('a 0 typed for the letter O (rules in formula-zero-check.ts; common practice)', () => {
  // "K2Cr207" read as Cr × 207 gives M = 10841 g/mol, 37 times K2Cr2O7 (294.18 g/mol, CIAAW 2021).
  it.each([
    ['K2Cr207', /reads as 207 atoms of Cr.*Did you mean "K2Cr2O7"\?/],
    ['Na2S203', /reads as 203 atoms of S.*Did you mean "Na2S2O3"\?/],
    ['H20', /reads as 20 atoms of H and nothing else.*Did you mean "H2O"\?/],
    ['H202', /Did you mean "H2O2"\?/],
    ['Fe203·H20', /Did you mean "Fe2O3·H2O"\?/],
    ['KMn04', /count "04" after Mn.*Did you mean "KMnO4"\?/],
    ['Pb(N03)2', /Did you mean "Pb\(NO3\)2"\?/],
    ['Ca0', /count of 0 after Ca.*Did you mean "CaO"\?/],
    ['Na2B4O7·10H20', /Did you mean "Na2B4O7·10H2O"\?/],
  ])('refuses %s and suggests the O reading', (formula, message) => {
    expect(() => parseFormula(formula)).toThrow(message);
  });

  it('refuses a count of 0 after a bracket without suggesting an O there', () => {
    expect(() => parseFormula('Pb(NO3)0')).toThrow(/count of 0 after the bracketed group/);
    expect(() => parseFormula('Pb(NO3)0')).not.toThrow(/Did you mean/);
  });

  // Real formulas with zeros in their counts stay readable: fullerenes, long alkanes (C18H38, C20H42, hectane
  // C100H202 whose "202" would read as "2O2" only beside a count of 100), borax decahydrate (CIAAW 2021 masses).
  it.each([
    ['C60', 720.64],
    ['C70', 840.74],
    ['C18H38', 254.49],
    ['C20H42', 282.55],
    ['C100H202', 1404.67],
    ['Na2B4O7·10H2O', 381.38],
    ['(NH4)2SO4', 132.14],
  ])('reads %s (M ≈ %f g/mol)', (formula, expected) => {
    expect(molarMass(formula).valueGPerMol).toBeCloseTo(expected, 2);
  });
});

describe('molar masses', () => {
  // Handbook values (see the fixture for the source of each); they are printed to `printedDecimals`
  // and computed from older or abridged atomic weights, so the tolerance is one unit of the last printed
  // digit, widened to 2·u(M) where our CIAAW 2021 u(M) is larger (Pb, whose interval is wide).
  it('reads the five handbook cases (so the checks below are not vacuous)', () => {
    expect(handbook.cases).toHaveLength(5);
  });
  it.each(handbook.cases)('$formula ≈ $molarMassGPerMol g/mol', ({ formula, molarMassGPerMol, printedDecimals }) => {
    const result = molarMass(formula);
    const tolerance = Math.max(10 ** -printedDecimals, 2 * result.standardUncertaintyGPerMol);
    expect(Math.abs(result.valueGPerMol - molarMassGPerMol)).toBeLessThanOrEqual(tolerance);
  });

  // CIAAW 2021 Table 1 lists Pb as the interval [206.14, 207.94]: midpoint 207.04, u = 1.80/(2√3) = 0.5196
  // (the interval as a rectangular distribution: van der Veen et al., IUPAC Technical Report, Pure Appl. Chem. 93 (2021) 629; from memory).
  it('uses the CIAAW 2021 interval midpoint and (b − a)/(2√3) for lead', () => {
    expect(standardAtomicWeights.Pb.value).toBeCloseTo(207.04, 10);
    expect(standardAtomicWeights.Pb.halfWidth / Math.sqrt(3)).toBeCloseTo(0.5196, 4);
    expect(standardAtomicWeights.Se).toEqual({ value: 78.971, halfWidth: 0.008 }); // CIAAW 2021: 78.971(8)
    expect(standardAtomicWeights.Na.halfWidth).toBeCloseTo(2e-8, 20); // 22.98976928(2)
  });

  // EURACHEM/CITAC CG4 3rd ed., Example A2 (standardising NaOH), molar mass of KHP C8H5O4K with the guide's
  // atomic weights C 12.0107(8), H 1.00794(7), O 15.9994(3), K 39.0983(1), each rectangular:
  // M = 204.2212 g/mol, u(M) = 0.0038 g/mol (from memory). Tolerance: half a unit of the guide's last digit.
  it('reproduces EURACHEM/CITAC CG4 3rd ed. Appendix A, Example A2: M(KHP) = 204.2212 g/mol, u = 0.0038 g/mol', () => {
    const guideTable = parseAtomicWeightTable('C 12.0107(8); H 1.00794(7); O 15.9994(3); K 39.0983(1)');
    const result = molarMass('C8H5O4K', guideTable);
    expect(Math.abs(result.valueGPerMol - 204.2212)).toBeLessThanOrEqual(0.00005);
    expect(Math.abs(result.standardUncertaintyGPerMol - 0.0038)).toBeLessThanOrEqual(0.00005);
  });
});
