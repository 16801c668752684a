import { z } from 'zod';
import { DISTRIBUTION_SHAPES } from '../uncertainty/distributions';
import { SOURCE_CATEGORIES } from '../uncertainty/model-types';
import { planSchema } from '../uncertainty/plan-schema';
import { degreesOfFreedomSchema, storedNumberSchema as number } from './json-number';
import { storedWarningSchema } from './warnings';

/**
 * The snapshot a computed version stores: the plan as computed, the library items it used, and the engine's
 * results (GUM budget, Monte Carlo, their JCGM 101 §8 validation). Each schema decodes stored or sent JSON into
 * the engine's own result type (snapshot.test.ts checks they stay the same) and encodes it back; non-finite numbers travel as the strings
 * of json-number.ts. The stored text itself is never rewritten: its SHA-256 is over the bytes as stored.
 */

/** One library item as a computed version used it. */
const usedItemSchema = z.object({
  libraryId: z.string(),
  code: z.string(),
  kind: z.string(),
  revisionId: z.string(),
  revisionNumber: z.number().int(),
  certificateReference: z.string(),
  flags: z.array(z.string()),
  override: z.string().nullable(),
  hazardNotes: z.string(),
});
export type UsedItem = z.infer<typeof usedItemSchema>;

const stepIndex = z.number().int().min(0);

const budgetRowSchema = z.object({
  sourceId: z.string(),
  label: z.string(),
  category: z.enum(SOURCE_CATEGORIES),
  evaluationType: z.enum(['A', 'B']),
  sharing: z.enum(['item', 'use']),
  stepIndices: z.array(stepIndex),
  estimate: number,
  unit: z.string(),
  distribution: z.enum(DISTRIBUTION_SHAPES),
  standardUncertainty: number,
  degreesOfFreedom: degreesOfFreedomSchema,
  sensitivityCoefficient: number,
  contribution: number,
  indexPercent: number,
});

const budgetGroupSchema = z.object({ key: z.string(), label: z.string(), contribution: number, indexPercent: number });

const roundedResultSchema = z.object({
  value: number,
  uncertainty: number,
  decimals: z.number().int(),
  valueText: z.string(),
  uncertaintyText: z.string(),
});

/** The GUM budget (engine: BudgetResult; its warnings may also be sentences stored before warnings had codes). */
export const budgetSchema = z.object({
  engineVersion: z.string(),
  measurand: z.string(),
  unit: z.string(),
  value: number,
  standardUncertainty: number,
  relativeStandardUncertainty: number,
  effectiveDegreesOfFreedom: degreesOfFreedomSchema,
  coverageProbability: number,
  coverageFactor: number,
  expandedUncertainty: number,
  relativeExpandedUncertainty: number,
  rows: z.array(budgetRowSchema),
  byStep: z.array(budgetGroupSchema),
  byCategory: z.array(budgetGroupSchema),
  checkpoints: z.array(
    z.object({ stepIndex, label: z.string(), value: number, unit: z.string(), standardUncertainty: number }),
  ),
  rounded: roundedResultSchema,
  statement: z.string(),
  /** The temperature a result per volume is stated at; absent for other results and for snapshots stored before it. */
  referenceTemperatureC: z.number().optional(),
  warnings: z.array(storedWarningSchema),
});

/**
 * A GUM budget to show: live from the engine (BudgetResult is one) or read from a stored snapshot, whose
 * warnings may be sentences recorded before warnings had codes.
 */
export type Budget = z.output<typeof budgetSchema>;

const intervalSchema = z.object({ low: number, high: number });

/** The Monte Carlo summary (engine: MonteCarloResult). */
export const monteCarloSchema = z.object({
  engineVersion: z.string(),
  measurand: z.string(),
  unit: z.string(),
  seed: z.number().int(),
  trials: z.number().int(),
  coverageProbability: number,
  mean: number,
  standardDeviation: number,
  symmetricInterval: intervalSchema,
  shortestInterval: intervalSchema,
  histogram: z.object({ lowerEdge: number, binWidth: number, counts: z.array(z.number().int()) }),
  adaptive: z
    .object({
      converged: z.boolean(),
      batches: z.number().int(),
      batchSize: z.number().int(),
      numericalTolerance: number,
      reachedTolerance: number.optional(),
    })
    .optional(),
});

/** The JCGM 101 §8 comparison of the GUM interval with the Monte Carlo one (engine: GumValidation). */
export const validationSchema = z.object({
  numericalTolerance: number,
  lowEndDifference: number,
  highEndDifference: number,
  passed: z.boolean(),
  significantDigits: z.number().int(),
  /** Absent in validations stored before the adaptive verdict: they read as decided. */
  decided: z.boolean().optional(),
  intervalEndTolerance: number.optional(),
});

export const snapshotSchema = z.object({
  engineVersion: z.string(),
  computedAt: z.string(),
  seed: z.number().int(),
  trials: z.number().int(),
  /** The plan exactly as computed, with the library data inline. */
  plan: planSchema,
  items: z.array(usedItemSchema),
  budget: budgetSchema,
  monteCarlo: monteCarloSchema,
  validation: validationSchema,
  /** The budget's warnings as the lab policy kept them when it was computed: the ones to show and print. */
  warnings: z.array(storedWarningSchema),
});
export type Snapshot = z.output<typeof snapshotSchema>;
