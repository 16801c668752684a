import { z } from 'zod';
import { MAXIMUM_FORMULA_LENGTH, MAXIMUM_MONTE_CARLO_TRIALS } from '../uncertainty/plan-limits';
import { concentrationUnitNames } from '../uncertainty/units';
import type { EquipmentItem } from './library';
import { approvedAsSchema, reviewSchema } from './reviews';
import { snapshotSchema } from './snapshot';

/**
 * Preparations and their versions. The plan is the engine's plan document (shared/uncertainty
 * planSchema) with every library item carrying its libraryId; the server resolves those to the
 * lab's current revisions before computing, so the stored numbers come from the library, not
 * from the browser.
 */

/** draft → (prepared: actual readings recorded) → submitted → approved, or returned to the analyst. */
export const PREPARATION_STATUSES = ['draft', 'prepared', 'submitted', 'approved', 'returned'] as const;
export const preparationStatusSchema = z.enum(PREPARATION_STATUSES);
export type PreparationStatus = z.infer<typeof preparationStatusSchema>;

export const titleSchema = z
  .string()
  .trim()
  .min(1, 'Give the preparation a title.')
  .max(200, 'Use at most 200 characters.');

/**
 * An item whose calibration is overdue or whose material has expired is used only with a recorded reason.
 * The server's plan resolver and the planner's checks both ask this.
 */
export const needsOverrideReason = (item: Pick<EquipmentItem, 'calibration' | 'expiry'>): boolean =>
  item.calibration === 'overdue' || item.expiry === 'expired';

/** The reason recorded for using such an item: the server stores it, the planner checks it with the same words. */
export const overrideReasonSchema = z
  .string()
  .trim()
  .min(3, 'Say why this item may be used, in a few words (at least 3 characters).')
  .max(500, 'Use at most 500 characters.');

export const overrideSchema = z.object({
  libraryId: z.string().min(1),
  reason: overrideReasonSchema,
});
export type Override = z.infer<typeof overrideSchema>;

export const seedSchema = z.number().int().min(0).max(4294967295, 'The seed is a whole number from 0 to 4294967295.');

/** What the planner saves (autosave sends the same). The plan is checked by the engine, not here. */
export const preparationWriteSchema = z.object({
  title: titleSchema,
  plan: z.record(z.string(), z.unknown()),
  overrides: z.array(overrideSchema).max(50).default([]),
  seed: seedSchema.optional(),
});
export type PreparationWrite = z.input<typeof preparationWriteSchema>;

export const preparationListQuerySchema = z.object({
  status: preparationStatusSchema.optional(),
  analyst: z.coerce.number().int().positive().optional(),
  material: z.string().trim().max(40).optional(),
  from: z.iso.date({ message: 'Give the date as YYYY-MM-DD.' }).optional(),
  to: z.iso.date({ message: 'Give the date as YYYY-MM-DD.' }).optional(),
  q: z.string().trim().max(200).optional(),
});
/** The list filters, as the API's query takes them (all optional). */
export type PreparationListFilter = z.output<typeof preparationListQuerySchema>;

const MASS_NOT_A_NUMBER = 'Enter the mass as a number, e.g. 0.15990.';

/**
 * A mass actually weighed at the bench for one step (the planned value stays in the record). The server
 * validates with it and the readings form resolves with it, so each rule and its words live here only.
 */
export const readingSchema = z
  .object({
    stepIndex: z.number().int().min(0),
    actualMassG: z
      .number({
        error: (issue) =>
          issue.input === undefined ? 'Enter the net mass weighed, or the tare and gross.' : MASS_NOT_A_NUMBER,
      })
      .positive('The mass weighed must be greater than zero.')
      .refine(Number.isFinite, MASS_NOT_A_NUMBER),
    tareG: z.number({ message: MASS_NOT_A_NUMBER }).nonnegative('The tare cannot be negative.').optional(),
    grossG: z.number({ message: MASS_NOT_A_NUMBER }).positive('The gross must be greater than zero.').optional(),
  })
  .refine((reading) => reading.tareG === undefined || reading.grossG === undefined || reading.grossG > reading.tareG, {
    path: ['grossG'],
    message: 'The gross must be more than the tare.',
    // Checked whenever both are numbers, even while the net is still missing.
    when: ({ value }) => {
      const { tareG, grossG } = (value ?? {}) as { tareG?: unknown; grossG?: unknown };
      return typeof tareG === 'number' && typeof grossG === 'number' && tareG >= 0;
    },
  });

export const readingsRequestSchema = z.object({
  readings: z.array(readingSchema).min(1, 'Enter at least one mass weighed.').max(20),
  deviations: z.string().trim().max(2000, 'Use at most 2000 characters.').default(''),
});
export type ReadingsRequest = z.input<typeof readingsRequestSchema>;

