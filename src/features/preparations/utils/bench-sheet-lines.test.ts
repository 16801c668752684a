import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { itemIn, stepInstruction } from '../../../../shared/contracts/step-kinds';
import { parsePlan } from '../../../../shared/uncertainty';
import { benchSheetLines } from './bench-sheet-lines';

/** An invented plan from tests/fixtures/plans, as stored (inline equipment). */
const storedPlan = (name: string): Record<string, unknown> =>
  JSON.parse(readFileSync(new URL(`../../../../tests/fixtures/plans/${name}.json`, import.meta.url), 'utf8'));

describe('benchSheetLines', () => {
  it('prints each step in the words of the step-kind registry, items by their code', () => {
    const stored = storedPlan('lead-standard-from-nitrate');
    const plan = parsePlan(stored);
    const lines = benchSheetLines(stored, 20);
    expect(lines).toHaveLength(plan.steps.length);
    expect(lines.map((line) => line.action)).toEqual(
      plan.steps.map((step, stepIndex) =>
        stepInstruction(step, { item: (slot) => itemIn(step, slot)?.itemId ?? '—', stepIndex, labTemperatureC: 20 }),
      ),
    );
    expect(lines[0].action).toBe(
      'Weigh 0.1599 g of Lead(II) nitrate, analytical reagent (demo lot) — LOT-PBN-2291 — by difference on B-01.',
    );
  });

  it('lists the equipment of each step and leaves blanks for weighings and volumes', () => {
    const lines = benchSheetLines(storedPlan('lead-standard-from-nitrate'), 20);
    expect(lines.map((line) => line.equipment)).toEqual([
      ['B-01', 'LOT-PBN-2291'],
      ['F-100-A'],
      ['GP-10-A'],
      ['F-100-B'],
      ['PP-07'],
      ['F-100-C'],
    ]);
    expect(lines.map((line) => line.readings)).toEqual(['weighing', 'volume', 'volume', 'volume', 'volume', 'volume']);
    const certified = benchSheetLines(storedPlan('selenium-working-standard'), 20);
    expect(certified[0]).toMatchObject({ equipment: ['CRM-SE-0415'], readings: 'none' });
  });

  it('never has the analyst make up in a flask that still holds the stock: the stock is bottled first (common practice)', () => {
    const stored = storedPlan('lead-standard-from-nitrate') as { steps: Record<string, unknown>[] };
    // Step 4 makes up in F-100-A, the flask of the stock that step 3 pipettes from; the plan says it was emptied.
    stored.steps[3] = { ...stored.steps[3], flask: stored.steps[1].flask, flaskEmptiedBefore: true };
    const lines = benchSheetLines(stored, 20);
    expect(lines.map((line) => line.first)).toEqual([
      null,
      null,
      'First transfer the solution of step 2 from F-100-A into a labelled storage bottle, and rinse F-100-A; take this aliquot from that bottle.',
      null,
      null,
      null,
    ]);
    expect(lines[3].action).toMatch(
      /^Transfer quantitatively into the 100 mL flask F-100-A, class A \(its earlier solution bottled and the flask rinsed\), and make up/,
    );
    expect(benchSheetLines(storedPlan('lead-standard-from-nitrate'), 20).map((line) => line.first)).toEqual(
      Array(6).fill(null),
    );
  });

  it('names a step the planner has not finished instead of printing blanks', () => {
    const lines = benchSheetLines(
      { steps: [{ kind: 'makeUpToVolume', flask: { libraryId: '4' } }, { kind: 'toString' }] },
      20,
    );
    expect(lines.map((line) => line.action)).toEqual([
      'Make up to volume: not complete in the plan.',
      'Unknown step: not complete in the plan.',
    ]);
    expect(lines.map((line) => line.readings)).toEqual(['none', 'none']);
  });
});
