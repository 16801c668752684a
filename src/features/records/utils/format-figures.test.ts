import { describe, expect, it } from 'vitest';
import { formatPercentOfVariance, formatSignificant, shortHash } from './format-figures';

describe('record figures', () => {
  it('keeps two significant digits by default', () => {
    expect(formatSignificant(0.0012345)).toBe('0.0012');
    expect(formatSignificant(3.456)).toBe('3.5');
    expect(formatSignificant(0)).toBe('0');
    expect(formatSignificant(1.23e-7)).toBe('1.2 × 10^-7');
  });

  it('writes shares of the variance with one decimal, and tiny shares as < 0.1 %', () => {
    expect(formatPercentOfVariance(62.345)).toBe('62.3 %');
    expect(formatPercentOfVariance(0.01)).toBe('< 0.1 %');
    expect(formatPercentOfVariance(0)).toBe('0.0 %');
  });

  it('shortens a SHA-256 to its first eight and last four characters', () => {
    expect(shortHash('a'.repeat(8) + 'b'.repeat(52) + 'cdef')).toBe('aaaaaaaa…cdef');
  });
});
