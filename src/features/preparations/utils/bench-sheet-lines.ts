import { isStepKind, itemIn, STEP_KINDS, stepInstruction } from '../../../../shared/contracts/step-kinds';
import { stepSchema } from '../../../../shared/uncertainty';

/** What the analyst does at one step, and which readings the sheet leaves blank for it. */
export type BenchLine = {
  stepNumber: number;
  action: string;
  /** Equipment IDs used in the step. */
  equipment: string[];
  readings: 'weighing' | 'volume' | 'none';
};

/**
 * The steps of a plan (inline equipment) as bench instructions, in the words of the step-kind registry (the PDF
 * record prints the same): target masses to each balance's readability, volumes as the glassware marks them.
 * A step not yet complete (no equipment chosen) is named only.
 */
export function benchSheetLines(plan: Record<string, unknown>, labTemperatureC: number): BenchLine[] {
  const steps: unknown[] = Array.isArray(plan.steps) ? plan.steps : [];
  return steps.map((raw, stepIndex) => {
    const stepNumber = stepIndex + 1;
    const parsed = stepSchema.safeParse(raw);
    if (!parsed.success) {
      const kind = (raw as { kind?: unknown } | null)?.kind;
      const label = isStepKind(kind) ? STEP_KINDS[kind].label : 'Unknown step';
      return { stepNumber, action: `${label}: not complete in the plan.`, equipment: [], readings: 'none' };
    }
    const step = parsed.data;
    const entry = STEP_KINDS[step.kind];
    const slots = [entry.slot?.name, entry.materialKinds ? 'material' : undefined] as const;
    return {
      stepNumber,
      action: stepInstruction(step, { item: (slot) => itemIn(step, slot)?.itemId ?? '—', stepIndex, labTemperatureC }),
      equipment: slots.flatMap((slot) => (slot ? [itemIn(step, slot)?.itemId ?? ''] : [])).filter(Boolean),
      readings: entry.recordedMass ? 'weighing' : entry.slot ? 'volume' : 'none',
    };
  });
}
