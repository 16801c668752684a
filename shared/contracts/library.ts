import { z } from 'zod';
import { molarMass } from '../uncertainty/chemical-formula';
import { MAXIMUM_COVERAGE_FACTOR } from '../uncertainty/coverage-factor';
import { PlanError } from '../uncertainty/plan-error';
import { MONTE_CARLO_INTERVALS } from '../uncertainty/result-statement';

/**
 * The lab's tolerance library: what QA records for each kind of item. Every number carries its
 * unit in its name. These schemas validate the API, the forms and each row of a CSV import.
 */

export const EQUIPMENT_KINDS = [
  'balance',
  'flask',
  'glass-pipette',
  'piston-pipette',
  'solid-material',
  'solution-material',
] as const;
export const equipmentKindSchema = z.enum(EQUIPMENT_KINDS, {
  message: `Choose a kind: ${EQUIPMENT_KINDS.join(', ')}.`,
});
export type EquipmentKind = z.infer<typeof equipmentKindSchema>;

export const KIND_LABELS: Record<EquipmentKind, string> = {
  balance: 'Balance',
  flask: 'Volumetric flask',
  'glass-pipette': 'Glass pipette',
  'piston-pipette': 'Piston pipette',
  'solid-material': 'Reference material (solid)',
  'solution-material': 'Reference material (certified solution)',
};

const finite = (what: string) =>
  z.number({ message: `Enter ${what} as a number.` }).refine(Number.isFinite, `Enter ${what} as a finite number.`);
const positive = (what: string) =>
  finite(what).refine((v) => v > 0, `${what[0].toUpperCase()}${what.slice(1)} must be greater than zero.`);
const nonNegative = (what: string) =>
  finite(what).refine((v) => v >= 0, `${what[0].toUpperCase()}${what.slice(1)} cannot be negative.`);
const isoDate = (what: string) => z.iso.date({ message: `Enter ${what} as a date (YYYY-MM-DD).` });
const optionalText = (max: number) => z.string().trim().max(max, `Use at most ${max} characters.`).default('');

export const itemCodeSchema = z
  .string()
  .trim()
  .min(1, 'Enter the ID or asset tag.')
  .max(40, 'Use at most 40 characters.')
  .regex(
    /^[A-Za-z0-9][A-Za-z0-9 ._/-]*$/,
    'Use letters, digits, spaces and . _ / - only, starting with a letter or digit.',
  );

const common = {
  code: itemCodeSchema,
  description: optionalText(200),
  certificateReference: optionalText(120),
};

const calibrationDates = {
  calibratedOn: isoDate('the calibration date').nullable().default(null),
  calibrationDueOn: isoDate('the calibration due date').nullable().default(null),
};

const datesInOrder = (value: { calibratedOn: string | null; calibrationDueOn: string | null }) =>
  !value.calibratedOn || !value.calibrationDueOn || value.calibrationDueOn >= value.calibratedOn;
const DATES_ORDER_MESSAGE = {
  message: 'The due date must not be before the calibration date.',
  path: ['calibrationDueOn'],
};

export const toleranceDistributionSchema = z.enum(['triangular', 'rectangular'], {
  message: 'Choose triangular or rectangular.',
});

export const balanceDataSchema = z
  .object({
    ...common,
    capacityG: positive('the capacity'),
    readabilityG: positive('the readability d'),
    repeatabilityG: nonNegative('the repeatability s'),
    linearityG: nonNegative('the linearity'),
    /** Relative expanded uncertainty of the calibration (sensitivity), e.g. 0.00002 for 20 ppm, with its k. */
    sensitivityRelativeExpanded: nonNegative('the relative calibration uncertainty'),
    sensitivityCoverageFactor: positive('the coverage factor k'),
    ...calibrationDates,
  })
  .refine((v) => v.readabilityG < v.capacityG, {
    message: 'The readability must be smaller than the capacity.',
    path: ['readabilityG'],
  })
  .refine(datesInOrder, DATES_ORDER_MESSAGE);
export type BalanceData = z.infer<typeof balanceDataSchema>;

