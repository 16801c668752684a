import { describe, expect, it } from 'vitest';
import { DEMO_LIBRARY_BY_ID, DEMO_POLICY } from '../test-support/demo-library';
import { evaluateDraft, fieldMessage, problemLine } from './evaluate-draft';
import {
  draftFromPlan,
  earlierStepInSameFlask,
  emptyStep,
  overridesToSave,
  quantityToPlan,
  quantityUnit,
  storedPlan,
  withEquipment,
  type PlanDraft,
} from './plan-draft';
import { problemField } from './problem-field';

/** The demo lead standard: 0.1599 g of Pb(NO3)2 on BAL-05 into VF-100-A, then 10 mL (GP-10-A) into VF-100-B. */
function leadStandard(): PlanDraft {
  const step = (kind: Parameters<typeof emptyStep>[0], equipmentId: string, quantity = '') => ({
    ...emptyStep(kind),
    equipmentId,
    quantity,
  });
  return {
    title: 'Pb 100 mg/L',
    materialId: '8',
    analyte: 'Pb',
    outputUnit: 'mg/L',
    labTemperatureC: '20',
    overrides: {},
    seed: 42,
    steps: [
      step('weighSolid', '1', '0.1599'),
      step('makeUpToVolume', '3'),
      step('pipetteAliquot', '6', '10'),
      step('makeUpToVolume', '4'),
    ],
  };
}

describe('the live budget of a draft', () => {
  it('computes the demo lead standard with the library items inline and the lab policy applied', () => {
    const evaluation = evaluateDraft(leadStandard(), DEMO_LIBRARY_BY_ID, DEMO_POLICY);
    if (!evaluation.ok) throw new Error(evaluation.problem.message);
    // c = m·P·M(Pb)/M(Pb(NO3)2) / V₁ · V_a / V₂ with M(Pb) = 207.04 (midpoint of the CIAAW 2021 interval
    // [206.14, 207.94]), N 14.0069, O 15.9994 (CIAAW 2021 abridged values, from memory):
    // 0.1599 g · 0.9998 · 207.04 / 331.2141 / 0.1 L · 10/100 · 1000 mg/g = 99.9821 mg/L, times the policy's air-buoyancy
    // correction of the weighed nitrate, (1 − 1.2/8000)/(1 − 1.2/4530) = 1.000115 (OIML R 111; 4.53 g/cm³ from memory):
    // 99.9936 mg/L. Tolerance 0.001 mg/L: rounding of the hand value.
    expect(evaluation.budget.value).toBeCloseTo(99.9936, 3);
    expect(evaluation.budget.rounded.valueText).toBe('99.99');
    expect(evaluation.plan.settings.airBuoyancy).toEqual({
      treatment: 'correct',
      airDensityKgPerM3: 1.2,
      airDensityHalfRangeKgPerM3: 0.05,
      weightDensityKgPerM3: 8000,
    });
    // The policy's ±4 °C half-range reaches the engine (withPolicy), so each volume carries a temperature source.
    expect(evaluation.plan.settings.temperatureHalfRangeC).toBe(4);
    expect(evaluation.budget.checkpoints.map((checkpoint) => checkpoint.stepIndex)).toEqual([1, 3]);
  });

  it('puts an unreadable mass on its field and keeps nothing from the engine', () => {
    const draft = leadStandard();
    draft.steps[0] = { ...draft.steps[0], quantity: '0.16 g' };
    const evaluation = evaluateDraft(draft, DEMO_LIBRARY_BY_ID, DEMO_POLICY);
    expect(evaluation.ok).toBe(false);
    if (evaluation.ok) return;
    expect(problemField(evaluation.problem)).toBe('step-0-quantity');
    expect(evaluation.problem.message).toBe('Enter the net mass as a number in g, e.g. 0.1600.');
  });

  it('refuses an overdue balance until a reason is recorded, then sends that reason', () => {
    const draft = leadStandard();
    draft.steps[0] = { ...draft.steps[0], equipmentId: '2' };
    const refused = evaluateDraft(draft, DEMO_LIBRARY_BY_ID, DEMO_POLICY);
    expect(refused.ok ? null : problemField(refused.problem)).toBe('step-0-override');
    const reasoned = {
      ...draft,
      overrides: { '2': 'Checked with a 100 g weight today', '5': 'VF-250-A is not in this plan' },
    };
    expect(evaluateDraft(reasoned, DEMO_LIBRARY_BY_ID, DEMO_POLICY).ok).toBe(true);
    expect(overridesToSave(reasoned)).toEqual([{ libraryId: '2', reason: 'Checked with a 100 g weight today' }]);
  });

  it('lets the engine point at the step it cannot compute: a load above the balance capacity', () => {
    const draft = leadStandard();
    draft.steps[0] = { ...draft.steps[0], containerMassG: '250' }; // BAL-05 weighs at most 220 g
    const evaluation = evaluateDraft(draft, DEMO_LIBRARY_BY_ID, DEMO_POLICY);
    expect(evaluation.ok ? null : [problemField(evaluation.problem), evaluation.problem.message]).toEqual([
      'step-0-quantity',
      'Balance BAL-05 holds at most 220 g; container 250 g plus 0.1599 g is more.',
    ]);
  });
});

