import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { describe, expect, expectTypeOf, it } from 'vitest';
import type { z } from 'zod';
import {
  evaluatePlan,
  parsePlan,
  runMonteCarlo,
  validateAgainstGum,
  type BudgetResult,
  type EngineWarning,
  type GumValidation,
  type MonteCarloResult,
  type PlanInput,
} from '../uncertainty';
import { degreesOfFreedomSchema, storedNumberSchema } from './json-number';
import { budgetSchema, type monteCarloSchema, snapshotSchema, type validationSchema, type Snapshot } from './snapshot';
import { type engineWarningSchema, type StoredWarning } from './warnings';

const fixtures = new URL('../../tests/fixtures/', import.meta.url);
const readJson = <T>(relative: string): T => JSON.parse(readFileSync(new URL(relative, fixtures), 'utf8')) as T;
const stored = readJson<{ snapshotSha256: string; snapshotJson: string }>(
  'snapshots/lead-standard-stored-before-typing.json',
);
const leadPlan = readJson<PlanInput>('plans/lead-standard-from-nitrate.json');

/** A snapshot as the server computes one (no library items: the plan file carries its equipment inline). */
function computed(input: PlanInput, seed = 11): Snapshot {
  const plan = parsePlan(input);
  const budget = evaluatePlan(plan);
  const monteCarlo = runMonteCarlo(plan, { seed, trials: 2000 });
  return {
    engineVersion: budget.engineVersion,
    computedAt: '2026-12-03T10:00:00.000Z',
    seed,
    trials: 2000,
    plan,
    items: [],
    budget,
    monteCarlo,
    validation: validateAgainstGum(budget, monteCarlo),
    warnings: budget.warnings,
  };
}

/** The lead plan with a dominant Type A source of 8 degrees of freedom, so that ν_eff ≈ 8.7 (Welch–Satterthwaite). */
function leadPlanWithTypeASource(): PlanInput {
  const plan = structuredClone(leadPlan) as PlanInput & { steps: Record<string, unknown>[] };
  plan.steps[0].extraSources = [
    {
      name: 'Drift between weighings',
      effect: 'relative',
      distribution: { shape: 'normal', standardUncertainty: 0.0285, degreesOfFreedom: 8 },
    },
  ];
  return plan;
}

const throughJson = (snapshot: Snapshot): Snapshot =>
  snapshotSchema.decode(JSON.parse(JSON.stringify(snapshotSchema.encode(snapshot))));

describe('the stored snapshot schemas', () => {
  it('describe exactly the engine’s result types', () => {
    expectTypeOf<Omit<z.output<typeof budgetSchema>, 'warnings'>>().toEqualTypeOf<Omit<BudgetResult, 'warnings'>>();
    // Warnings: the engine's, or a sentence stored before warnings had codes (warnings.test.ts).
    expectTypeOf<z.output<typeof budgetSchema>['warnings']>().toEqualTypeOf<StoredWarning[]>();
    expectTypeOf<z.output<typeof engineWarningSchema>>().toEqualTypeOf<EngineWarning>();
    expectTypeOf<Exclude<StoredWarning, { code: 'recordedText' }>>().toEqualTypeOf<EngineWarning>();
    expectTypeOf<z.output<typeof monteCarloSchema>>().toEqualTypeOf<MonteCarloResult>();
    expectTypeOf<z.output<typeof validationSchema>>().toEqualTypeOf<GumValidation>();
  });

  it('round-trip an infinite ν_eff through JSON as "Infinity", where plain JSON.stringify writes null', () => {
    const snapshot = computed(leadPlan);
    expect(snapshot.budget.effectiveDegreesOfFreedom).toBe(Infinity);
    expect(JSON.parse(JSON.stringify(snapshot)).budget.effectiveDegreesOfFreedom).toBeNull();
    const encoded = snapshotSchema.encode(snapshot);
    expect(encoded.budget.effectiveDegreesOfFreedom).toBe('Infinity');
    const back = throughJson(snapshot);
    expect(back.budget.effectiveDegreesOfFreedom).toBe(Infinity);
    expect(back.budget.rows.length).toBeGreaterThan(5);
    expect(back.budget.rows.filter((row) => row.degreesOfFreedom === Infinity).length).toBe(back.budget.rows.length);
    // Nothing is lost or added: every field of the engine's results comes back as it was.
    expect(back).toEqual(snapshot);
  });

  it('round-trip a finite, non-integer ν_eff unchanged', () => {
    const snapshot = computed(leadPlanWithTypeASource());
    expect(snapshot.budget.effectiveDegreesOfFreedom).toBeCloseTo(8.7, 1);
    expect(throughJson(snapshot)).toEqual(snapshot);
  });

  it('refuses a budget that lacks a field the engine always writes, with the field named', () => {
    const { budget } = snapshotSchema.encode(computed(leadPlan));
    const { coverageFactor: _dropped, ...incomplete } = budget;
    const parsed = budgetSchema.safeParse(incomplete);
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues.map((issue) => issue.path.join('.'))).toEqual(['coverageFactor']);
  });
});

