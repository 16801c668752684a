import { z } from 'zod';
import type { UsedItem } from '../../../../shared/contracts/snapshot';

/** What each step kind of the plan format does, in the record's words. */
const STEP_WORDS: Record<string, string> = {
  weighSolid: 'Weighing the solid',
  startFromCertifiedSolution: 'Certified stock solution',
  makeUpToVolume: 'Make-up to volume',
  pipetteAliquot: 'Aliquot by pipette',
  weighAliquot: 'Aliquot by mass',
  makeUpToMass: 'Make-up to mass',
  dissolveInSolvent: 'Dissolving in solvent',
};

/** The equipment slot of each step kind whose item names the step (the material for the first step). */
const SLOTS = ['balance', 'flask', 'pipette', 'material'] as const;

const itemReferenceSchema = z.object({ libraryId: z.string().optional(), itemId: z.string().optional() });
const planStepsSchema = z.object({ steps: z.array(z.looseObject({ kind: z.string() })) });

/**
 * Names a budget group from the computed plan (BudgetGroup.key "0", or "1+3" for an item shared by steps 2 and 4):
 * "Step 1 · Weighing the solid (BAL-05)", "Shared by steps 2 and 4". Unreadable plans fall back to "Step n".
 */
export function stepNamer(plan: Record<string, unknown>, items: UsedItem[]): (key: string) => string {
  const parsed = planStepsSchema.safeParse(plan);
  const steps = parsed.success ? parsed.data.steps : [];
  const codeOf = (reference: unknown) => {
    const item = itemReferenceSchema.safeParse(reference);
    if (!item.success) return undefined;
    return items.find((used) => used.libraryId === item.data.libraryId)?.code ?? item.data.itemId;
  };
  return (key) => {
    const indices = key.split('+').map(Number);
    if (indices.some((index) => !Number.isInteger(index))) return key;
    if (indices.length > 1)
      return `Shared by steps ${indices
        .slice(0, -1)
        .map((index) => index + 1)
        .join(', ')} and ${indices[indices.length - 1] + 1}`;
    const step = steps[indices[0]];
    if (!step) return `Step ${indices[0] + 1}`;
    const slot = SLOTS.find((name) => name in step);
    const code = slot ? codeOf(step[slot]) : undefined;
    return `Step ${indices[0] + 1} · ${STEP_WORDS[step.kind] ?? step.kind}${code ? ` (${code})` : ''}`;
  };
}
