import { toEngineEquipment } from '../../shared/contracts/engine-equipment';
import type { EquipmentItem, EquipmentKind } from '../../shared/contracts/library';
import { needsOverrideReason, type Override } from '../../shared/contracts/preparations';
import type { UsedItem } from '../../shared/contracts/snapshot';
import {
  emptySlotWords,
  isStepKind,
  STEP_KINDS,
  wrongItemWords,
  type StepKind,
} from '../../shared/contracts/step-kinds';
import { PlanError, type PlanPathSegment } from '../../shared/uncertainty';
import { AppError } from '../lib/errors';

/** The library slots of a step (its material first, then its balance, flask or pipette) and the kinds that fill each. */
function librarySlots(kind: StepKind): { slot: string; kinds: readonly EquipmentKind[] }[] {
  const { materialKinds, slot } = STEP_KINDS[kind];
  const slots: { slot: string; kinds: readonly EquipmentKind[] }[] = [];
  if (materialKinds) slots.push({ slot: 'material', kinds: materialKinds });
  if (slot) slots.push({ slot: slot.name, kinds: slot.libraryKinds });
  return slots;
}

export interface ResolvedPlan {
  plan: Record<string, unknown>;
  items: UsedItem[];
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/**
 * Replaces every piece of equipment in the plan by the lab library's current revision of it.
 * - An id that is not in this lab's library refuses the whole request (AppError): a plan never reads
 *   another lab's equipment.
 * - A retired item, or an overdue/expired one without a recorded override reason, is a PlanError at
 *   that step, so a draft can still be kept and shown with the problem.
 */
export function resolvePlan(
  plan: Record<string, unknown>,
  library: Map<string, EquipmentItem>,
  overrides: Override[],
): ResolvedPlan {
  const steps = Array.isArray(plan.steps) ? plan.steps : [];
  const used = new Map<string, UsedItem>();
  const reasons = new Map(overrides.map((o) => [o.libraryId, o.reason]));
  const problems: PlanError[] = [];

  const resolvedSteps = steps.map((step: unknown, index: number) => {
    if (!isRecord(step) || !isStepKind(step.kind)) return step;
    const out: Record<string, unknown> = { ...step };
    for (const { slot, kinds } of librarySlots(step.kind)) {
      const given = step[slot];
      const path: PlanPathSegment[] = ['steps', index, slot];
      if (!isRecord(given)) continue; // the engine reports the missing slot
      const libraryId = typeof given.libraryId === 'string' ? given.libraryId : undefined;
      if (!libraryId) {
        problems.push(new PlanError(path, `Step ${index + 1}: ${emptySlotWords(slot)}`));
        continue;
      }
      const item = library.get(libraryId);
      if (!item)
        throw new AppError(
          'validation',
          'foreign_equipment',
          `Step ${index + 1}: that ${slot} is not in this lab's library.`,
          [{ path: path.join('.'), message: 'Not in this lab’s library.' }],
        );
      if (!kinds.includes(item.kind)) {
        problems.push(
          new PlanError(
            path,
            `Step ${index + 1}: ${wrongItemWords(item.code, slot === 'material' ? kinds.join(' or ').replace(/-/g, ' ') : slot)}`,
          ),
        );
        continue;
      }
      const reason = reasons.get(libraryId) ?? null;
      if (item.status === 'retired')
        problems.push(
          new PlanError(path, `Step ${index + 1}: ${item.code} is retired and cannot be used in a new plan.`),
        );
      else if (needsOverrideReason(item) && !reason) {
        problems.push(
          new PlanError(
            path,
            `Step ${index + 1}: ${item.code}: ${item.flags.join('; ')}. Record a reason to use it anyway.`,
          ),
        );
      }
      out[slot] = toEngineEquipment(item);
      const data = item.current.data as { certificateReference?: string; hazardNotes?: string };
      used.set(libraryId, {
        libraryId,
        code: item.code,
        kind: item.kind,
        revisionId: String(item.current.id),
        revisionNumber: item.current.number,
        certificateReference: data.certificateReference ?? '',
        flags: item.flags,
        override: reason,
        hazardNotes: data.hazardNotes ?? '',
      });
    }
    return out;
  });
  if (problems.length > 0) throw problems[0];
  return { plan: { ...plan, steps: resolvedSteps }, items: [...used.values()] };
}