describe('non-finite numbers in JSON', () => {
  it('write ∞, −∞ and NaN as strings and read them back', () => {
    for (const value of [Infinity, -Infinity, Number.NaN]) {
      const text = JSON.stringify(storedNumberSchema.encode(value));
      expect(text).toBe(`"${String(value)}"`);
      expect(storedNumberSchema.decode(JSON.parse(text))).toBe(value);
    }
    expect(storedNumberSchema.encode(8.7)).toBe(8.7);
  });

  it('read the null of older snapshots as ∞ for degrees of freedom, and as NaN (unknown) elsewhere', () => {
    expect(degreesOfFreedomSchema.decode(null)).toBe(Infinity);
    expect(storedNumberSchema.decode(null)).toBeNaN();
    expect(degreesOfFreedomSchema.encode(Infinity)).toBe('Infinity');
  });
});

describe('a snapshot stored before snapshots were typed (tests/fixtures/snapshots)', () => {
  it('still hashes to the SHA-256 stored with it', () => {
    expect(createHash('sha256').update(stored.snapshotJson, 'utf8').digest('hex')).toBe(stored.snapshotSha256);
  });

  it('parses, with its null degrees of freedom read as ∞', () => {
    expect(stored.snapshotJson).toContain('"effectiveDegreesOfFreedom":null');
    const snapshot = snapshotSchema.parse(JSON.parse(stored.snapshotJson));
    expect(snapshot.budget.effectiveDegreesOfFreedom).toBe(Infinity);
    expect(snapshot.budget.rows.length).toBeGreaterThan(5);
    expect(snapshot.budget.rows.filter((row) => row.degreesOfFreedom === Infinity).length).toBe(
      snapshot.budget.rows.length,
    );
    expect(snapshot.budget.statement).toMatch(/^c\(Pb\) = \(\d+\.\d+ ± \d+\.\d+\) mg\/L, k = 2\.00/);
    expect(snapshot.monteCarlo.trials).toBe(200_000);
    expect(snapshot.items.map((item) => item.code).sort()).toEqual([
      'BAL-05',
      'GP-10-A',
      'RM-PBN-01',
      'VF-100-A',
      'VF-100-B',
    ]);
  });

  it('keeps every field it was stored with when decoded and encoded again; only the spelling of ∞ changes', () => {
    const again = snapshotSchema.encode(snapshotSchema.parse(JSON.parse(stored.snapshotJson)));
    const text = sortedKeysJson(again);
    expect(text).toContain('"effectiveDegreesOfFreedom":"Infinity"');
    expect(text.replaceAll('"Infinity"', 'null')).toBe(stored.snapshotJson);
  });
});

/** JSON with object keys sorted at every depth, as the server stores snapshots (server/lib/canonical-json.ts). */
const sortedKeysJson = (value: unknown): string =>
  JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)))
      : v,
  );
