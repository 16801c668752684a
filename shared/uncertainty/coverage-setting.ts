import { coverageFactor, normalCoverageProbability, twoSigmaProbability } from './coverage-factor';

/** How the expanded uncertainty is formed: a coverage probability (k from Student t at ν_eff) or a fixed k. */
export type CoverageSetting = { probability: 0.9545 | 0.95 } | { k: number };

/** The probability used for intervals: 0.9545 stands for 2Φ(2) − 1 exactly; a fixed k gives 2Φ(k) − 1. */
export function coverageProbabilityOf(setting: CoverageSetting): number {
  if ('k' in setting) return normalCoverageProbability(setting.k);
  return setting.probability === 0.9545 ? twoSigmaProbability : 0.95;
}

/** k for the setting: fixed, or t_p(ν_eff) (JCGM 100:2008 G.4). */
export function coverageFactorOf(setting: CoverageSetting, effectiveDegreesOfFreedom: number): number {
  if ('k' in setting) return setting.k;
  return coverageFactor(coverageProbabilityOf(setting), effectiveDegreesOfFreedom);
}
