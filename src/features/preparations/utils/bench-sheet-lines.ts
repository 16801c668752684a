import {
  firstInstructions,
  isStepKind,
  itemIn,
  STEP_KINDS,
  stepInstruction,
} from '../../../../shared/contracts/step-kinds';
import { stepSchema } from '../../../../shared/uncertainty';

/** What the analyst does at one step, and which readings the sheet leaves blank for it. */
export type BenchLine = {
  stepNumber: number;
  /** What to do first, before the step itself (a flask to empty into a storage bottle); null when nothing. */
  first: string | null;
  action: string;
  /** Equipment IDs used in the step. */
  equipment: string[];
  readings: 'weighing' | 'volume' | 'none';
};

/**
 * The steps of a plan (inline equipment) as bench instructions, in the words of the step-kind registry (the PDF
 * record prints the same): target masses to each balance's readability, volumes as the glassware marks them.
 * A step not yet complete (no equipment chosen) is named only. A step may have something to do first
 * (`firstInstructions`: bottle an earlier solution before its flask is used again).
 */
export function benchSheetLines(plan: Record<string, unknown>, labTemperatureC: number): BenchLine[] {
  const raws: unknown[] = Array.isArray(plan.steps) ? plan.steps : [];
  const steps = raws.map((raw) => {
    const parsed = stepSchema.safeParse(raw);
    return parsed.success ? parsed.data : undefined;
  });
  const firstLines = firstInstructions(steps);
  return raws.map((raw, stepIndex) => {
    const stepNumber = stepIndex + 1;
    const step = steps[stepIndex];
    const first = firstLines.get(stepIndex) ?? null;
    if (!step) {
      const kind = (raw as { kind?: unknown } | null)?.kind;
      const label = isStepKind(kind) ? STEP_KINDS[kind].label : 'Unknown step';
      return { stepNumber, first, action: `${label}: not complete in the plan.`, equipment: [], readings: 'none' };
    }
    const entry = STEP_KINDS[step.kind];
    const slots = [entry.slot?.name, entry.materialKinds ? 'material' : undefined] as const;
    return {
      stepNumber,
      first,
      action: stepInstruction(step, { item: (slot) => itemIn(step, slot)?.itemId ?? '—', stepIndex, labTemperatureC }),
      equipment: slots.flatMap((slot) => (slot ? [itemIn(step, slot)?.itemId ?? ''] : [])).filter(Boolean),
      readings: entry.recordedMass ? 'weighing' : entry.slot ? 'volume' : 'none',
    };
  });
}
