import { z } from 'zod';
import type { PlanStep } from '../uncertainty/plan-schema';

/**
 * Warnings as data: `{ code, stepIndex?, params }`. The engine raises the engine codes; the planner adds its
 * own while an analyst edits; records stored before warnings had codes hold English sentences, read as
 * `recordedText`. Words are made only by warning-text.ts, and rules (the lab policy) read the code.
 */

const stepIndex = z.number().int().min(0);

/** The engine's warnings (engine: EngineWarning; snapshot.test.ts checks they stay the same). */
export const engineWarningSchema = z.discriminatedUnion('code', [
  z.object({
    code: z.literal('belowMinimumWeight'),
    stepIndex,
    params: z.object({ balanceItemId: z.string(), netMassG: z.number(), minimumWeightG: z.number() }),
  }),
  z.object({
    code: z.literal('infiniteMonteCarloVariance'),
    stepIndex,
    params: z.object({ sourceLabels: z.array(z.string()), degreesOfFreedom: z.number() }),
  }),
  z.object({
    code: z.literal('assumedWaterDensity'),
    stepIndex,
    params: z.object({
      materialItemId: z.string(),
      materialName: z.string(),
      certifiedUnit: z.string(),
      densityGPerMl: z.number(),
      standardUncertaintyGPerMl: z.number(),
    }),
  }),
  z.object({
    code: z.literal('dominantAtomicWeight'),
    stepIndex,
    params: z.object({ element: z.string().nullable(), itemId: z.string().nullable(), indexPercent: z.number() }),
  }),
]);

/** A warning stored as an English sentence, before warnings had codes: its words are the stored text. */
const recordedTextWarningSchema = z.object({ code: z.literal('recordedText'), params: z.object({ text: z.string() }) });

const warningObjectSchema = z.discriminatedUnion('code', [...engineWarningSchema.options, recordedTextWarningSchema]);

/**
 * A warning in a stored snapshot or an API answer: the engine's object, or the plain string of a snapshot
 * stored before warnings had codes, read as a `recordedText` warning. Encoding writes that one back as the
 * same string, so an old snapshot decodes and encodes to the very text it was stored with; the API sends the
 * decoded object, which reads back as itself.
 */
export const storedWarningSchema = z.codec(z.union([z.string(), warningObjectSchema]), warningObjectSchema, {
  decode: (stored) =>
    typeof stored === 'string' ? { code: 'recordedText' as const, params: { text: stored } } : stored,
  encode: (warning) => (warning.code === 'recordedText' ? warning.params.text : warning),
});
export type StoredWarning = z.output<typeof storedWarningSchema>;

/** Warnings the planner shows beside the live budget (budget-warnings.ts in the client makes them). */
type PlannerWarning =
  | {
      /** One step contributes more than the dominant share of the variance. */
      code: 'dominantStep';
      stepIndex: number;
      /** `lowerableByEquipment`: most of it comes from the balance, glassware or temperature, not the material. */
      params: { indexPercent: number; stepKind: PlanStep['kind'] | null; lowerableByEquipment: boolean };
    }
  | {
      /** A library item the plan uses is flagged (calibration due or overdue, material expiring or expired). */
      code: 'flaggedItem';
      stepIndex: number;
      params: { itemCode: string; flags: string[] };
    };

/** Every warning there is. */
export type Warning = StoredWarning | PlannerWarning;
