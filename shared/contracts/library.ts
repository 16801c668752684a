import { z } from 'zod';
import { matrixKey } from '../uncertainty/certified-solution-density';
import { molarMass } from '../uncertainty/chemical-formula';
import { MAXIMUM_COVERAGE_FACTOR } from '../uncertainty/coverage-factor';
import { PlanError } from '../uncertainty/plan-error';
import { molarMassDisagreement } from './material-composition-text';
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

/**
 * A calibration result, when entered, is complete: the correction with its U, its k and the calibration date
 * (the engine applies the correction and uses U/k in place of the tolerance; the budget names the certificate
 * and date).
 */
const CALIBRATION_INCOMPLETE =
  'Give the calibration correction with its U, its k and the calibration date, or leave all of them empty.';
const calibrationComplete = (parts: unknown[], calibratedOn: string | null) =>
  parts.every((part) => part === null) || (parts.every((part) => part !== null) && calibratedOn !== null);

export const toleranceDistributionSchema = z.enum(['triangular', 'rectangular'], {
  message: 'Choose triangular or rectangular.',
});

export const balanceDataSchema = z
  .object({
    ...common,
    capacityG: positive('the capacity'),
    readabilityG: positive('the readability d'),
    repeatabilityG: nonNegative('the repeatability s'),
    /** Number of readings behind s (Type A, ν = n − 1); null when not known (s taken as exact). */
    repeatabilityReadings: z
      .number({ error: 'Give the number of readings behind s as a whole number, or leave it empty.' })
      .int('Give the number of readings behind s as a whole number, or leave it empty.')
      .min(2, 'The repeatability s needs at least 2 readings.')
      .max(10_000, 'Give at most 10 000 readings.')
      .nullable()
      .default(null),
    linearityG: nonNegative('the linearity'),
    /** Relative expanded uncertainty of the calibration (sensitivity), e.g. 0.00002 for 20 ppm, with its k. */
    sensitivityRelativeExpanded: nonNegative('the relative calibration uncertainty'),
    sensitivityCoverageFactor: positive('the coverage factor k'),
    /** Relative correction of the indication from the calibration certificate (e.g. 0.00001); its U and k are the two above. */
    calibrationCorrectionRelative: finite('the relative calibration correction').nullable().default(null),
    ...calibrationDates,
  })
  .refine((v) => v.readabilityG < v.capacityG, {
    message: 'The readability must be smaller than the capacity.',
    path: ['readabilityG'],
  })
  .refine((v) => calibrationComplete([v.calibrationCorrectionRelative], v.calibratedOn), {
    message: 'Give the date of the calibration that found this correction.',
    path: ['calibratedOn'],
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
  /** The item's calibration result at its nominal volume; null: the tolerance applies. */
  calibrationCorrectionMl: finite('the calibration correction').nullable().default(null),
  calibrationExpandedUncertaintyMl: nonNegative('the calibration uncertainty U').nullable().default(null),
  calibrationCoverageFactor: positive('the coverage factor k').nullable().default(null),
  ...calibrationDates,
};
const glasswareCalibrationComplete = (v: {
  calibrationCorrectionMl: number | null;
  calibrationExpandedUncertaintyMl: number | null;
  calibrationCoverageFactor: number | null;
  calibratedOn: string | null;
}) =>
  calibrationComplete(
    [v.calibrationCorrectionMl, v.calibrationExpandedUncertaintyMl, v.calibrationCoverageFactor],
    v.calibratedOn,
  );
const GLASSWARE_CALIBRATION_MESSAGE = { message: CALIBRATION_INCOMPLETE, path: ['calibrationCorrectionMl'] };
const toleranceBelowNominal = (v: { toleranceMl: number; nominalMl: number }) => v.toleranceMl < v.nominalMl;
const TOLERANCE_MESSAGE = { message: 'The tolerance must be smaller than the nominal volume.', path: ['toleranceMl'] };

export const flaskDataSchema = z
  .object(glasswareShape)
  .refine(toleranceBelowNominal, TOLERANCE_MESSAGE)
  .refine(glasswareCalibrationComplete, GLASSWARE_CALIBRATION_MESSAGE)
  .refine(datesInOrder, DATES_ORDER_MESSAGE);
export const glassPipetteDataSchema = z
  .object(glasswareShape)
  .refine(toleranceBelowNominal, TOLERANCE_MESSAGE)
  .refine(glasswareCalibrationComplete, GLASSWARE_CALIBRATION_MESSAGE)
  .refine(datesInOrder, DATES_ORDER_MESSAGE);
export type GlasswareData = z.infer<typeof flaskDataSchema>;

/** One calibration point of a piston pipette: errors at a set volume (ISO 8655-2:2002 MPEs or the lab's own results). */
export const pistonPointSchema = z.object({
  volumeUl: positive('the set volume'),
  systematicErrorUl: nonNegative('the systematic error'),
  randomErrorUl: nonNegative('the random error'),
  /** Calibration result at this volume: the correction (µL) with its U; k is the pipette's calibrationCoverageFactor. */
  correctionUl: finite('the calibration correction').nullable().default(null),
  correctionExpandedUl: nonNegative('the calibration uncertainty U').nullable().default(null),
});

export const pistonPipetteDataSchema = z
  .object({
    ...common,
    adjustable: z.boolean(),
    minVolumeUl: positive('the smallest volume'),
    maxVolumeUl: positive('the nominal (largest) volume'),
    errorBasis: z.enum(['iso-8655', 'own'], { message: 'Choose ISO 8655-2 limits or own calibration.' }),
    points: z.array(pistonPointSchema).min(1, 'Give the errors at one volume at least.').max(10),
    /** k of the calibration corrections' U; null when no correction is entered. */
    calibrationCoverageFactor: positive('the coverage factor k').nullable().default(null),
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
  .refine(
    (v) => {
      const corrected = v.points.filter((p) => p.correctionUl !== null || p.correctionExpandedUl !== null);
      return (
        corrected.length === 0 ||
        calibrationComplete(
          [...corrected.flatMap((p) => [p.correctionUl, p.correctionExpandedUl]), v.calibrationCoverageFactor],
          v.calibratedOn,
        )
      );
    },
    { message: CALIBRATION_INCOMPLETE, path: ['points'] },
  )
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
    /** Density in g/cm³ as chemists write it (safety data sheet or certificate), for air buoyancy; stored as given. */
    densityGPerCm3: positive('the density')
      .refine((v) => v <= 25, 'Give the density in g/cm³, e.g. 2.165 for sodium chloride.')
      .nullable()
      .default(null),
    /**
     * The lot's values from its certificate (docs/plan-format.md, "Atomic weights per lot"): the compound's molar
     * mass, checked against the formula and, with its uncertainty, used in place of the standard atomic weights;
     * or the analyte's atomic weight with its uncertainty. Expanded U with k (k = 1: a standard uncertainty).
     */
    certificateMolarMassGPerMol: positive('the molar mass').nullable().default(null),
    certificateMolarMassExpandedUncertaintyGPerMol: nonNegative('the molar mass’s uncertainty')
      .nullable()
      .default(null),
    certificateMolarMassCoverageFactor: positive('the coverage factor k').nullable().default(null),
    analyteAtomicWeightGPerMol: positive('the atomic weight').nullable().default(null),
    analyteAtomicWeightExpandedUncertaintyGPerMol: nonNegative('the atomic weight’s uncertainty')
      .nullable()
      .default(null),
    analyteAtomicWeightCoverageFactor: positive('the coverage factor k').nullable().default(null),
    /** Where the lot's molar mass or atomic weight comes from, e.g. "certificate lot 2291, isotopic analysis". */
    compositionSource: optionalText(200),
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
  )
  .superRefine(checkCertificateComposition);
export type SolidMaterialData = z.infer<typeof solidMaterialDataSchema>;

/** The lot's molar mass or atomic weight: each with a value, U with its k, a source; one of them in the model. */
function checkCertificateComposition(
  v: {
    formula: string;
    analyte: string;
    certificateMolarMassGPerMol: number | null;
    certificateMolarMassExpandedUncertaintyGPerMol: number | null;
    certificateMolarMassCoverageFactor: number | null;
    analyteAtomicWeightGPerMol: number | null;
    analyteAtomicWeightExpandedUncertaintyGPerMol: number | null;
    analyteAtomicWeightCoverageFactor: number | null;
    compositionSource: string;
  },
  context: z.RefinementCtx,
) {
  const refuse = (path: string, message: string) => context.addIssue({ code: 'custom', path: [path], message });
  const molarMassU = v.certificateMolarMassExpandedUncertaintyGPerMol;
  if ((molarMassU === null) !== (v.certificateMolarMassCoverageFactor === null))
    refuse(
      'certificateMolarMassCoverageFactor',
      'Give the molar mass’s expanded uncertainty with its coverage factor k (k = 1 for a standard uncertainty).',
    );
  if (molarMassU !== null && v.certificateMolarMassGPerMol === null)
    refuse('certificateMolarMassGPerMol', 'Give the molar mass its uncertainty belongs to.');
  const atomicWeight = v.analyteAtomicWeightGPerMol;
  if (
    atomicWeight !== null &&
    (v.analyteAtomicWeightExpandedUncertaintyGPerMol === null || v.analyteAtomicWeightCoverageFactor === null)
  )
    refuse(
      'analyteAtomicWeightExpandedUncertaintyGPerMol',
      'Give the atomic weight’s expanded uncertainty with its coverage factor k (k = 1 for a standard uncertainty).',
    );
  if (atomicWeight === null && v.analyteAtomicWeightExpandedUncertaintyGPerMol !== null)
    refuse('analyteAtomicWeightGPerMol', 'Give the atomic weight its uncertainty belongs to.');
  if (atomicWeight !== null && molarMassU !== null)
    refuse(
      'analyteAtomicWeightGPerMol',
      'Give the lot’s molar mass with an uncertainty or the analyte’s atomic weight, not both: either one replaces the standard atomic weights.',
    );
  if (atomicWeight !== null && !/^[A-Z][a-z]?$/.test(v.analyte))
    refuse(
      'analyteAtomicWeightGPerMol',
      `An atomic weight belongs to an element; the analyte ${v.analyte} is not one.`,
    );
  if ((atomicWeight !== null || molarMassU !== null) && v.compositionSource === '')
    refuse('compositionSource', 'Say where the value comes from, e.g. "certificate lot 2291, isotopic analysis".');
  const lot = atomicWeight === null ? undefined : { element: v.analyte, valueGPerMol: atomicWeight };
  const disagreement =
    v.certificateMolarMassGPerMol === null
      ? null
      : molarMassDisagreement(v.formula, v.certificateMolarMassGPerMol, lot);
  if (disagreement !== null) refuse('certificateMolarMassGPerMol', disagreement);
}

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

/**
 * Air buoyancy on every weighing (OIML R 111-1 / D 28): correct each (the default: GUM 3.2.4 asks for a
 * correction of every recognised significant systematic effect), or leave it and bound it as an uncertainty.
 * The air density of the weighing room: mean and half-range (rectangular); 1.2 kg/m³ is OIML R 111's
 * reference, ± 0.05 kg/m³ common practice for a lab near sea level.
 */
export const airBuoyancyPolicySchema = z
  .object({
    treatment: z.enum(['correct', 'boundAsUncertainty'], {
      message: 'Choose whether weighings are corrected for air buoyancy or the effect is an uncertainty.',
    }),
    airDensityKgPerM3: positive('the air density').refine((v) => v <= 2, 'Give the air density in kg/m³, e.g. 1.2.'),
    airDensityHalfRangeKgPerM3: nonNegative('the half-range of the air density'),
  })
  .refine((v) => v.airDensityHalfRangeKgPerM3 < v.airDensityKgPerM3, {
    message: 'The half-range must be smaller than the air density.',
    path: ['airDensityHalfRangeKgPerM3'],
  });
const DEFAULT_AIR_BUOYANCY_POLICY = {
  treatment: 'correct',
  airDensityKgPerM3: 1.2,
  airDensityHalfRangeKgPerM3: 0.05,
} as const satisfies z.input<typeof airBuoyancyPolicySchema>;

/** One row of the lab's table of matrix densities (matched to a certified solution's matrix). */
export const matrixDensityRowSchema = z.object({
  matrix: z.string().trim().min(1, 'Name the matrix, e.g. 2 % HNO3.').max(120, 'Use at most 120 characters.'),
  densityGPerMl: positive('the density').refine((v) => v <= 3, 'Give the density in g/mL, e.g. 1.0098.'),
  standardUncertaintyGPerMl: nonNegative('the standard uncertainty'),
});

/**
 * The density of a certified solution whose certificate gives none, when a plan converts between per mass
 * and per volume: the lab's matrix table, else refuse (the default: a 1 % bias must not pass unseen), or take
 * water's density at the lab temperature with the standard uncertainty set here, and warn.
 */
export const solutionDensityPolicySchema = z
  .object({
    matrixDensities: z.array(matrixDensityRowSchema).max(50, 'The table can hold at most 50 matrices.'),
    otherwise: z.enum(['refuse', 'assumeWater'], {
      message: 'Choose whether a solution of unknown density is refused or taken as water.',
    }),
    waterStandardUncertaintyGPerMl: nonNegative('the uncertainty of the assumed density').refine(
      (v) => v <= 0.5,
      'Give the uncertainty in g/mL, e.g. 0.006.',
    ),
  })
  .refine(
    (v) => {
      const keys = v.matrixDensities.map((row) => matrixKey(row.matrix));
      return new Set(keys).size === keys.length;
    },
    { message: 'Each matrix appears once in the table.', path: ['matrixDensities'] },
  );
const DEFAULT_SOLUTION_DENSITY_POLICY = {
  matrixDensities: [],
  otherwise: 'refuse',
  // ± 0.01 g/mL rectangular (dilute acid matrices up to a few %; common practice) → u ≈ 0.006 g/mL.
  waterStandardUncertaintyGPerMl: 0.006,
} as const satisfies z.input<typeof solutionDensityPolicySchema>;

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
  // Fields added later carry defaults, so a policy stored before them still reads (as today's treatment).
  /** Temperature the concentrations are stated at; volumes are corrected to it. */
  referenceTemperatureC: finite('the reference temperature')
    .refine((v) => v >= 0 && v <= 40, 'Give a reference temperature between 0 and 40 °C.')
    .default(20),
  /** 'perUse': an independent temperature effect per use; 'sharedLab': one shared lab deviation plus a per-use difference. */
  temperatureTreatment: z
    .enum(['perUse', 'sharedLab'], { message: 'Choose independent per use, or one shared lab temperature.' })
    .default('perUse'),
  operationTemperatureHalfRangeC: nonNegative('the per-operation half-range')
    .refine((v) => v <= 20, 'Give a half-range of at most 20 °C.')
    .default(0.5),
  /** Correlation of the linearity errors of the tare and gross readings of one weighing; 0 = independent. */
  linearityCorrelation: finite('the linearity correlation')
    .refine((v) => v >= 0 && v <= 1, 'Give a correlation between 0 and 1.')
    .default(0),
  /** The correlation applies when the net mass is at most this fraction of the balance's capacity. */
  linearityCorrelationNetFraction: finite('the fraction of the capacity')
    .refine((v) => v > 0 && v <= 1, 'Give a fraction of the capacity above 0 and at most 1 (e.g. 0.1 for 10 %).')
    .default(0.1),
  // Policies stored before these fields read with the defaults (docs/plan-format.md says why these).
  airBuoyancy: airBuoyancyPolicySchema.default(DEFAULT_AIR_BUOYANCY_POLICY),
  solutionDensity: solutionDensityPolicySchema.default(DEFAULT_SOLUTION_DENSITY_POLICY),
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
  referenceTemperatureC: 20,
  temperatureTreatment: 'perUse',
  operationTemperatureHalfRangeC: 0.5,
  linearityCorrelation: 0,
  linearityCorrelationNetFraction: 0.1,
  airBuoyancy: DEFAULT_AIR_BUOYANCY_POLICY,
  solutionDensity: DEFAULT_SOLUTION_DENSITY_POLICY,
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