export const glasswareClassSchema = z.enum(['A', 'B', 'own'], {
  message: 'Choose class A, class B or own calibration.',
});

const glasswareShape = {
  ...common,
  nominalMl: positive('the nominal volume'),
  glassClass: glasswareClassSchema,
  toleranceMl: positive('the tolerance'),
  /** null: use the lab policy's default distribution for glassware tolerances. */
  toleranceDistribution: toleranceDistributionSchema.nullable().default(null),
  fillRepeatabilityMl: nonNegative('the fill repeatability'),
  calibrationTemperatureC: finite('the calibration temperature')
    .refine((v) => v >= 0 && v <= 40, 'Give a calibration temperature between 0 and 40 °C.')
    .default(20),
  ...calibrationDates,
};
const toleranceBelowNominal = (v: { toleranceMl: number; nominalMl: number }) => v.toleranceMl < v.nominalMl;
const TOLERANCE_MESSAGE = { message: 'The tolerance must be smaller than the nominal volume.', path: ['toleranceMl'] };

export const flaskDataSchema = z
  .object(glasswareShape)
  .refine(toleranceBelowNominal, TOLERANCE_MESSAGE)
  .refine(datesInOrder, DATES_ORDER_MESSAGE);
export const glassPipetteDataSchema = z
  .object(glasswareShape)
  .refine(toleranceBelowNominal, TOLERANCE_MESSAGE)
  .refine(datesInOrder, DATES_ORDER_MESSAGE);
export type GlasswareData = z.infer<typeof flaskDataSchema>;

/** One calibration point of a piston pipette: errors at a set volume (ISO 8655-2:2002 MPEs or the lab's own results). */
export const pistonPointSchema = z.object({
  volumeUl: positive('the set volume'),
  systematicErrorUl: nonNegative('the systematic error'),
  randomErrorUl: nonNegative('the random error'),
});

export const pistonPipetteDataSchema = z
  .object({
    ...common,
    adjustable: z.boolean(),
    minVolumeUl: positive('the smallest volume'),
    maxVolumeUl: positive('the nominal (largest) volume'),
    errorBasis: z.enum(['iso-8655', 'own'], { message: 'Choose ISO 8655-2 limits or own calibration.' }),
    points: z.array(pistonPointSchema).min(1, 'Give the errors at one volume at least.').max(10),
    ...calibrationDates,
  })
  .refine((v) => v.minVolumeUl <= v.maxVolumeUl, {
    message: 'The smallest volume must not exceed the nominal volume.',
    path: ['minVolumeUl'],
  })
  .refine((v) => v.adjustable || v.minVolumeUl === v.maxVolumeUl, {
    message: 'A fixed-volume pipette has one volume: make both equal.',
    path: ['minVolumeUl'],
  })
  .refine((v) => v.points.every((p) => p.volumeUl >= v.minVolumeUl && p.volumeUl <= v.maxVolumeUl), {
    message: 'Every calibration volume must lie within the pipette’s range.',
    path: ['points'],
  })
  .refine(datesInOrder, DATES_ORDER_MESSAGE);
export type PistonPipetteData = z.infer<typeof pistonPipetteDataSchema>;

const materialCommon = {
  ...common,
  name: z.string().trim().min(1, 'Enter the material’s name.').max(200),
  lot: z.string().trim().min(1, 'Enter the lot number.').max(80),
  supplier: optionalText(200),
  expiresOn: isoDate('the expiry date'),
  hazardNotes: optionalText(1000),
};

export const purityUncertaintySchema = z.discriminatedUnion('shape', [
  z.object({
    shape: z.literal('normal'),
    expandedUncertainty: nonNegative('the expanded uncertainty'),
    coverageFactor: positive('the coverage factor k'),
  }),
  z.object({ shape: z.literal('rectangular'), halfWidth: nonNegative('the half-width') }),
]);

