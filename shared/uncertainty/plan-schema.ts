import { z } from 'zod';
import { airBuoyancySettingSchema } from './air-buoyancy';
import { certifiedSolutionDensitySettingSchema } from './certified-solution-density';
import { MAXIMUM_COVERAGE_FACTOR } from './coverage-factor';
import { extraSourceSchema } from './distribution-schema';
import {
  balanceSchema,
  certifiedSolutionSchema,
  formulaSchema,
  glassPipetteSchema,
  pistonPipetteSchema,
  solidMaterialSchema,
  volumetricFlaskSchema,
} from './equipment-schema';
import { MAXIMUM_EXTRA_SOURCES_PER_STEP, MAXIMUM_PLAN_STEPS } from './plan-limits';
import { MONTE_CARLO_INTERVALS } from './result-statement';
import { concentrationUnitNames } from './units';

const positive = (what: string) => z.number().finite().positive(`${what} must be greater than zero.`);
const nonNegative = (what: string) => z.number().finite().nonnegative(`${what} must be zero or positive.`);
const extraSources = z
  .array(extraSourceSchema)
  .max(MAXIMUM_EXTRA_SOURCES_PER_STEP, {
    error: (issue) =>
      `A step can have at most ${MAXIMUM_EXTRA_SOURCES_PER_STEP} extra sources; it has ${(issue.input as unknown[]).length}.`,
  })
  .default([]);

const weighSolidStep = z
  .object({
    kind: z.literal('weighSolid'),
    material: solidMaterialSchema,
    balance: balanceSchema,
    /** Net mass weighed by difference (gross reading − tare reading). */
    netMassG: positive('The net mass'),
    /** Container on the pan, for the capacity check. */
    containerMassG: nonNegative('The container mass').default(0),
    /**
     * Before settings.airBuoyancy existed: the air and weights densities for the buoyancy correction. Read now
     * as "correct every weighing of the plan with these densities" (air density without uncertainty) when
     * settings.airBuoyancy is left out; settings.airBuoyancy, when given, governs instead.
     */
    airBuoyancy: z
      .object({
        airDensityKgPerM3: positive('The air density').default(1.2),
        weightDensityKgPerM3: positive('The density of the weights').default(8000),
      })
      .strict()
      .optional(),
    extraSources,
  })
  .strict();

const startFromCertifiedSolutionStep = z
  .object({ kind: z.literal('startFromCertifiedSolution'), material: certifiedSolutionSchema, extraSources })
  .strict();

const makeUpToVolumeStep = z
  .object({
    kind: z.literal('makeUpToVolume'),
    flask: volumetricFlaskSchema,
    /**
     * The solution previously made in this flask (by an earlier step of the plan) was transferred to a storage
     * bottle or used up, and the flask rinsed, before this step; the aliquot for this step is taken from the bottle.
     */
    flaskEmptiedBefore: z.boolean().optional(),
    extraSources,
  })
  .strict();

const pipetteAliquotStep = z
  .object({
    kind: z.literal('pipetteAliquot'),
    pipette: z.discriminatedUnion('kind', [glassPipetteSchema, pistonPipetteSchema]),
    /** Delivered volume: the nominal volume of a glass pipette, the set volume of a piston pipette. */
    volumeMl: positive('The aliquot volume'),
    extraSources,
  })
  .strict();

const weighAliquotStep = z
  .object({
    kind: z.literal('weighAliquot'),
    balance: balanceSchema,
    netMassG: positive('The aliquot mass'),
    containerMassG: nonNegative('The container mass').default(0),
    extraSources,
  })
  .strict();

const makeUpToMassStep = z
  .object({
    kind: z.literal('makeUpToMass'),
    balance: balanceSchema,
    /** Total mass of the diluted solution, weighed by difference against the empty container. */
    finalMassG: positive('The final solution mass'),
    containerMassG: nonNegative('The container mass').default(0),
    extraSources,
  })
  .strict();

const dissolveInSolventStep = z
  .object({
    kind: z.literal('dissolveInSolvent'),
    balance: balanceSchema,
    solventMassG: positive('The solvent mass'),
    containerMassG: nonNegative('The container mass').default(0),
    extraSources,
  })
  .strict();

export const stepSchema = z.discriminatedUnion('kind', [
  weighSolidStep,
  startFromCertifiedSolutionStep,
  makeUpToVolumeStep,
  pipetteAliquotStep,
  weighAliquotStep,
  makeUpToMassStep,
  dissolveInSolventStep,
]);

export const coverageSchema = z.union([
  z
    .object({
      probability: z.union([z.literal(0.9545), z.literal(0.95)], {
        error: 'The coverage probability is 0.9545 (k = 2 for a normal distribution) or 0.95.',
      }),
    })
    .strict(),
  z
    .object({
      k: z
        .number()
        .finite()
        .positive('The coverage factor k must be greater than zero.')
        .max(MAXIMUM_COVERAGE_FACTOR, `The coverage factor k can be at most ${MAXIMUM_COVERAGE_FACTOR}.`),
    })
    .strict(),
]);

