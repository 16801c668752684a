import { describe, expect, it } from 'vitest';
import { parseDecimalInput } from './parse-decimal-input';

describe('parseDecimalInput', () => {
  it('accepts a decimal point or a decimal comma', () => {
    expect(parseDecimalInput('0.06')).toBe(0.06);
    expect(parseDecimalInput(' 0,06 ')).toBe(0.06);
    expect(parseDecimalInput('50')).toBe(50);
    expect(parseDecimalInput('2.5e-6')).toBe(2.5e-6);
    expect(parseDecimalInput('-3,5')).toBe(-3.5);
  });

  it('gives null for an empty box and keeps numbers already parsed', () => {
    expect(parseDecimalInput('')).toBeNull();
    expect(parseDecimalInput('   ')).toBeNull();
    expect(parseDecimalInput(20)).toBe(20);
  });

  it('gives NaN for text that is not one number, so the form says so', () => {
    for (const text of ['zero point one', '1,000.5', '0.06 mL', '1.2.3', ','])
      expect(parseDecimalInput(text)).toBeNaN();
  });
});
