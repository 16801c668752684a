import { z } from 'zod';
import type { NodeReference } from './model-builder';
import type { PlanPathSegment } from './plan-error';
import type { StepContext } from './step-context';

const positive = (what: string) => z.number().finite().positive(`${what} must be greater than zero.`);
const nonNegative = (what: string) => z.number().finite().nonnegative(`${what} must be zero or positive.`);

/**
 * The plan's one air-buoyancy setting, applied to every weighing (OIML R 111-1; OIML D 28):
 * 'correct' turns each balance reading W into a mass m = W·(1 − ρ_a/ρ_w)/(1 − ρ_a/ρ), with ρ the density of
 * what is on the pan; 'boundAsUncertainty' leaves W uncorrected and adds the bias B − 1 as a rectangular term.
 * The air density ρ_a is one rectangular source shared by every weighing of the plan (mean ± half-range);
 * ρ_w = 8000 kg/m³ is the conventional density of the weights (OIML R 111-1).
 */
export const airBuoyancySettingSchema = z
  .object({
    treatment: z.enum(['correct', 'boundAsUncertainty'], {
      error: 'Choose whether air buoyancy is corrected or bounded as an uncertainty.',
    }),
    airDensityKgPerM3: positive('The air density').max(2, 'The air density is at most 2 kg/m³.').default(1.2),
    airDensityHalfRangeKgPerM3: nonNegative('The half-range of the air density').default(0),
    weightDensityKgPerM3: positive('The density of the weights').default(8000),
  })
  .strict()
  .refine((setting) => setting.airDensityHalfRangeKgPerM3 < setting.airDensityKgPerM3, {
    message: 'The half-range of the air density must be smaller than the air density.',
    path: ['airDensityHalfRangeKgPerM3'],
  });
export type AirBuoyancySetting = z.output<typeof airBuoyancySettingSchema>;

/** What lies on the pan: its density as a node of the model (kg/m³) and its estimate, and a name for messages. */
export interface WeighedSubstance {
  densityKgPerM3: NodeReference;
  densityEstimateKgPerM3: number;
}

/**
 * The buoyancy factor B = (1 − ρ_a/ρ_w)/(1 − ρ_a/ρ) that turns a reading into a mass (OIML R 111-1; D 28).
 * @example buoyancyFactor(1.2, 8000, 998.2067) // 1.0010534 (water at 20 °C)
 */
export function buoyancyFactor(airKgPerM3: number, weightsKgPerM3: number, substanceKgPerM3: number): number {
  return (1 - airKgPerM3 / weightsKgPerM3) / (1 - airKgPerM3 / substanceKgPerM3);
}

/**
 * The mass on the pan from a net reading, under the plan's setting (none: the reading itself, as before the
 * setting existed).
 * - correct: m = W·B(ρ_a, ρ), ρ_a one source for the plan, so weighings of like substances share its error and
 *   a gravimetric ratio (aliquot mass / final mass) cancels it, as it does at the bench.
 * - boundAsUncertainty (OIML D 28): m = W·(1 + δ·(B(ρ) − 1)/(B(ρ_water) − 1)), with δ one rectangular source of
 *   half-width |B(ρ_water) − 1|, the bias of weighing water. Each weighing's term is thus rectangular of
 *   half-width |B(ρ) − 1| and all of them move together, so in a ratio of weighings of like substances
 *   they cancel, and a ratio of unlike ones keeps exactly the difference of their biases.
 * `waterKgPerM3` is water at the lab temperature, the reference of the bounded term.
 */
export function massOnThePan(
  context: StepContext,
  readingG: NodeReference,
  substance: WeighedSubstance,
  setting: AirBuoyancySetting | undefined,
  waterKgPerM3: number,
): NodeReference {
  if (setting === undefined) return readingG;
  const { builder } = context;
  const air = setting.airDensityKgPerM3;
  const weights = setting.weightDensityKgPerM3;
  const settingPath: PlanPathSegment[] = ['settings', 'airBuoyancy'];
  if (setting.treatment === 'correct') {
    const airNode =
      setting.airDensityHalfRangeKgPerM3 > 0
        ? builder.source({
            id: 'plan:air-density',
            label: 'Air density in the weighing room (one value for every weighing)',
            category: 'airBuoyancy',
            estimate: air,
            unit: 'kg/m³',
            distribution: { shape: 'rectangular', halfWidth: setting.airDensityHalfRangeKgPerM3 },
            sharing: 'item',
            stepIndex: context.stepIndex,
            path: [...settingPath, 'airDensityHalfRangeKgPerM3'],
          })
        : builder.constant(air);
    const one = builder.constant(1);
    const factor = builder.divide(
      builder.subtract(one, builder.divide(airNode, builder.constant(weights))),
      builder.subtract(one, builder.divide(airNode, substance.densityKgPerM3)),
    );
    return builder.multiply(readingG, factor);
  }
  const waterBias = buoyancyFactor(air, weights, waterKgPerM3) - 1;
  const bias = builder.source({
    id: 'plan:air-buoyancy-uncorrected',
    label: 'Air buoyancy, not corrected (OIML D 28): relative bias of a weighing of water',
    category: 'airBuoyancy',
    estimate: 0,
    unit: '1',
    distribution: { shape: 'rectangular', halfWidth: Math.abs(waterBias) },
    sharing: 'item',
    stepIndex: context.stepIndex,
    path: [...settingPath, 'treatment'],
  });
  const relative = (buoyancyFactor(air, weights, substance.densityEstimateKgPerM3) - 1) / waterBias;
  return builder.multiply(readingG, builder.add(builder.constant(1), builder.scale(bias, relative)));
}