export const settingsSchema = z
  .object({
    /** Used for the density of water (Tanaka et al. 2001). */
    labTemperatureC: z.number().min(0).max(40).default(20),
    /** Half-range of the actual temperature about labTemperatureC; rectangular. */
    temperatureHalfRangeC: nonNegative('The temperature half-range').default(3),
    /** Volumetric expansion coefficient of the (aqueous) solution. */
    solutionExpansionPerC: nonNegative('The expansion coefficient').default(2.1e-4),
    /** Temperature at which the concentration is stated (lab policy; default 20 °C); volumes are corrected to it. */
    referenceTemperatureC: z.number().min(0).max(40).optional(),
    /** Cubic expansion coefficient of the glassware (default 1×10⁻⁵ K⁻¹, borosilicate 3.3). */
    glassExpansionPerC: nonNegative('The glass expansion coefficient').optional(),
    /**
     * 'perUse' (default): each volume has its own temperature deviation over ± temperatureHalfRangeC.
     * 'sharedLab': one lab-temperature deviation over ± temperatureHalfRangeC shared by every volume, plus a
     * per-use difference over ± operationTemperatureHalfRangeC.
     */
    temperatureTreatment: z.enum(['perUse', 'sharedLab']).optional(),
    /** Half-range of one operation's temperature about the lab's, rectangular, with 'sharedLab' (default 0.5 °C). */
    operationTemperatureHalfRangeC: nonNegative('The per-operation temperature half-range').optional(),
    /** Correlation r (0–1, default 0) of the linearity errors of the tare and gross readings of one weighing. */
    linearityCorrelation: z
      .number()
      .min(0, 'The linearity correlation lies between 0 and 1.')
      .max(1, 'The linearity correlation lies between 0 and 1.')
      .optional(),
    /** The correlation applies when the net mass is at most this fraction of the balance's capacity (default 0.1). */
    linearityCorrelationNetFraction: z
      .number()
      .gt(0, 'The fraction of the capacity lies above 0 and at most 1.')
      .max(1, 'The fraction of the capacity lies above 0 and at most 1.')
      .optional(),
    coverage: coverageSchema.default({ probability: 0.9545 }),
    defaultGlasswareDistribution: z.enum(['triangular', 'rectangular']).default('triangular'),
    /**
     * The Monte Carlo interval stated when the GUM interval is not validated (JCGM 101:2008 7.7), from the lab
     * policy; left out (as in every plan stored before it existed) it is the probabilistically symmetric one. No
     * default is filled in, so a stored snapshot encodes back to the very text it was stored with.
     */
    monteCarloInterval: z.enum(MONTE_CARLO_INTERVALS).optional(),
    outputUnit: z.enum(concentrationUnitNames, {
      error: `Unknown unit. Use one of: ${concentrationUnitNames.join(', ')}.`,
    }),
    /** Density of the prepared solutions; water at labTemperatureC when left out. */
    solutionDensity: z
      .object({
        densityGPerMl: positive('The density'),
        standardUncertaintyGPerMl: nonNegative('The density uncertainty'),
      })
      .strict()
      .optional(),
    /** Air buoyancy on every weighing (OIML R 111-1 / D 28); left out: weighings are not corrected, as before. */
    airBuoyancy: airBuoyancySettingSchema.optional(),
    /** Density of a certified solution whose certificate gives none; left out: water's, with a warning. */
    certifiedSolutionDensity: certifiedSolutionDensitySettingSchema.optional(),
  })
  .strict();

/** The plan document: what is prepared, from what, with which equipment, step by step. */
export const planSchema = z
  .object({
    formatVersion: z.literal(1),
    title: z.string().optional(),
    /** The element or ion whose concentration is stated, as a formula: "Pb", "Se", "NO3". */
    analyte: z.object({ formula: formulaSchema }).strict(),
    settings: settingsSchema,
    steps: z
      .array(stepSchema)
      .min(1, 'A plan needs at least one step.')
      .max(MAXIMUM_PLAN_STEPS, {
        error: (issue) =>
          `A plan can have at most ${MAXIMUM_PLAN_STEPS} steps; this one has ${(issue.input as unknown[]).length}.`,
      }),
  })
  .strict();

export type Plan = z.infer<typeof planSchema>;
export type PlanInput = z.input<typeof planSchema>;
export type PlanStep = Plan['steps'][number];

/**
 * Defaults of the settings added after plans were first stored. They are filled in where the engine reads the
 * settings (settingsWithDefaults), not by the schema, so a stored plan decodes to exactly what was stored.
 */
const LATER_SETTING_DEFAULTS = {
  referenceTemperatureC: 20,
  glassExpansionPerC: 1e-5,
  temperatureTreatment: 'perUse',
  operationTemperatureHalfRangeC: 0.5,
  linearityCorrelation: 0,
  linearityCorrelationNetFraction: 0.1,
} as const;

export type EngineSettings = Plan['settings'] & {
  [Key in keyof typeof LATER_SETTING_DEFAULTS]-?: NonNullable<Plan['settings'][Key]>;
};

/** The plan's settings with every later setting filled in from its default. */
export function settingsWithDefaults(settings: Plan['settings']): EngineSettings {
  return {
    ...settings,
    referenceTemperatureC: settings.referenceTemperatureC ?? LATER_SETTING_DEFAULTS.referenceTemperatureC,
    glassExpansionPerC: settings.glassExpansionPerC ?? LATER_SETTING_DEFAULTS.glassExpansionPerC,
    temperatureTreatment: settings.temperatureTreatment ?? LATER_SETTING_DEFAULTS.temperatureTreatment,
    operationTemperatureHalfRangeC:
      settings.operationTemperatureHalfRangeC ?? LATER_SETTING_DEFAULTS.operationTemperatureHalfRangeC,
    linearityCorrelation: settings.linearityCorrelation ?? LATER_SETTING_DEFAULTS.linearityCorrelation,
    linearityCorrelationNetFraction:
      settings.linearityCorrelationNetFraction ?? LATER_SETTING_DEFAULTS.linearityCorrelationNetFraction,
  };
}
