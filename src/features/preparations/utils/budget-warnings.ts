import type { EquipmentItem } from '../../../../shared/contracts/library';
import type { BudgetResult } from '../../../../shared/uncertainty';
import { STEP_KINDS } from '../../../../shared/contracts/step-kinds';
import type { PlanDraft } from './plan-draft';

/** A warning and the step it belongs to (null: the whole plan), so it can be shown in place. */
export type PlacedWarning = { stepIndex: number | null; text: string };

/** Above this share of the variance one step dominates the budget. */
export const DOMINANT_STEP_PERCENT = 50;

/**
 * The warnings of a live budget: the engine's own (minimum weight), a step contributing more than half
 * of the variance, and every flagged library item the plan uses (calibration due or overdue, expiring material).
 */
export function placedWarnings(
  budget: BudgetResult | null,
  draft: PlanDraft,
  library: Map<string, EquipmentItem>,
): PlacedWarning[] {
  const warnings: PlacedWarning[] = [];
  for (const text of budget?.warnings ?? []) {
    const step = /^Step (\d+)/.exec(text);
    warnings.push({ stepIndex: step ? Number(step[1]) - 1 : null, text });
  }
  for (const group of budget?.byStep ?? []) {
    if (group.indexPercent > DOMINANT_STEP_PERCENT && /^\d+$/.test(group.key)) {
      const index = Number(group.key);
      const label = draft.steps[index] ? STEP_KINDS[draft.steps[index].kind].label.toLowerCase() : 'this step';
      warnings.push({
        stepIndex: index,
        text: `Step ${index + 1} (${label}) contributes ${Math.round(group.indexPercent)} % of the variance: better equipment here lowers the uncertainty most.`,
      });
    }
  }
  const material = library.get(draft.materialId);
  if (material && material.flags.length > 0)
    warnings.push({ stepIndex: 0, text: `${material.code}: ${material.flags.join('; ')}.` });
  draft.steps.forEach((step, index) => {
    const item = library.get(step.equipmentId);
    if (item && item.flags.length > 0)
      warnings.push({ stepIndex: index, text: `${item.code}: ${item.flags.join('; ')}.` });
  });
  return warnings;
}
