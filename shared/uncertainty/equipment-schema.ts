import { z } from 'zod';
import { distributionSchema } from './distribution-schema';
import { MAXIMUM_FORMULA_LENGTH } from './plan-limits';

const positive = (what: string) => z.number().finite().positive(`${what} must be greater than zero.`);
const nonNegative = (what: string) => z.number().finite().nonnegative(`${what} must be zero or positive.`);

/** A chemical formula as written in a plan: "Pb(NO3)2". Its bracket nesting is checked when it is read. */
export const formulaSchema = z
  .string()
  .min(1, 'The formula is empty.')
  .max(MAXIMUM_FORMULA_LENGTH, {
    error: (issue) =>
      `A formula can have at most ${MAXIMUM_FORMULA_LENGTH} characters; this one has ${String(issue.input).length}.`,
  });

/** Fields every equipment item carries: a stable id for the physical item, and optional library references. */
const itemFields = {
  /** Stable id of the physical item (asset tag); systematic sources are keyed by it. */
  itemId: z.string().min(1, 'Every item needs an itemId (its asset tag).'),
  description: z.string().optional(),
  /** Server only: the tolerance-library entry the inline data were resolved from. */
  libraryId: z.string().optional(),
  revisionId: z.string().optional(),
};

/** Where a calibration result comes from, for its budget label. */
const calibrationSourceFields = {
  certificate: z.string().optional(),
  /** Calibration date, YYYY-MM-DD. */
  date: z.string().optional(),
};

export const balanceSchema = z
  .object({
    kind: z.literal('balance'),
    ...itemFields,
    capacityG: positive('The balance capacity'),
    /** Scale interval d. */
    readabilityG: nonNegative('The readability d'),
    /** Standard deviation s of repeated readings. */
    repeatabilityG: nonNegative('The repeatability s'),
    /**
     * Number n of readings s was computed from: when given, each reading's repeatability is a Type A source with
     * ν = n − 1 (JCGM 100:2008 4.2), so Welch–Satterthwaite counts it and Monte Carlo draws it from t_ν; when absent,
     * s is taken as exactly known (normal, ν = ∞).
     */
    repeatabilityReadings: z
      .number()
      .int('The number of readings behind s must be a whole number.')
      .min(2, 'The number of readings behind s must be at least 2.')
      .optional(),
    /** Linearity ± a, per reading, rectangular. */
    linearityG: nonNegative('The linearity'),
    /** Relative expanded uncertainty of the sensitivity (calibration) with its k, shared by every weighing on this balance. */
    sensitivity: z
      .object({
        relativeExpandedUncertainty: nonNegative('The relative sensitivity uncertainty'),
        coverageFactor: positive('The coverage factor k'),
        /**
         * Relative correction of the indication from the calibration certificate (true = indication·(1 + c)).
         * When given, the sensitivity source is this calibration result: estimate c, normal with the U and k above.
         */
        relativeCorrection: z.number().finite().optional(),
        ...calibrationSourceFields,
      })
      .strict()
      .optional(),
  })
  .strict();

const glasswareFields = {
  ...itemFields,
  nominalMl: positive('The nominal volume'),
  toleranceClass: z.enum(['A', 'B', 'own']),
  /** Maximum permissible error ± (ISO 1042:1998 for flasks, ISO 648:2008 for pipettes), or the item's own calibration. */
  toleranceMl: nonNegative('The tolerance'),
  /** Defaults to the plan's settings.defaultGlasswareDistribution. */
  toleranceDistribution: z.enum(['triangular', 'rectangular']).optional(),
  /** Standard deviation of filling to the mark, per use. */
  fillRepeatabilityMl: nonNegative('The fill repeatability').default(0),
  calibrationTemperatureC: z.number().default(20),
  /** The item's calibration result; when given it replaces the tolerance: V = V₀ + correction, u = U/k (normal). */
  calibration: z
    .object({
      correctionMl: z.number().finite(),
      expandedUncertaintyMl: nonNegative('The calibration uncertainty'),
      coverageFactor: positive('The coverage factor k'),
      ...calibrationSourceFields,
    })
    .strict()
    .optional(),
};

export const volumetricFlaskSchema = z.object({ kind: z.literal('volumetricFlask'), ...glasswareFields }).strict();
export const glassPipetteSchema = z.object({ kind: z.literal('glassPipette'), ...glasswareFields }).strict();

const errorAmountSchema = z.union([
  z.object({ absoluteUl: nonNegative('The error') }).strict(),
  z.object({ percent: nonNegative('The error') }).strict(),
]);

