import { describe, expect, it } from 'vitest';
import { warningText } from '../../../../shared/contracts/warning-text';
import { DEMO_LIBRARY_BY_ID, DEMO_POLICY } from '../test-support/demo-library';
import { placedWarnings } from './budget-warnings';
import { checkDraft, evaluateDraft, evaluationKey, problemLine } from './evaluate-draft';
import { emptyStep, type PlanDraft } from './plan-draft';

/** The demo lead standard weighed on the four-place BAL-04 (calibration overdue, used with a reason). */
function leadOnFourPlaceBalance(netMassG: string): PlanDraft {
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
    overrides: { '2': 'Checked with a 100 g weight today' },
    seed: 42,
    steps: [
      step('weighSolid', '2', netMassG),
      step('makeUpToVolume', '3'),
      step('pipetteAliquot', '6', '10'),
      step('makeUpToVolume', '4'),
    ],
  };
}

function liveBudget(draft: PlanDraft, minimumWeightRule: boolean) {
  const evaluation = evaluateDraft(draft, DEMO_LIBRARY_BY_ID, { ...DEMO_POLICY, minimumWeightRule });
  if (!evaluation.ok) throw new Error(evaluation.problem.message);
  return evaluation.budget;
}

describe('the planner’s live warnings', () => {
  // BAL-04: s = 0.08 mg, d = 0.1 mg, so m_min = 2000·max(s, 0.41·d) = 0.160 g (USP <41>).
  it('keep the belowMinimumWeight warning while the lab applies the rule', () => {
    const budget = liveBudget(leadOnFourPlaceBalance('0.1599'), true);
    expect(budget.warnings.map((warning) => warning.code)).toEqual(['belowMinimumWeight']);
    expect(budget.warnings[0].stepIndex).toBe(0);
  });

  it('drop it by its code when the lab switches the rule off', () => {
    expect(liveBudget(leadOnFourPlaceBalance('0.1599'), false).warnings).toEqual([]);
  });

  it('place each warning on its step: minimum weight, a dominant step, a flagged item', () => {
    const draft = leadOnFourPlaceBalance('0.1000');
    const budget = liveBudget(draft, true);
    const warnings = placedWarnings({ budget, warnings: budget.warnings }, draft, DEMO_LIBRARY_BY_ID);
    expect(warnings.map((warning) => [warning.code, 'stepIndex' in warning ? warning.stepIndex : null])).toEqual([
      ['belowMinimumWeight', 0],
      ['dominantStep', 0],
      ['flaggedItem', 0],
    ]);
    const [, dominant, flagged] = warnings.map(warningText);
    const percent = Math.round(budget.byStep[0].indexPercent);
    expect(percent).toBeGreaterThan(50);
    expect(dominant).toBe(
      `Step 1 (weigh the solid) contributes ${percent} % of the variance: better equipment here lowers the uncertainty most.`,
    );
    expect(flagged).toBe('BAL-04: calibration overdue.');
  });

  // CIAAW 2021: Pb [206.14, 207.94], u = 0.52 g/mol, 0.16 % of M(Pb(NO3)2): on the five-place BAL-05 with 1.6 g it
  // outweighs the balance, so step 1 dominates through the atomic weight and the purity, not through equipment.
  it('do not advise better equipment when the dominant step is dominated by the material (atomic weight, purity)', () => {
    const draft: PlanDraft = {
      ...leadOnFourPlaceBalance('1.5990'),
      outputUnit: 'mmol/L',
      overrides: {},
      steps: [
        { ...emptyStep('weighSolid'), equipmentId: '1', quantity: '1.5990' },
        { ...emptyStep('makeUpToVolume'), equipmentId: '3' },
      ],
    };
    const budget = liveBudget(draft, true);
    const warnings = placedWarnings({ budget, warnings: budget.warnings }, draft, DEMO_LIBRARY_BY_ID);
    const dominant = warnings.find((warning) => warning.code === 'dominantStep');
    expect(dominant).toMatchObject({ stepIndex: 0, params: { lowerableByEquipment: false } });
    expect(warningText(dominant!)).toMatch(/mostly from the material .*better equipment would not lower it/);
    expect(warningText(dominant!)).not.toMatch(/better equipment here lowers/);
    const atomicWeight = warnings.find((warning) => warning.code === 'dominantAtomicWeight');
    expect(atomicWeight && warningText(atomicWeight)).toMatch(
      /^The standard atomic weight of Pb contributes \d+ % of the variance: the lot's atomic weight or molar mass from its certificate would lower it; better glassware or a better balance would not\.$/,
    );
  });

  it('name no dominant step when no step holds more than half of the variance', () => {
    const draft = leadOnFourPlaceBalance('0.1599');
    const budget = liveBudget(draft, true);
    expect(budget.byStep.length).toBe(4);
    expect(Math.max(...budget.byStep.map((group) => group.indexPercent))).toBeLessThan(50);
    expect(
      placedWarnings({ budget, warnings: budget.warnings }, draft, DEMO_LIBRARY_BY_ID).map((warning) => warning.code),
    ).not.toContain('dominantStep');
  });

  it('of a stored version are the snapshot’s, as the policy kept them, not the budget’s own list', () => {
    // A snapshot computed with the rule off: the budget keeps what the engine raised, `warnings` is empty
    // (server/preparations/compute-snapshot.ts). The read-only planner showed the budget's list before.
    const draft = leadOnFourPlaceBalance('0.1599');
    const budget = liveBudget(draft, true);
    expect(budget.warnings.map((warning) => warning.code)).toEqual(['belowMinimumWeight']);
    const codes = placedWarnings({ budget, warnings: [] }, draft, DEMO_LIBRARY_BY_ID).map((warning) => warning.code);
    expect(codes).toEqual(['flaggedItem']);
  });
});

describe('a policy change in an open planner', () => {
  it('changes what the planner shows even though the plan it computes is the same', () => {
    const draft = leadOnFourPlaceBalance('0.1599');
    const on = evaluateDraft(draft, DEMO_LIBRARY_BY_ID, { ...DEMO_POLICY, minimumWeightRule: true });
    const off = evaluateDraft(draft, DEMO_LIBRARY_BY_ID, { ...DEMO_POLICY, minimumWeightRule: false });
    if (!on.ok || !off.ok) throw new Error('the demo plan computes');
    expect(on.plan).toEqual(off.plan);
    // The workspace reuses an evaluation whose key is unchanged: a key of the plan alone kept the old warning.
    expect(evaluationKey(on)).not.toBe(evaluationKey(off));
    expect(evaluationKey(on)).toBe(
      evaluationKey(evaluateDraft(draft, DEMO_LIBRARY_BY_ID, { ...DEMO_POLICY, minimumWeightRule: true })),
    );
  });
});

describe('the save line of a draft that is not a plan yet', () => {
  it('names the step and the field in the planner’s words, never a field path', () => {
    const draft = leadOnFourPlaceBalance('0.1599');
    const withoutPipette = { ...draft, steps: draft.steps.map((s, i) => (i === 2 ? { ...s, equipmentId: '' } : s)) };
    const problem = checkDraft(withoutPipette, DEMO_LIBRARY_BY_ID);
    expect(problem).not.toBeNull();
    expect(problemLine(problem!)).toBe('step 3: Choose the pipette from the lab’s library.');
  });
});