describe('saving and reopening', () => {
  it('reopens a saved plan as the same draft (same write, same numbers)', () => {
    const draft = leadStandard();
    const plan = storedPlan(draft, DEMO_LIBRARY_BY_ID);
    const reopened = draftFromPlan(JSON.parse(JSON.stringify(plan)), { title: draft.title, overrides: [], seed: 42 });
    expect(storedPlan(reopened, DEMO_LIBRARY_BY_ID)).toEqual(plan);
    expect(reopened.steps.map((step) => [step.kind, step.equipmentId, step.quantity])).toEqual([
      ['weighSolid', '1', '0.1599'],
      ['makeUpToVolume', '3', ''],
      ['pipetteAliquot', '6', '10'],
      ['makeUpToVolume', '4', ''],
    ]);
    const steps = plan.steps as { balance?: { libraryId: string; revisionId: string } }[];
    expect(steps[0].balance).toMatchObject({ libraryId: '1', revisionId: '10' });
  });
});

describe('piston-pipette volumes are typed in µL, the unit of the item (common practice)', () => {
  const withPiston = (quantity: string): PlanDraft => {
    const draft = leadStandard();
    draft.steps[2] = { ...draft.steps[2], equipmentId: '10', quantity };
    return draft;
  };
  const storedVolume = (draft: PlanDraft) =>
    (storedPlan(draft, DEMO_LIBRARY_BY_ID).steps as { volumeMl?: number }[])[2].volumeMl;

  it('stores µL as mL exactly, with no binary remainder (250 µL is 0.25 mL; 123.4 µL is 0.1234 mL)', () => {
    expect(storedVolume(withPiston('250'))).toBe(0.25);
    expect(storedVolume(withPiston('123.4'))).toBe(0.1234);
    expect(123.4 / 1000).not.toBe(0.1234); // what a plain division would have stored
    expect(storedVolume(withPiston('1e3'))).toBe(1);
    expect(storedVolume(withPiston('0,5'))).toBe(0.0005);
    expect(quantityToPlan('250', 'µL')).toBe(0.25);
    expect(quantityToPlan('10', 'mL')).toBe(10);
  });

  it('reopens a stored piston volume in µL, and a glass pipette volume in mL', () => {
    const plan = storedPlan(withPiston('123.4'), DEMO_LIBRARY_BY_ID);
    const reopened = draftFromPlan(JSON.parse(JSON.stringify(plan)), { title: 'Pb 100 mg/L', overrides: [], seed: 42 });
    expect(reopened.steps[2].quantity).toBe('123.4');
    expect(storedPlan(reopened, DEMO_LIBRARY_BY_ID)).toEqual(plan);
    expect(quantityUnit('pipetteAliquot', DEMO_LIBRARY_BY_ID.get('10'))).toBe('µL');
    expect(quantityUnit('pipetteAliquot', DEMO_LIBRARY_BY_ID.get('6'))).toBe('mL');
    expect(quantityUnit('weighSolid', DEMO_LIBRARY_BY_ID.get('1'))).toBe('g');
  });

  it('keeps a typed volume’s meaning when the pipette changes: 0.5 mL becomes 500 µL, and back', () => {
    const typed = { ...emptyStep('pipetteAliquot'), quantity: '0.5' };
    const piston = withEquipment(typed, '10', DEMO_LIBRARY_BY_ID.get('10'), undefined);
    expect(piston.quantity).toBe('500');
    expect(withEquipment(piston, '', undefined, DEMO_LIBRARY_BY_ID.get('10')).quantity).toBe('0.5');
    expect(withEquipment(piston, '6', DEMO_LIBRARY_BY_ID.get('6'), DEMO_LIBRARY_BY_ID.get('10')).quantity).toBe('10');
  });

  it('asks for a piston volume in µL', () => {
    const evaluation = evaluateDraft(withPiston('lots'), DEMO_LIBRARY_BY_ID, DEMO_POLICY);
    expect(evaluation.ok ? null : evaluation.problem.message).toBe('Enter the volume as a number in µL, e.g. 250.');
  });
});

