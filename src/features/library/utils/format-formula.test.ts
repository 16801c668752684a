import { describe, expect, it } from 'vitest';
import { formatFormula } from './format-formula';

describe('formatFormula', () => {
  it('writes the counts after an element or a bracket as subscripts', () => {
    expect(formatFormula('Pb(NO3)2')).toBe('Pb(NO₃)₂');
    expect(formatFormula('K2Cr2O7')).toBe('K₂Cr₂O₇');
    expect(formatFormula('C12H22O11')).toBe('C₁₂H₂₂O₁₁');
  });

  it('leaves a leading count (hydrate water) and plain text alone', () => {
    expect(formatFormula('CuSO4·5H2O')).toBe('CuSO₄·5H₂O');
    expect(formatFormula('NaCl')).toBe('NaCl');
  });
});
