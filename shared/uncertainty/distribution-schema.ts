import { z } from 'zod';

const width = (what: string) => z.number().finite().nonnegative(`${what} must be zero or positive.`);

/** A source's distribution in a plan (see distributions.ts for the formulas). */
export const distributionSchema = z.union([
  z
    .object({
      shape: z.literal('normal'),
      standardUncertainty: width('The standard uncertainty'),
      degreesOfFreedom: z.number().min(1).optional(),
    })
    .strict(),
  z
    .object({
      shape: z.literal('normal'),
      expandedUncertainty: width('The expanded uncertainty'),
      coverageFactor: z.number().positive('The coverage factor k must be greater than zero.'),
      degreesOfFreedom: z.number().min(1).optional(),
    })
    .strict(),
  z.object({ shape: z.literal('rectangular'), halfWidth: width('The half-width') }).strict(),
  z.object({ shape: z.literal('triangular'), halfWidth: width('The half-width') }).strict(),
  z.object({ shape: z.literal('arcsine'), halfWidth: width('The half-width') }).strict(),
  z
    .object({
      shape: z.literal('studentT'),
      standardDeviation: width('The standard deviation'),
      observations: z.number().int().min(2, 'A Type A evaluation needs at least 2 observations.'),
      meanOfReadings: z.boolean(),
    })
    .strict(),
]);

/** A user-named extra source on a step ("evaporation", "analyst-to-analyst"). */
export const extraSourceSchema = z
  .object({
    name: z.string().min(1),
    /**
     * 'relative': a dimensionless relative deviation of the step's result (estimate 0);
     * 'absolute': a deviation in the step's own quantity (g for weighings, mL for volumes,
     * the certificate's unit for a certified solution), estimate 0.
     */
    effect: z.enum(['relative', 'absolute']),
    distribution: distributionSchema,
  })
  .strict();
