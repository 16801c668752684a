import type { EngineWarning } from './engine-warning';
import type { SourceCategory } from './model-types';

/** Above this share of u_c² one atomic-weight source dominates (the planner's dominant-step share, common practice). */
const DOMINANT_ATOMIC_WEIGHT_PERCENT = 50;

/**
 * A warning for each atomic-weight source holding more than half of the variance u_c²: a standard atomic weight
 * ('atomic-weight:Pb'), or a lot's value from its certificate ('item:<id>:atomic-weight:Pb', 'item:<id>:molar-mass').
 * Better equipment cannot lower it; the lot's certificate can (CIAAW; Possolo et al. 2018, from memory).
 */
export function dominantAtomicWeightWarnings(
  rows: readonly { sourceId: string; category: SourceCategory; stepIndices: number[]; indexPercent: number }[],
): EngineWarning[] {
  return rows
    .filter((row) => row.category === 'atomicWeight' && row.indexPercent > DOMINANT_ATOMIC_WEIGHT_PERCENT)
    .map((row) => {
      const lot = /^item:(.+):(?:atomic-weight:([A-Z][a-z]?)|molar-mass)$/.exec(row.sourceId);
      const standard = /^atomic-weight:([A-Z][a-z]?)$/.exec(row.sourceId);
      return {
        code: 'dominantAtomicWeight',
        stepIndex: Math.min(...row.stepIndices),
        params: {
          element: lot ? (lot[2] ?? null) : (standard?.[1] ?? null),
          itemId: lot ? lot[1] : null,
          indexPercent: row.indexPercent,
        },
      };
    });
}
