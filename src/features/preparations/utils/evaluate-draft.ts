import { withPolicy } from '../../../../shared/contracts/engine-equipment';
import type { EquipmentItem, LabPolicy } from '../../../../shared/contracts/library';
import { needsOverrideReason, overrideReasonSchema, type PlanProblem } from '../../../../shared/contracts/preparations';
import { warningsUnderPolicy } from '../../../../shared/contracts/warning-policy';
import { evaluatePlan, PlanError, type BudgetResult, type PlanInput } from '../../../../shared/uncertainty';
import { emptySlotWords, STEP_KINDS, wrongItemWords } from '../../../../shared/contracts/step-kinds';
import { enginePlan, quantityUnit, type PlanDraft, type QuantityUnit } from './plan-draft';
import { parseDecimal } from './parse-decimal';
import { isStartKind } from './step-choices';

export type DraftEvaluation =
  | { ok: true; budget: BudgetResult; plan: PlanInput; problem: null }
  | { ok: false; budget: null; plan: null; problem: PlanProblem };

/** For an overdue or expired item without a reason the server would accept: the shared rule's words, naming the item. */
function missingReason(item: EquipmentItem, reason: string | undefined): string | null {
  if (!needsOverrideReason(item)) return null;
  const parsed = overrideReasonSchema.safeParse(reason ?? '');
  return parsed.success ? null : `${item.code}: ${item.flags.join('; ')}. ${parsed.error.issues[0].message}`;
}

/** A number worth showing as an example in each unit a quantity is typed in. */
const EXAMPLE_QUANTITY: Record<QuantityUnit, string> = { g: '0.1600', mL: '10', µL: '250' };

/** Checks the editor can make before the engine: choices made, numbers readable, reasons for overdue items. */
export function checkDraft(draft: PlanDraft, library: Map<string, EquipmentItem>): PlanProblem | null {
  const material = library.get(draft.materialId);
  if (!draft.materialId) return { path: ['material'], message: 'Choose the reference material.' };
  if (!material)
    return {
      path: ['material'],
      message: 'This material is no longer in the library (retired or removed). Choose another.',
    };
  const materialReason = missingReason(material, draft.overrides[material.id]);
  if (materialReason) return { path: ['material', 'override'], message: materialReason };
  if (!draft.analyte.trim())
    return { path: ['analyte', 'formula'], message: 'Enter the analyte as a formula, e.g. Pb.' };
  if (Number.isNaN(parseDecimal(draft.labTemperatureC)))
    return { path: ['settings', 'labTemperatureC'], message: 'Enter the lab temperature as a number, e.g. 20.' };
  if (draft.steps.length === 0) return { path: ['steps'], message: 'Add the steps of the preparation.' };
  for (const [index, step] of draft.steps.entries()) {
    const info = STEP_KINDS[step.kind];
    if (isStartKind(step.kind) && index !== 0)
      return { path: ['steps', index], message: 'The material is weighed or taken only in the first step.' };
    if (info.slot) {
      const slot = info.slot.name;
      const path = ['steps', index, slot];
      const item = library.get(step.equipmentId);
      if (!step.equipmentId) return { path, message: emptySlotWords(slot) };
      if (!item)
        return { path, message: 'This item is no longer in the library (retired or removed). Choose another.' };
      if (!info.slot.libraryKinds.includes(item.kind)) return { path, message: wrongItemWords(item.code, slot) };
      const itemReason = missingReason(item, draft.overrides[item.id]);
      if (itemReason) return { path: [...path, 'override'], message: itemReason };
    }
    const item = library.get(step.equipmentId);
    const glass = step.kind === 'pipetteAliquot' && item?.kind === 'glass-pipette';
    const unit = quantityUnit(step.kind, item);
    if (info.quantity && unit && !glass) {
      const value = parseDecimal(step.quantity);
      const path = ['steps', index, info.quantity.field];
      if (value === null) return { path, message: `Enter the ${info.quantity.label.toLowerCase()} in ${unit}.` };
      if (Number.isNaN(value))
        return {
          path,
          message: `Enter the ${info.quantity.label.toLowerCase()} as a number in ${unit}, e.g. ${EXAMPLE_QUANTITY[unit]}.`,
        };
    }
    if (info.container && Number.isNaN(parseDecimal(step.containerMassG))) {
      return {
        path: ['steps', index, 'containerMassG'],
        message: 'Enter the container mass as a number in g, or leave it empty.',
      };
    }
    for (const [sourceIndex, source] of step.extraSources.entries()) {
      const path = ['steps', index, 'extraSources', sourceIndex];
      if (!source.name.trim()) return { path: [...path, 'name'], message: 'Name the source, e.g. evaporation.' };
      const amount = parseDecimal(source.amount);
      if (amount === null || Number.isNaN(amount))
        return { path: [...path, 'distribution'], message: 'Enter the width as a number.' };
    }
  }
  return null;
}

/** Removes the engine's "Step 2 › volumeMl: " or "Step 2: " prefix when the message sits on that very field (or after "step 2:"). */
export function fieldMessage(message: string): string {
  const stripped = message.replace(/^(Step \d+|The plan|settings|analyte)( › [^:]+)?: /, '');
  return stripped.charAt(0).toUpperCase() + stripped.slice(1);
}

/**
 * The live GUM budget of the draft, exactly as the server will compute it: the library's current
 * revisions inline, the lab policy applied with withPolicy, the same engine, and its warnings kept as the
 * policy keeps them (warningsUnderPolicy, as the server does).
 */
export function evaluateDraft(
  draft: PlanDraft,
  library: Map<string, EquipmentItem>,
  policy: LabPolicy,
): DraftEvaluation {
  const problem = checkDraft(draft, library);
  if (problem) return { ok: false, budget: null, plan: null, problem };
  const plan = withPolicy(enginePlan(draft, library), policy);
  try {
    const budget = evaluatePlan(plan);
    return {
      ok: true,
      budget: { ...budget, warnings: warningsUnderPolicy(budget.warnings, policy) },
      plan,
      problem: null,
    };
  } catch (error) {
    if (error instanceof PlanError)
      return { ok: false, budget: null, plan: null, problem: { path: error.path, message: error.message } };
    throw error;
  }
}

/**
 * What makes two evaluations show the same thing: the plan computed and the warnings the policy kept (a policy
 * change such as the minimum-weight rule leaves the plan as it was but changes the warnings), or the problem.
 */
export function evaluationKey(evaluation: DraftEvaluation): string {
  return evaluation.ok
    ? JSON.stringify({ plan: evaluation.plan, warnings: evaluation.budget.warnings })
    : JSON.stringify(evaluation.problem);
}

/** A draft's first problem as the save line says it: "step 3: Choose the pipette from the lab’s library." */
export function problemLine(problem: PlanProblem): string {
  const [where, index] = problem.path;
  // The engine names the step itself ("Step 4: the aliquot …"): said once.
  return where === 'steps' && typeof index === 'number'
    ? `step ${index + 1}: ${fieldMessage(problem.message)}`
    : problem.message;
}
