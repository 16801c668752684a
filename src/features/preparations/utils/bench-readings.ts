import { z } from 'zod';
import { readingsRequestSchema, type RecordedReadings } from '../../../../shared/contracts/preparations';
import { formatToReadability } from '../../../../shared/contracts/balance-reading';
import { isStepKind, STEP_KINDS } from '../../../../shared/contracts/step-kinds';
import { parseDecimal } from './parse-decimal';

type Recorded = RecordedReadings['readings'][number];
type Item = Record<string, unknown>;

/** One weighing of the plan as the readings form shows it. */
export type WeighingRow = {
  stepIndex: number;
  /** What goes on the balance, in a few words: "On BAL-05: Lead(II) nitrate". */
  what: string;
  field: Recorded['field'];
  /** The mass planned, before any reading replaced it. */
  plannedG: number;
  /** The planned mass as the balance shows it ("0.15990"), or as stored when the balance has no readability. */
  plannedText: string;
  /** The balance's scale interval d (g), when the plan gives it. */
  readabilityG: number | null;
  /** What was recorded for this step last time, if anything. */
  recorded: Recorded | null;
};

/** A mass as the balance shows it (to its readability), or as stored when the readability is not known. */
const asShown = (massG: number, readabilityG: number | null) =>
  readabilityG === null ? String(massG) : formatToReadability(massG, readabilityG);

const text = (value: unknown) => (typeof value === 'string' ? value : '');

function whatIsWeighed(step: Item): string {
  const balance = text((step.balance as Item | undefined)?.itemId) || 'the balance';
  const material = (step.material ?? {}) as Item;
  const onThePan = isStepKind(step.kind) ? STEP_KINDS[step.kind].onThePan : null;
  return `On ${balance}: ${onThePan ? onThePan(text(material.name)) : 'the weighed portion'}`;
}

/**
 * The weighing steps of a computed plan (inline equipment), each with its planned mass to the balance's readability.
 * Once readings are recorded the plan holds the masses weighed, so the planned mass is read back from the readings.
 */
export function weighingRows(plan: Record<string, unknown>, readings: RecordedReadings | null): WeighingRow[] {
  const steps = (Array.isArray(plan.steps) ? plan.steps : []) as Item[];
  return steps.flatMap((step, stepIndex) => {
    const field = isStepKind(step.kind) ? STEP_KINDS[step.kind].recordedMass : null;
    if (!field) return [];
    const recorded = readings?.readings.find((reading) => reading.stepIndex === stepIndex) ?? null;
    const plannedG = recorded?.plannedG ?? Number(step[field]);
    const d = Number((step.balance as Item | undefined)?.readabilityG);
    const readabilityG = Number.isFinite(d) && d > 0 ? d : null;
    const plannedText = asShown(plannedG, readabilityG);
    return [{ stepIndex, what: whatIsWeighed(step), field, plannedG, plannedText, readabilityG, recorded }];
  });
}

/** The plan with each recorded step's planned mass put back, for a bench sheet that prints what was planned. */
export function plannedPlan(plan: Record<string, unknown>, readings: RecordedReadings | null): Record<string, unknown> {
  if (!readings || !Array.isArray(plan.steps)) return plan;
  const steps = (plan.steps as Item[]).map((step, stepIndex) => {
    const recorded = readings.readings.find((reading) => reading.stepIndex === stepIndex);
    return recorded ? { ...step, [recorded.field]: recorded.plannedG } : step;
  });
  return { ...plan, steps };
}

/** Digits after the decimal mark as typed: "12.18577" → 5, "12,1" → 1, "12" → 0. */
function decimalsTyped(typed: string): number {
  const match = /[.,](\d+)$/.exec(typed.trim());
  return match ? match[1].length : 0;
}

