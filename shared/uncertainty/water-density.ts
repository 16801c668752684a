import { PlanError, type PlanPathSegment } from './plan-error';

/**
 * Density of air-free pure water (SMOW) at 1 atm, Tanaka et al., Metrologia 38 (2001) 301, eq. 1:
 * ρ(t) = a₅·[1 − (t + a₁)²·(t + a₂) / (a₃·(t + a₄))], valid 0–40 °C, with
 * a₁ = −3.983035 °C, a₂ = 301.797 °C, a₃ = 522528.9 °C², a₄ = 69.34881 °C, a₅ = 999.974950 kg/m³.
 * @throws PlanError outside 0–40 °C
 * @example waterDensityKgPerM3(20) // 998.2067
 */
export function waterDensityKgPerM3(
  temperatureC: number,
  path: PlanPathSegment[] = ['settings', 'labTemperatureC'],
): number {
  if (!(temperatureC >= 0 && temperatureC <= 40)) {
    throw new PlanError(
      path,
      `The water-density formula of Tanaka et al. (2001) holds from 0 °C to 40 °C; got ${temperatureC} °C.`,
    );
  }
  const a1 = -3.983035;
  const a2 = 301.797;
  const a3 = 522528.9;
  const a4 = 69.34881;
  const a5 = 999.97495;
  return a5 * (1 - ((temperatureC + a1) ** 2 * (temperatureC + a2)) / (a3 * (temperatureC + a4)));
}