export const solidMaterialDataSchema = z
  .object({
    ...materialCommon,
    formula: z
      .string()
      .trim()
      .min(1, 'Enter the chemical formula, e.g. Pb(NO3)2.')
      .max(80)
      // Refused where it is typed: the engine reads the formula the same way when a plan uses the material.
      .superRefine((formula, context) => {
        try {
          molarMass(formula);
        } catch (error) {
          if (!(error instanceof PlanError)) throw error;
          context.addIssue({ code: 'custom', message: error.message });
        }
      }),
    /** Element or ion reported, e.g. 'Pb'; the stoichiometric factor comes from the formulas. */
    analyte: z.string().trim().min(1, 'Enter the analyte, e.g. Pb.').max(40),
    purity: finite('the purity').refine(
      (v) => v > 0 && v <= 1,
      'Give the purity as a mass fraction between 0 and 1, e.g. 0.9998.',
    ),
    purityUncertainty: purityUncertaintySchema,
  })
  .refine(
    (v) =>
      (v.purityUncertainty.shape === 'normal'
        ? v.purityUncertainty.expandedUncertainty
        : v.purityUncertainty.halfWidth) < v.purity,
    {
      message: 'The purity’s uncertainty must be smaller than the purity.',
      path: ['purityUncertainty'],
    },
  );
export type SolidMaterialData = z.infer<typeof solidMaterialDataSchema>;

export const certifiedUnitSchema = z.enum(['mg/L', 'mg/kg'], { message: 'Choose mg/L or mg/kg.' });

export const solutionMaterialDataSchema = z
  .object({
    ...materialCommon,
    analyte: z.string().trim().min(1, 'Enter the analyte, e.g. Se.').max(40),
    certifiedValue: positive('the certified value'),
    certifiedUnit: certifiedUnitSchema,
    expandedUncertainty: nonNegative('the expanded uncertainty'),
    coverageFactor: positive('the coverage factor k'),
    matrix: optionalText(120),
    densityGPerMl: positive('the density').nullable().default(null),
    densityUncertaintyGPerMl: nonNegative('the density uncertainty').nullable().default(null),
    openedOn: isoDate('the date opened').nullable().default(null),
  })
  .refine((v) => v.expandedUncertainty < v.certifiedValue, {
    message: 'The uncertainty must be smaller than the certified value.',
    path: ['expandedUncertainty'],
  })
  .refine((v) => v.densityUncertaintyGPerMl === null || v.densityGPerMl !== null, {
    message: 'Give the density with its uncertainty.',
    path: ['densityGPerMl'],
  });
export type SolutionMaterialData = z.infer<typeof solutionMaterialDataSchema>;

export const equipmentDataSchemas = {
  balance: balanceDataSchema,
  flask: flaskDataSchema,
  'glass-pipette': glassPipetteDataSchema,
  'piston-pipette': pistonPipetteDataSchema,
  'solid-material': solidMaterialDataSchema,
  'solution-material': solutionMaterialDataSchema,
} as const satisfies Record<EquipmentKind, z.ZodType>;

export const reasonSchema = z
  .string()
  .trim()
  .min(3, 'Say why, in a few words.')
  .max(500, 'Use at most 500 characters.');

export const equipmentCreateSchema = z.object({
  kind: equipmentKindSchema,
  data: z.record(z.string(), z.unknown()),
  reason: z.string().trim().max(500).optional(),
});
export const equipmentReviseSchema = z.object({ data: z.record(z.string(), z.unknown()), reason: reasonSchema });
export const equipmentRetireSchema = z.object({ reason: reasonSchema });

export const calibrationStateSchema = z.enum(['ok', 'due-soon', 'overdue', 'not-tracked']);
export const expiryStateSchema = z.enum(['ok', 'expires-soon', 'expired', 'not-applicable']);

export const certificateSchema = z.object({
  id: z.number().int(),
  revisionId: z.number().int(),
  revisionNumber: z.number().int(),
  originalName: z.string(),
  mediaType: z.string(),
  sizeBytes: z.number().int(),
  sha256: z.string(),
  /** A PDF that can run JavaScript (stored, but to be opened only with scripts turned off). */
  containsScript: z.boolean().default(false),
  uploadedBy: z.string(),
  uploadedAt: z.string(),
});
export type Certificate = z.infer<typeof certificateSchema>;

