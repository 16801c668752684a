import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { GumValidation } from '../uncertainty';
import { snapshotSchema } from './snapshot';
import { VALIDATION_HEADLINES, validationOutcome, validationWords } from './validation-words';

const fixtures = new URL('../../tests/fixtures/', import.meta.url);

// JCGM 101:2008 §8 (from memory): validated when |y − U − y_low| ≤ δ and |y + U − y_high| ≤ δ.
const base: GumValidation = {
  numericalTolerance: 0.005,
  lowEndDifference: 0.0012,
  highEndDifference: 0.0031,
  passed: true,
  significantDigits: 2,
};

describe('the verdict in words (record page and planner)', () => {
  it('confirms, with both differences and δ', () => {
    const validation = { ...base, decided: true, intervalEndTolerance: 0.002 };
    expect(validationOutcome(validation)).toBe('confirmed');
    expect(validationWords(validation, 'mg/L')).toBe(
      'Confirmed: the interval ends differ by 0.0012 mg/L and 0.0031 mg/L, both within the numerical tolerance δ = 0.005 mg/L.',
    );
  });

  it('does not confirm, and says which interval to state', () => {
    const validation = { ...base, highEndDifference: 0.0071, passed: false, decided: true };
    expect(VALIDATION_HEADLINES[validationOutcome(validation)]).toBe('GUM result not confirmed');
    expect(validationWords(validation, 'mg/L')).toMatch(
      /^Not confirmed: .* 0\.0071 mg\/L, more than the numerical tolerance δ = 0\.005 mg\/L\. The result above states the Monte Carlo interval\.$/,
    );
  });

  it('says "not decided" when the trial limit came first, with how well the ends were known', () => {
    const validation = { ...base, passed: false, decided: false, intervalEndTolerance: 0.0041 };
    expect(VALIDATION_HEADLINES[validationOutcome(validation)]).toBe('GUM result not decided');
    const words = validationWords(validation, 'µg/L');
    expect(words).toMatch(
      /^Not decided: after 1 000 000 trials Monte Carlo still knows its interval ends only to within 0\.0041 µg\/L/,
    );
    expect(words).toMatch(/too coarse to judge the GUM interval against the numerical tolerance δ = 0\.005 µg\/L/);
  });

  it('reads a validation stored before the adaptive verdict (no `decided`) as decided', () => {
    const stored = JSON.parse(
      readFileSync(new URL('snapshots/lead-standard-stored-before-typing.json', fixtures), 'utf8'),
    ) as { snapshotJson: string };
    const raw = JSON.parse(stored.snapshotJson) as { validation: Record<string, unknown> };
    expect(raw.validation).not.toHaveProperty('decided');
    const { validation } = snapshotSchema.decode(JSON.parse(stored.snapshotJson));
    expect(validation.decided).toBeUndefined();
    expect(validationOutcome(validation)).toBe(validation.passed ? 'confirmed' : 'notConfirmed');
  });
});
