import { PlanError, type PlanPathSegment } from './plan-error';

/**
 * An atomic weight as the engine uses it: best estimate and the half-width of a rectangular
 * distribution around it (standard uncertainty halfWidth/√3).
 */
export interface AtomicWeight {
  value: number;
  halfWidth: number;
}

export type AtomicWeightTable = Readonly<Record<string, AtomicWeight>>;

/*
 * Source: CIAAW standard atomic weights 2021 (Prohaska et al., Pure Appl. Chem. 94 (2022) 573–600, Table 1).
 * An interval [a, b] is used as (a + b)/2 with rectangular half-width (b − a)/2, i.e. u = (b − a)/(2√3)
 * (van der Veen et al., Pure Appl. Chem. 93 (2021) 629; Possolo et al., Pure Appl. Chem. 90 (2018) 395, from memory:
 * Pb [206.14, 207.94] → 207.04 with half-width 0.90, u = 0.52); a value with its uncertainty in parentheses is taken as
 * rectangular with that half-width (EURACHEM/CITAC CG4 practice).
 */

/** CIAAW 2021 Table 1 in its own notation; elements without a standard atomic weight are left out. */
const ciaaw2021 = `
H [1.00784,1.00811]; He 4.002602(2); Li [6.938,6.997]; Be 9.0121831(5); B [10.806,10.821]; C [12.0096,12.0116];
N [14.00643,14.00728]; O [15.99903,15.99977]; F 18.998403162(5); Ne 20.1797(6); Na 22.98976928(2); Mg [24.304,24.307];
Al 26.9815384(3); Si [28.084,28.086]; P 30.973761998(5); S [32.059,32.076]; Cl [35.446,35.457]; Ar [39.792,39.963];
K 39.0983(1); Ca 40.078(4); Sc 44.955907(4); Ti 47.867(1); V 50.9415(1); Cr 51.9961(6); Mn 54.938043(2); Fe 55.845(2);
Co 58.933194(3); Ni 58.6934(4); Cu 63.546(3); Zn 65.38(2); Ga 69.723(1); Ge 72.630(8); As 74.921595(6); Se 78.971(8);
Br [79.901,79.907]; Kr 83.798(2); Rb 85.4678(3); Sr 87.62(1); Y 88.905838(2); Zr 91.224(2); Nb 92.90637(1); Mo 95.95(1);
Ru 101.07(2); Rh 102.90549(2); Pd 106.42(1); Ag 107.8682(2); Cd 112.414(4); In 114.818(1); Sn 118.710(7); Sb 121.760(1);
Te 127.60(3); I 126.90447(3); Xe 131.293(6); Cs 132.90545196(6); Ba 137.327(7); La 138.90547(7); Ce 140.116(1);
Pr 140.90766(1); Nd 144.242(3); Sm 150.36(2); Eu 151.964(1); Gd 157.25(3); Tb 158.925354(7); Dy 162.500(1);
Ho 164.930329(5); Er 167.259(3); Tm 168.934219(5); Yb 173.045(10); Lu 174.9668(1); Hf 178.486(6); Ta 180.94788(2);
W 183.84(1); Re 186.207(1); Os 190.23(3); Ir 192.217(2); Pt 195.084(9); Au 196.966570(4); Hg 200.592(3);
Tl [204.382,204.385]; Pb [206.14,207.94]; Bi 208.98040(1); Th 232.0377(4); Pa 231.03588(1); U 238.02891(3)`;

/**
 * Reads a table written as in CIAAW publications: `Symbol value(uncertainty in the last digits)` or
 * `Symbol [lower,upper]`, entries separated by semicolons.
 * @example parseAtomicWeightTable('K 39.0983(1); H [1.00784,1.00811]').K // { value: 39.0983, halfWidth: 0.0001 }
 */
export function parseAtomicWeightTable(text: string): AtomicWeightTable {
  const table: Record<string, AtomicWeight> = {};
  for (const entry of text
    .split(';')
    .map((part) => part.trim())
    .filter(Boolean)) {
    const interval = /^([A-Z][a-z]?)\s+\[([\d.]+),\s*([\d.]+)\]$/.exec(entry);
    const bracketed = /^([A-Z][a-z]?)\s+(\d+)\.(\d+)\((\d+)\)$/.exec(entry);
    if (interval) {
      const lower = Number(interval[2]);
      const upper = Number(interval[3]);
      table[interval[1]] = { value: (lower + upper) / 2, halfWidth: (upper - lower) / 2 };
    } else if (bracketed) {
      const decimals = bracketed[3].length;
      table[bracketed[1]] = {
        value: Number(`${bracketed[2]}.${bracketed[3]}`),
        halfWidth: Number(bracketed[4]) * 10 ** -decimals,
      };
    } else {
      throw new RangeError(`Cannot read atomic weight entry "${entry}"`);
    }
  }
  return table;
}

/** The default table: CIAAW 2021 (source above). */
export const standardAtomicWeights: AtomicWeightTable = parseAtomicWeightTable(ciaaw2021);

/** The atomic weight of an element; @throws PlanError for a symbol the table does not hold. */
export function atomicWeightOf(
  symbol: string,
  path: PlanPathSegment[],
  table: AtomicWeightTable = standardAtomicWeights,
): AtomicWeight {
  const weight = table[symbol];
  if (weight === undefined) {
    throw new PlanError(
      path,
      `"${symbol}" is not an element with a standard atomic weight; check the spelling and capitals (e.g. Pb, Cl, Se).`,
    );
  }
  return weight;
}