/**
 * Net = gross − tare, to as many decimals as the more precise of the two was typed with, so that the
 * binary floating-point remainder never shows: tare "12.18577", gross "12.34567" → "0.15990".
 * Null while either is empty or not a number, or when the gross is not above the tare.
 *
 * @example netFromGrossAndTare('12.18577', '12.34567') // "0.15990"
 */
export function netFromGrossAndTare(tareText: string, grossText: string): string | null {
  const tareG = parseDecimal(tareText);
  const grossG = parseDecimal(grossText);
  if (tareG === null || grossG === null || Number.isNaN(tareG) || Number.isNaN(grossG) || grossG <= tareG) return null;
  if (/e/i.test(tareText) || /e/i.test(grossText)) return String(Number((grossG - tareG).toPrecision(12)));
  return (grossG - tareG).toFixed(Math.max(decimalsTyped(tareText), decimalsTyped(grossText)));
}

/** What the form holds: the text typed into each box, under the request's own names and paths. */
export type ReadingsFormValues = {
  readings: { stepIndex: number; tareG: string; grossG: string; actualMassG: string }[];
  deviations: string;
};

/** The form's values for the rows: the recorded masses as the balance showed them when correcting, blanks otherwise. */
export function readingsFormValues(rows: WeighingRow[], readings: RecordedReadings | null): ReadingsFormValues {
  const values = rows.map((row) => {
    const recorded = row.recorded;
    const shown = (massG: number | null | undefined) =>
      massG === null || massG === undefined ? '' : asShown(massG, row.readabilityG);
    return {
      stepIndex: row.stepIndex,
      tareG: shown(recorded?.tareG),
      grossG: shown(recorded?.grossG),
      actualMassG: shown(recorded?.actualG),
    };
  });
  return { readings: values, deviations: readings?.deviations ?? '' };
}

/** A box's text as a number: empty is "not given", text that is no number is NaN (the shared schema words both). */
const massFromText = z.string().transform((text) => parseDecimal(text) ?? undefined);

/**
 * The readings form's schema: the typed text read as numbers, then the request schema the server validates with
 * (shared/contracts), so its rules and words are the form's; an issue's path names the box it belongs to.
 */
export const readingsFormSchema = z
  .object({
    readings: z.array(
      z.object({ stepIndex: z.number(), tareG: massFromText, grossG: massFromText, actualMassG: massFromText }),
    ),
    deviations: z.string(),
  })
  .transform((typed, context) => {
    // Whatever the boxes gave (a missing net too) goes to the request schema, which words every problem itself.
    const parsed = readingsRequestSchema.safeParse(typed);
    if (parsed.success) return parsed.data;
    for (const issue of parsed.error.issues)
      context.addIssue({ code: 'custom', path: issue.path, message: issue.message });
    return z.NEVER;
  });

/** Form errors keyed by the request's own paths ("readings.0.actualMassG", "deviations"), as the server names them too. */
type ReadingErrors = Record<string, string>;

/**
 * Where a refused request's problems go on the form: field issues by their path; a plan the readings made
 * uncomputable ("plan.steps.0.netMassG") on the net mass of that step's row. Issues with no field are returned apart.
 */
export function placeServerIssues(
  rows: WeighingRow[],
  issues: { path: string; message: string }[],
): { errors: ReadingErrors; unplaced: string[] } {
  const errors: ReadingErrors = {};
  const unplaced: string[] = [];
  for (const issue of issues) {
    const planStep = /^plan\.steps\.(\d+)\./.exec(issue.path);
    const rowIndex = planStep ? rows.findIndex((row) => row.stepIndex === Number(planStep[1])) : -1;
    const path =
      rowIndex >= 0
        ? `readings.${rowIndex}.actualMassG`
        : issue.path.replace(/^readings\.(\d+)\.stepIndex$/, 'readings.$1.actualMassG');
    if (/^readings\.\d+\.(tareG|grossG|actualMassG)$/.test(path) || path === 'deviations')
      errors[path] ??= issue.message;
    else unplaced.push(issue.message);
  }
  return { errors, unplaced };
}