/** What was recorded at the bench, with the planned value each reading replaced. */
export const recordedReadingsSchema = z.object({
  recordedAt: z.string(),
  recordedBy: z.string(),
  deviations: z.string(),
  readings: z.array(
    z.object({
      stepIndex: z.number().int(),
      field: z.enum(['netMassG', 'finalMassG', 'solventMassG']),
      plannedG: z.number(),
      actualG: z.number(),
      tareG: z.number().nullable(),
      grossG: z.number().nullable(),
    }),
  ),
});
export type RecordedReadings = z.infer<typeof recordedReadingsSchema>;

/** Where the plan is wrong, when it cannot be computed (the draft is kept as it is). */
export const planProblemSchema = z.object({ path: z.array(z.union([z.string(), z.number()])), message: z.string() });
export type PlanProblem = z.infer<typeof planProblemSchema>;

export const versionSummarySchema = z.object({
  id: z.number().int(),
  number: z.number().int(),
  status: preparationStatusSchema,
  createdBy: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
  resultStatement: z.string().nullable(),
  /** The version's state lets its plan change (shared/domain/version-lifecycle.ts); who may is in allowedActions. */
  editable: z.boolean(),
});
export type VersionSummary = z.infer<typeof versionSummarySchema>;

export const preparationSummarySchema = z.object({
  id: z.number().int(),
  title: z.string(),
  analyte: z.string(),
  materialCode: z.string().nullable(),
  createdBy: z.string(),
  createdById: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
  latestVersion: versionSummarySchema,
  value: z.number().nullable(),
  unit: z.string().nullable(),
  relativeExpandedUncertainty: z.number().nullable(),
});
export type PreparationSummary = z.infer<typeof preparationSummarySchema>;

/**
 * What the signed-in member may do with a version now, computed by the server from the version
 * lifecycle (shared/domain/version-lifecycle.ts) and the permission table; the client shows actions from it.
 */
export const allowedActionsSchema = z.object({
  edit: z.boolean(),
  submit: z.boolean(),
  withdraw: z.boolean(),
  recordReadings: z.boolean(),
  /** Approve (signed with the password) or return with comments. */
  review: z.boolean(),
  startNewVersion: z.boolean(),
  /** Why this member of QA may not review the submitted version (it is their own work), or null. */
  reviewRefusal: z.string().nullable(),
});
export type AllowedActions = z.infer<typeof allowedActionsSchema>;

/** A version in full: the plan as saved, and the computed snapshot (null while the plan has a problem). */
export const versionDetailSchema = versionSummarySchema.extend({
  plan: z.record(z.string(), z.unknown()),
  overrides: z.array(overrideSchema),
  seed: z.number().int(),
  problem: planProblemSchema.nullable(),
  /** Decoded from the stored JSON on the server and from the response on the client (see snapshot.ts). */
  snapshot: snapshotSchema.nullable(),
  snapshotSha256: z.string().nullable(),
  /** Approved versions: the title, analyte, preparation name and lab name frozen at approval (null before they were stored). */
  approvedAs: approvedAsSchema.nullable().default(null),
  /** Approved versions: the SHA-256 signed, over the snapshot hash and the frozen fields. */
  recordSha256: z.string().nullable().default(null),
  /** The masses actually weighed, once the solution has been prepared; null while only planned. */
  readings: recordedReadingsSchema.nullable().default(null),
  /** Submissions, returns with their comments, and the signed approval, oldest first. */
  reviews: z.array(reviewSchema).default([]),
  /** For the member who asked. */
  allowedActions: allowedActionsSchema,
});
export type VersionDetail = z.infer<typeof versionDetailSchema>;

export const preparationDetailSchema = preparationSummarySchema.extend({
  versions: z.array(versionSummarySchema),
  current: versionDetailSchema,
});
export type PreparationDetail = z.infer<typeof preparationDetailSchema>;

export const routeFinderRequestSchema = z.object({
  target: z.object({
    value: z
      .number({ message: 'Enter the target concentration as a number.' })
      .positive('The target must be greater than zero.'),
    unit: z.enum(concentrationUnitNames, { message: `Choose a unit: ${concentrationUnitNames.join(', ')}.` }),
  }),
  analyte: z
    .string()
    .trim()
    .min(1, 'Enter the analyte, e.g. Pb.')
    .max(MAXIMUM_FORMULA_LENGTH, `Write the analyte in at most ${MAXIMUM_FORMULA_LENGTH} characters.`),
  materialLibraryId: z.string().min(1, 'Choose the reference material.'),
  maximumDilutions: z.number().int().min(0).max(3).default(3),
  limit: z.number().int().min(1).max(50).default(10),
});

/**
 * POST /compute: a budget for a plan, nothing stored. Without `trials` Monte Carlo is the adaptive verdict run a stored
 * version gets; with it, a fixed run of that many trials (load tests).
 */
export const computeRequestSchema = z.object({
  plan: z.record(z.string(), z.unknown()),
  overrides: z.array(overrideSchema).max(50).default([]),
  seed: seedSchema.default(1),
  trials: z
    .number()
    .int()
    .min(1000, 'Use at least 1000 trials.')
    .max(MAXIMUM_MONTE_CARLO_TRIALS, 'Use at most 10⁶ trials.')
    .optional(),
});
