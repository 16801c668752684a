import type { EquipmentItem } from '../../../../shared/contracts/library';
import type { Budget } from '../../../../shared/contracts/snapshot';
import { EQUIPMENT_CATEGORIES } from '../../../../shared/uncertainty/model-types';
import type { StoredWarning, Warning } from '../../../../shared/contracts/warnings';
import type { PlanDraft } from './plan-draft';

/** Above this share of the variance one step dominates the budget. */
const DOMINANT_STEP_PERCENT = 50;

/** A budget the planner shows, with its warnings as the lab policy kept them (a snapshot's `warnings`). */
export type ShownResult = { budget: Budget; warnings: readonly StoredWarning[] };

/**
 * The warnings the planner shows with a result: its own (minimum weight, as the policy kept them: for a stored
 * version the snapshot's list, never the budget's unfiltered one), a step contributing more than half of the
 * variance, and every flagged library item the plan uses (calibration due or overdue, expiring material).
 * A warning without a step index belongs to the whole plan; warning-text.ts gives the words.
 */
export function placedWarnings(
  shown: ShownResult | null,
  draft: PlanDraft,
  library: Map<string, EquipmentItem>,
): Warning[] {
  const budget = shown?.budget;
  const warnings: Warning[] = [...(shown?.warnings ?? [])];
  for (const group of budget?.byStep ?? []) {
    if (budget && group.indexPercent > DOMINANT_STEP_PERCENT && /^\d+$/.test(group.key)) {
      const index = Number(group.key);
      const stepKind = draft.steps[index]?.kind ?? null;
      warnings.push({
        code: 'dominantStep',
        stepIndex: index,
        params: {
          indexPercent: group.indexPercent,
          stepKind,
          lowerableByEquipment: lowerableByEquipment(budget, group.key),
        },
      });
    }
  }
  const material = library.get(draft.materialId);
  if (material && material.flags.length > 0)
    warnings.push({ code: 'flaggedItem', stepIndex: 0, params: { itemCode: material.code, flags: material.flags } });
  draft.steps.forEach((step, index) => {
    const item = library.get(step.equipmentId);
    if (item && item.flags.length > 0)
      warnings.push({ code: 'flaggedItem', stepIndex: index, params: { itemCode: item.code, flags: item.flags } });
  });
  return warnings;
}

/** Whether most of a step group's variance comes from what better equipment can lower (not the material's certificate). */
function lowerableByEquipment(budget: Budget, key: string): boolean {
  let equipment = 0;
  let material = 0;
  for (const row of budget.rows) {
    if (row.stepIndices.join('+') !== key) continue;
    if (EQUIPMENT_CATEGORIES.has(row.category)) equipment += row.contribution ** 2;
    else material += row.contribution ** 2;
  }
  return equipment >= material;
}
