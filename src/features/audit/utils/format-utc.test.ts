import { describe, expect, it } from 'vitest';
import { formatUtc } from './format-utc';

describe('formatUtc', () => {
  it('states the instant in UTC whatever the reader’s zone', () => {
    expect(formatUtc('2026-03-04T09:15:02.123Z')).toBe('2026-03-04 09:15:02 UTC');
    // 23:30 at UTC−05:00 is 04:30 the next day in UTC.
    expect(formatUtc('2026-12-31T23:30:00-05:00')).toBe('2027-01-01 04:30:00 UTC');
  });

  it('keeps text that is not a time as it is', () => {
    expect(formatUtc('yesterday')).toBe('yesterday');
  });
});
