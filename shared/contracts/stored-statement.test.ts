import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { resultStatement } from '../uncertainty';
import { snapshotSchema } from './snapshot';
import { validationWords } from './validation-words';

/** A snapshot exactly as an earlier version stored it (tests/fixtures/snapshots/README.md). */
const storedSnapshot = (name: string) =>
  snapshotSchema.parse(
    JSON.parse(
      (
        JSON.parse(readFileSync(new URL(`../../tests/fixtures/snapshots/${name}`, import.meta.url), 'utf8')) as {
          snapshotJson: string;
        }
      ).snapshotJson,
    ),
  );

describe('the result statement of a stored snapshot, stated again from its stored numbers', () => {
  it('re-derives from stored numbers exactly the statement older snapshots stored, so their records read as signed', () => {
    for (const name of ['lead-standard-stored-before-typing.json', 'lead-standard-stored-with-text-warnings.json']) {
      const snapshot = storedSnapshot(name);
      expect(snapshot.validation.passed).toBe(true);
      expect(snapshot.plan.settings.monteCarloInterval).toBeUndefined();
      expect(resultStatement(snapshot).text).toBe(snapshot.budget.statement);
    }
  });

  it('keeps the GUM statement a record was signed with before 1.1.0, even where its validation failed, and its verdict says so', () => {
    const snapshot = storedSnapshot('lead-standard-stored-before-typing.json');
    expect(snapshot.engineVersion).toBe('1.0.0');
    const failed = {
      ...snapshot,
      validation: { ...snapshot.validation, passed: false, lowEndDifference: 0.02, highEndDifference: 0.011 },
    };
    const statement = resultStatement(failed);
    expect(statement.method).toBe('gum');
    expect(statement.text).toBe(snapshot.budget.statement);
    expect(validationWords(failed.validation, 'mg/L', false)).toMatch(
      /Not confirmed: .*so its result is the GUM interval, as it was signed\.$/,
    );
  });

  it('states the Monte Carlo interval for the same stored numbers computed by 1.1.0 (JCGM 101:2008 §8)', () => {
    const snapshot = storedSnapshot('lead-standard-stored-before-typing.json');
    const failed = {
      ...snapshot,
      engineVersion: '1.1.0',
      validation: { ...snapshot.validation, passed: false, lowEndDifference: 0.02, highEndDifference: 0.011 },
    };
    const statement = resultStatement(failed);
    const { low, high } = snapshot.monteCarlo.symmetricInterval;
    expect(statement.method).toBe('monteCarlo');
    expect(statement.text).toMatch(
      /^c\(Pb\) = 99\.98 mg\/L, 95\.45 % coverage interval \[\d+\.\d\d, \d+\.\d\d\] mg\/L/,
    );
    expect(statement.intervalText).toBe(`[${low.toFixed(2)}, ${high.toFixed(2)}]`);
    expect(validationWords(failed.validation, 'mg/L')).toMatch(/The result above states the Monte Carlo interval\.$/);
  });
});
