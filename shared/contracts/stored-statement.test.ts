import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { resultStatement } from '../uncertainty';
import { snapshotSchema } from './snapshot';

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

  it('reads the stored numbers of a snapshot whose validation failed the same way', () => {
    const snapshot = storedSnapshot('lead-standard-stored-before-typing.json');
    const failed = {
      ...snapshot,
      validation: { ...snapshot.validation, passed: false, lowEndDifference: 0.02, highEndDifference: 0.011 },
    };
    const statement = resultStatement(failed);
    const { low, high } = snapshot.monteCarlo.symmetricInterval;
    expect(statement.method).toBe('monteCarlo');
    expect(statement.text).toMatch(
      /^c\(Pb\) = 99\.98 mg\/L, 95\.45 % coverage interval \[\d+\.\d\d, \d+\.\d\d\] mg\/L/,
    );
    expect(statement.intervalText).toBe(`[${low.toFixed(2)}, ${high.toFixed(2)}]`);
  });
});