export const pistonPipetteSchema = z
  .object({
    kind: z.literal('pistonPipette'),
    ...itemFields,
    /** Selectable volumes; minimumUl = maximumUl for a fixed-volume pipette. */
    volumeRangeUl: z
      .object({ minimumUl: positive('The smallest volume'), maximumUl: positive('The largest volume') })
      .strict(),
    /**
     * ISO 8655-2:2002 maximum permissible errors at given volumes: systematic (± about the set volume)
     * and random (a standard deviation), each in µL or % of that volume. Between listed volumes the
     * errors in µL are interpolated linearly; beyond them the nearest entry's µL value applies.
     */
    errorSpecifications: z
      .array(
        z
          .object({
            volumeUl: positive('The volume'),
            systematicError: errorAmountSchema,
            randomError: errorAmountSchema,
          })
          .strict(),
      )
      .min(1, 'Give the maximum permissible errors for at least one volume.'),
    systematicErrorDistribution: z.enum(['rectangular', 'triangular']).default('rectangular'),
    calibrationTemperatureC: z.number().default(20),
    /**
     * Calibration results: the correction (µL) at each calibrated volume with its U and k. At a set volume within
     * the calibrated volumes (interpolated linearly between them) the correction replaces the systematic error;
     * outside them the maximum permissible systematic error applies.
     */
    calibration: z
      .object({
        points: z
          .array(
            z
              .object({
                volumeUl: positive('The calibrated volume'),
                correctionUl: z.number().finite(),
                expandedUncertaintyUl: nonNegative('The calibration uncertainty'),
                coverageFactor: positive('The coverage factor k'),
              })
              .strict(),
          )
          .min(1, 'Give the correction at one volume at least.'),
        ...calibrationSourceFields,
      })
      .strict()
      .optional(),
  })
  .strict();

/** A value from a material's certificate (g/mol) with its uncertainty and where it comes from. */
function certificateValueSchema(what: string) {
  return z
    .object({
      valueGPerMol: positive(what),
      uncertainty: distributionSchema,
      /** e.g. "certificate lot 2291, isotopic analysis". */
      source: z.string().min(1, 'Say where the value comes from, e.g. the certificate and its lot.'),
    })
    .strict();
}

export const solidMaterialSchema = z
  .object({
    kind: z.literal('solidMaterial'),
    ...itemFields,
    name: z.string().min(1),
    formula: formulaSchema,
    purity: z
      .object({
        massFraction: z
          .number()
          .gt(0, 'Purity must be greater than 0.')
          .lte(1, 'Purity is a mass fraction and cannot exceed 1 (100 %).'),
        uncertainty: distributionSchema,
      })
      .strict(),
    /** Analyte units per formula unit; inferred from the formulas when left out. */
    analyteCount: z.number().int().positive().optional(),
    /** For air buoyancy (settings.airBuoyancy): the solid's density, kg/m³ (the library keeps g/cm³). */
    densityKgPerM3: positive('The density').optional(),
    /**
     * The lot's molar mass of the compound from its certificate: one source for M(compound) in place of the
     * standard atomic weights of its elements (CIAAW 2021; Possolo et al. 2018 for a material of known provenance).
     */
    certificateMolarMass: certificateValueSchema('The molar mass').optional(),
    /** The lot's atomic weight of one element of the compound from its certificate, in place of the standard one. */
    certificateAtomicWeight: certificateValueSchema('The atomic weight')
      .extend({ element: z.string().regex(/^[A-Z][a-z]?$/, 'Name the element by its symbol, e.g. Pb.') })
      .optional(),
  })
  .strict()
  .refine((material) => !(material.certificateMolarMass && material.certificateAtomicWeight), {
    message: 'Give the certificate’s molar mass or its atomic weight of the analyte, not both.',
    path: ['certificateAtomicWeight'],
  });

export const certifiedSolutionSchema = z
  .object({
    kind: z.literal('certifiedSolution'),
    ...itemFields,
    name: z.string().min(1),
    certifiedValue: z.number().finite().positive('The certified value must be greater than zero.'),
    /** A mass concentration (g/L, mg/L, µg/L, ng/L) or mass fraction (g/kg, mg/kg, µg/kg) unit. */
    certifiedUnit: z.enum(['g/L', 'mg/L', 'µg/L', 'ng/L', 'g/kg', 'mg/kg', 'µg/kg'], {
      error:
        'A certified value is a mass concentration (g/L, mg/L, µg/L, ng/L) or a mass fraction (g/kg, mg/kg, µg/kg).',
    }),
    /** Certificate uncertainty, in certifiedUnit (usually normal with U and k). */
    uncertainty: distributionSchema,
    densityGPerMl: positive('The density').optional(),
    densityStandardUncertaintyGPerMl: nonNegative('The density uncertainty').optional(),
    /** The solution's matrix as the certificate names it ("2 % HNO3"), matched in the lab's density table. */
    matrix: z.string().max(120).optional(),
  })
  .strict();

export type Balance = z.infer<typeof balanceSchema>;
export type VolumetricFlask = z.infer<typeof volumetricFlaskSchema>;
export type GlassPipette = z.infer<typeof glassPipetteSchema>;
export type PistonPipette = z.infer<typeof pistonPipetteSchema>;
export type SolidMaterial = z.infer<typeof solidMaterialSchema>;
export type CertifiedSolution = z.infer<typeof certifiedSolutionSchema>;