describe('a flask reused in the plan (common practice: a flask holds one solution at a time)', () => {
  const reusing = (emptied: boolean): PlanDraft => {
    const draft = leadStandard();
    draft.steps[3] = { ...draft.steps[3], equipmentId: '3', flaskEmptiedBefore: emptied };
    return draft;
  };

  it('shows the engine’s refusal at the flask of the step that reuses it', () => {
    const evaluation = evaluateDraft(reusing(false), DEMO_LIBRARY_BY_ID, DEMO_POLICY);
    if (evaluation.ok) throw new Error('expected the reused flask to be refused');
    expect(problemField(evaluation.problem)).toBe('step-3-equipment');
    expect(fieldMessage(evaluation.problem.message)).toMatch(
      /^Flask VF-100-A still holds the solution made up in it at step 2, from which step 3 takes its aliquot\./,
    );
    expect(problemLine(evaluation.problem)).toMatch(/^step 4: Flask VF-100-A still holds/);
  });

  it('computes once the stock is said to be bottled first, and stores that statement', () => {
    const draft = reusing(true);
    expect(earlierStepInSameFlask(draft.steps, 3)).toBe(1);
    expect(evaluateDraft(draft, DEMO_LIBRARY_BY_ID, DEMO_POLICY).ok).toBe(true);
    const plan = storedPlan(draft, DEMO_LIBRARY_BY_ID) as { steps: { flaskEmptiedBefore?: boolean }[] };
    expect(plan.steps[3].flaskEmptiedBefore).toBe(true);
    const reopened = draftFromPlan(JSON.parse(JSON.stringify(plan)), { title: '', overrides: [], seed: 42 });
    expect(reopened.steps[3].flaskEmptiedBefore).toBe(true);
  });

  it('drops the statement when the flask is not used earlier, and asks again when the flask changes', () => {
    const draft = leadStandard();
    draft.steps[3] = { ...draft.steps[3], flaskEmptiedBefore: true };
    expect(earlierStepInSameFlask(draft.steps, 3)).toBeUndefined();
    const plan = storedPlan(draft, DEMO_LIBRARY_BY_ID) as { steps: Record<string, unknown>[] };
    expect(plan.steps[3]).not.toHaveProperty('flaskEmptiedBefore');
    const changed = withEquipment(
      reusing(true).steps[3],
      '5',
      DEMO_LIBRARY_BY_ID.get('5'),
      DEMO_LIBRARY_BY_ID.get('3'),
    );
    expect(changed.flaskEmptiedBefore).toBe(false);
  });
});
