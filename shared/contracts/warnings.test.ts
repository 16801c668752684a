import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluatePlan, parsePlan, type EngineWarning } from '../uncertainty';
import { snapshotSchema } from './snapshot';
import { warningsUnderPolicy } from './warning-policy';
import { warningText } from './warning-text';
import { storedWarningSchema, type StoredWarning } from './warnings';

const stored = JSON.parse(
  readFileSync(
    new URL('../../tests/fixtures/snapshots/lead-standard-stored-with-text-warnings.json', import.meta.url),
    'utf8',
  ),
) as { snapshotSha256: string; snapshotJson: string };

/** The sentence the code before structured warnings stored for 0.1599 g on BAL-04 (its minimum weight: 0.160 g). */
const STORED_SENTENCE =
  'Step 1: 0.1599 g is below the minimum weight of Balance BAL-04 (0.160 g by USP <41>: 2·s/m ≤ 0.10 %, s ≥ 0.41·d).';

/** JSON with object keys sorted at every depth, as the server stores snapshots (server/lib/canonical-json.ts). */
const sortedKeysJson = (value: unknown): string =>
  JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)))
      : v,
  );

describe('a snapshot stored while warnings were sentences (tests/fixtures/snapshots)', () => {
  it('still hashes to the SHA-256 stored with it', () => {
    expect(createHash('sha256').update(stored.snapshotJson, 'utf8').digest('hex')).toBe(stored.snapshotSha256);
  });

  it('reads each sentence as a recorded-text warning whose words are the stored text', () => {
    const snapshot = snapshotSchema.parse(JSON.parse(stored.snapshotJson));
    expect(snapshot.warnings).toEqual([{ code: 'recordedText', params: { text: STORED_SENTENCE } }]);
    expect(snapshot.budget.warnings).toEqual([{ code: 'recordedText', params: { text: STORED_SENTENCE } }]);
    expect(snapshot.warnings.map(warningText)).toEqual([STORED_SENTENCE]);
  });

  it('encodes back to the very text it was stored with', () => {
    const again = snapshotSchema.encode(snapshotSchema.parse(JSON.parse(stored.snapshotJson)));
    const text = sortedKeysJson(again);
    expect(text).toContain(JSON.stringify(STORED_SENTENCE));
    expect(text).toContain('"effectiveDegreesOfFreedom":"Infinity"');
    expect(text === stored.snapshotJson).toBe(true);
  });
});

describe('a warning the engine raises today', () => {
  const plan = parsePlan(snapshotSchema.parse(JSON.parse(stored.snapshotJson)).plan);
  const { warnings } = evaluatePlan(plan);

  it('is a code with its step and figures, and its words are the sentence stored before', () => {
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toMatchObject({
      code: 'belowMinimumWeight',
      stepIndex: 0,
      params: { balanceItemId: 'BAL-04', netMassG: 0.1599 },
    });
    expect(warningText(warnings[0])).toBe(STORED_SENTENCE);
  });

  it('is stored as the object and reads back unchanged', () => {
    const encoded = storedWarningSchema.encode(warnings[0]);
    expect(encoded).toEqual(warnings[0]);
    expect(storedWarningSchema.decode(JSON.parse(JSON.stringify(encoded)))).toEqual(warnings[0]);
  });

  it('is refused in the stored form when its code is not one the engine has', () => {
    const unknown = { ...warnings[0], code: 'belowMinimumMass' };
    expect(storedWarningSchema.safeParse(unknown).success).toBe(false);
  });
});

describe('the lab policy over warnings', () => {
  const belowMinimum: EngineWarning = {
    code: 'belowMinimumWeight',
    stepIndex: 0,
    params: { balanceItemId: 'BAL-04', netMassG: 0.1599, minimumWeightG: 0.16 },
  };
  const recorded: StoredWarning = { code: 'recordedText', params: { text: 'A sentence from an older record.' } };

  it('keeps the minimum-weight warning while the rule is on', () => {
    expect(warningsUnderPolicy([belowMinimum, recorded], { minimumWeightRule: true })).toEqual([
      belowMinimum,
      recorded,
    ]);
  });

  it('drops it by its code when the rule is off, and keeps the rest', () => {
    expect(warningsUnderPolicy([belowMinimum, recorded], { minimumWeightRule: false })).toEqual([recorded]);
  });
});

// JCGM 101:2008 6.4.9 (from memory): a t input's variance ν/(ν − 2)·s² exists only for ν > 2.
describe('the infinite Monte Carlo variance warning', () => {
  it('names the sources of the step and says what still holds, in a chemist’s words', () => {
    const plan = JSON.parse(
      readFileSync(new URL('../../tests/fixtures/plans/lead-standard-from-nitrate.json', import.meta.url), 'utf8'),
    ) as { steps: { balance?: Record<string, unknown>; extraSources?: unknown[] }[] };
    (plan.steps[0].balance as Record<string, unknown>).repeatabilityReadings = 3;
    const warnings = evaluatePlan(plan as never).warnings;
    expect(warnings).toHaveLength(1);
    const [warning] = warnings;
    expect(warning).toMatchObject({
      code: 'infiniteMonteCarloVariance',
      stepIndex: 0,
      params: { degreesOfFreedom: 2 },
    });
    const words = warningText(warning);
    expect(words).toMatch(
      /^Step 1: Balance B-01 repeatability \(gross reading\); Balance B-01 repeatability \(tare reading\) rest on 3 or fewer readings/,
    );
    expect(words).toMatch(/Student t whose variance is infinite: the Monte Carlo standard deviation means nothing/);
    expect(storedWarningSchema.parse(warning)).toEqual(warning);
  });
});
