import { z } from 'zod';
import type { VersionDetail } from '../../../../shared/contracts/preparations';

/** JSON turns an infinite ν_eff into null; null here means "infinitely many". */
const degreesSchema = z.number().nullable();

const groupSchema = z.object({ key: z.string(), label: z.string(), contribution: z.number(), indexPercent: z.number() });

/** The parts of a stored budget the record page shows (the full budget is in the workspace and the PDF). */
const budgetViewSchema = z.object({
  measurand: z.string(),
  unit: z.string(),
  value: z.number(),
  standardUncertainty: z.number(),
  relativeExpandedUncertainty: z.number(),
  effectiveDegreesOfFreedom: degreesSchema,
  coverageProbability: z.number(),
  coverageFactor: z.number(),
  expandedUncertainty: z.number(),
  statement: z.string(),
  byStep: z.array(groupSchema),
  rounded: z.object({ valueText: z.string(), uncertaintyText: z.string() }),
});

const intervalSchema = z.object({ low: z.number(), high: z.number() });

const monteCarloViewSchema = z.object({
  trials: z.number(),
  seed: z.number(),
  mean: z.number(),
  standardDeviation: z.number(),
  coverageProbability: z.number(),
  symmetricInterval: intervalSchema,
});

const validationViewSchema = z.object({
  passed: z.boolean(),
  lowEndDifference: z.number(),
  highEndDifference: z.number(),
  numericalTolerance: z.number(),
});

export type BudgetView = z.infer<typeof budgetViewSchema>;
export type MonteCarloView = z.infer<typeof monteCarloViewSchema>;
export type ValidationView = z.infer<typeof validationViewSchema>;
type Snapshot = NonNullable<VersionDetail['snapshot']>;

export type SnapshotView = {
  budget: BudgetView;
  /** Null when the stored Monte Carlo or its validation has a shape this page does not read. */
  monteCarlo: MonteCarloView | null;
  validation: ValidationView | null;
  /** The plan exactly as computed, with the library data inline. */
  plan: Snapshot['plan'];
  items: Snapshot['items'];
  warnings: string[];
  engineVersion: string;
  computedAt: string;
};

/** The stored snapshot read for display, or null when it has no budget this page can read. */
export function readSnapshot(snapshot: VersionDetail['snapshot']): SnapshotView | null {
  if (!snapshot) return null;
  const budget = budgetViewSchema.safeParse(snapshot.budget);
  if (!budget.success) return null;
  const monteCarlo = monteCarloViewSchema.safeParse(snapshot.monteCarlo);
  const validation = validationViewSchema.safeParse(snapshot.validation);
  return {
    budget: budget.data,
    monteCarlo: monteCarlo.success ? monteCarlo.data : null,
    validation: validation.success ? validation.data : null,
    plan: snapshot.plan,
    items: snapshot.items,
    warnings: snapshot.warnings,
    engineVersion: snapshot.engineVersion,
    computedAt: snapshot.computedAt,
  };
}