export const revisionSchema = z.object({
  id: z.number().int(),
  number: z.number().int(),
  data: z.record(z.string(), z.unknown()),
  reason: z.string(),
  createdBy: z.string(),
  createdAt: z.string(),
});
export type Revision = z.infer<typeof revisionSchema>;

export const equipmentItemSchema = z.object({
  id: z.number().int(),
  kind: equipmentKindSchema,
  code: z.string(),
  status: z.enum(['active', 'retired']),
  retiredReason: z.string().nullable(),
  current: revisionSchema,
  calibration: calibrationStateSchema,
  expiry: expiryStateSchema,
  /** USP <41> minimum net weight in g, for balances. */
  minimumWeightG: z.number().nullable(),
  certificateCount: z.number().int(),
  /** Plain words for each flag, for lists and plans. */
  flags: z.array(z.string()),
});
export type EquipmentItem = z.infer<typeof equipmentItemSchema>;

export const equipmentDetailSchema = equipmentItemSchema.extend({
  revisions: z.array(revisionSchema),
  certificates: z.array(certificateSchema),
});
export type EquipmentDetail = z.infer<typeof equipmentDetailSchema>;

export const equipmentListQuerySchema = z.object({
  kind: equipmentKindSchema.optional(),
  status: z.enum(['active', 'retired', 'all']).default('active'),
});

export const labPolicySchema = z.object({
  coverage: z.discriminatedUnion('mode', [
    z.object({
      mode: z.literal('probability'),
      probability: z.union([z.literal(0.9545), z.literal(0.95)], { message: 'Choose 95.45 % or 95 %.' }),
    }),
    z.object({
      mode: z.literal('fixed-k'),
      k: positive('the coverage factor k').refine(
        (v) => v <= MAXIMUM_COVERAGE_FACTOR,
        `Give k at most ${MAXIMUM_COVERAGE_FACTOR}.`,
      ),
    }),
  ]),
  glasswareDistribution: toleranceDistributionSchema,
  temperatureHalfRangeC: positive('the temperature half-range').refine(
    (v) => v <= 20,
    'Give a half-range of at most 20 °C.',
  ),
  minimumWeightRule: z.boolean(),
  /** The Monte Carlo interval a result states when Monte Carlo does not validate GUM; a policy stored before it read symmetric. */
  monteCarloInterval: z
    .enum(MONTE_CARLO_INTERVALS, { message: 'Choose the probabilistically symmetric or the shortest interval.' })
    .default('symmetric'),
});
export type LabPolicy = z.infer<typeof labPolicySchema>;

export const labPolicyResponseSchema = labPolicySchema.extend({
  updatedAt: z.string().nullable(),
  updatedBy: z.string().nullable(),
});

/** The policy of a lab that has not set one (common practice for a lab kept at 20 ± 4 °C). */
export const DEFAULT_LAB_POLICY: LabPolicy = {
  coverage: { mode: 'probability', probability: 0.9545 },
  glasswareDistribution: 'triangular',
  temperatureHalfRangeC: 4,
  minimumWeightRule: true,
  monteCarloInterval: 'symmetric',
};

export const importRequestSchema = z.object({
  kind: equipmentKindSchema,
  csv: z.string().min(1, 'The file is empty.').max(2_000_000, 'The file is larger than 2 MB.'),
  dryRun: z.boolean().default(true),
});
export const importRowResultSchema = z.object({
  line: z.number().int(),
  code: z.string(),
  action: z.enum(['create', 'revise', 'unchanged', 'error']),
  errors: z.array(z.object({ column: z.string(), message: z.string() })),
});
export const importResultSchema = z.object({
  kind: equipmentKindSchema,
  dryRun: z.boolean(),
  written: z.boolean(),
  rows: z.array(importRowResultSchema),
  errorCount: z.number().int(),
});
export type ImportResult = z.infer<typeof importResultSchema>;
