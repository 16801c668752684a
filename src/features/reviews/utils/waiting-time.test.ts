import { describe, expect, it } from 'vitest';
import { waitingTimeInWords } from './waiting-time';

describe('waitingTimeInWords', () => {
  it('counts whole hours below a day', () => {
    expect(waitingTimeInWords(0)).toBe('under 1 h');
    expect(waitingTimeInWords(0.99)).toBe('under 1 h');
    expect(waitingTimeInWords(1)).toBe('1 h');
    expect(waitingTimeInWords(3.7)).toBe('3 h');
    expect(waitingTimeInWords(23.99)).toBe('23 h');
  });

  it('counts whole days from 24 h on', () => {
    expect(waitingTimeInWords(24)).toBe('1 day');
    expect(waitingTimeInWords(47.9)).toBe('1 day');
    expect(waitingTimeInWords(48)).toBe('2 days');
    expect(waitingTimeInWords(24 * 9 + 5)).toBe('9 days');
  });

  it('treats a value that is not a number as just submitted', () => {
    expect(waitingTimeInWords(Number.NaN)).toBe('under 1 h');
  });
});
