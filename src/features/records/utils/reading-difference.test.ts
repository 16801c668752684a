import { describe, expect, it } from 'vitest';
import { massDifference } from './reading-difference';

describe('massDifference', () => {
  it('gives the difference in mg to the balance readability and in per cent of the planned mass', () => {
    // 0.16020 g weighed for 0.15990 g planned: +0.30 mg, 0.30/159.90 = 0.1876 % → +0.19 % (arithmetic).
    expect(massDifference(0.1599, 0.1602, 0.00001)).toEqual({ mg: '+0.30', percent: '+0.19' });
    // A 0.1 mg balance reads to one decimal of a milligram: −1.2 mg of 2.5 g is −0.048 %.
    expect(massDifference(2.5, 2.4988, 0.0001)).toEqual({ mg: '−1.2', percent: '−0.048' });
    // A 0.01 g balance: whole milligrams.
    expect(massDifference(100, 100.23, 0.01)).toEqual({ mg: '+230', percent: '+0.23' });
  });

  it('says 0 when the mass weighed is the planned one, without a sign or floating-point dust', () => {
    expect(massDifference(0.1599, 0.1599, 0.00001)).toEqual({ mg: '0.00', percent: '0' });
    // 0.1 + 0.2 − 0.3 is 5.6e-17 g in binary floating point; it reads as zero.
    expect(massDifference(0.3, 0.1 + 0.2)).toEqual({ mg: '0.00', percent: '0' });
  });

  it('keeps large differences in plain figures', () => {
    // 0.2 g weighed for 0.16 g planned: +25 % (arithmetic), not "2.5e+1".
    expect(massDifference(0.16, 0.2, 0.00001)).toEqual({ mg: '+40.00', percent: '+25' });
  });

  it('falls back to 0.01 mg when the readability is unknown', () => {
    expect(massDifference(1, 1.00001)).toEqual({ mg: '+0.01', percent: '+0.0010' });
  });
});
