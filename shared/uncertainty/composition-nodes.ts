import { atomicWeightOf, type AtomicWeightTable } from './atomic-weights';
import type { Composition } from './chemical-formula';
import type { ModelBuilder, NodeReference } from './model-builder';
import { PlanError, type PlanPathSegment } from './plan-error';

/**
 * Molar mass node M = Σ nᵢ·Aᵢ (g/mol). Each element's atomic weight is one source for the whole
 * plan ('atomic-weight:Pb'), so a compound and the analyte it contains share it and the
 * stoichiometric factor's correlation is exact.
 */
export function molarMassNode(
  builder: ModelBuilder,
  composition: Composition,
  table: AtomicWeightTable,
  stepIndex: number,
  path: PlanPathSegment[],
): NodeReference {
  const terms = [...composition].map(([symbol, count]) => {
    const weight = atomicWeightOf(symbol, path, table);
    const node = builder.source({
      id: `atomic-weight:${symbol}`,
      label: `Atomic weight of ${symbol}`,
      category: 'atomicWeight',
      estimate: weight.value,
      unit: 'g/mol',
      distribution: { shape: 'rectangular', halfWidth: weight.halfWidth },
      sharing: 'item',
      stepIndex,
      path,
    });
    return builder.scale(node, count);
  });
  return builder.sum(terms);
}

/**
 * Number of analyte units (element atoms or ions) per formula unit of the compound: the stated
 * count, or the common ratio of element counts (Pb(NO3)2 holds 2 NO3); @throws PlanError when no whole ratio exists.
 */
export function analyteCountIn(
  compound: Composition,
  analyte: Composition,
  statedCount: number | undefined,
  path: PlanPathSegment[],
): number {
  if (statedCount !== undefined) return statedCount;
  const ratios = [...analyte].map(([symbol, count]) => (compound.get(symbol) ?? 0) / count);
  const [first] = ratios;
  if (first > 0 && Number.isInteger(first) && ratios.every((ratio) => ratio === first)) return first;
  throw new PlanError(
    [...path, 'analyteCount'],
    'Cannot tell how many analyte units one formula unit of this material holds; give analyteCount (e.g. 1 for Pb in Pb(NO3)2).',
  );
}
