import { atomicWeightOf, type AtomicWeightTable } from './atomic-weights';
import type { Composition } from './chemical-formula';
import type { SolidMaterial } from './equipment-schema';
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
  /** An element's atomic weight for this material's lot, in place of its standard atomic weight. */
  lotAtomicWeights: ReadonlyMap<string, NodeReference> = new Map(),
): NodeReference {
  const terms = [...composition].map(([symbol, count]) => {
    const lot = lotAtomicWeights.get(symbol);
    if (lot !== undefined) return builder.scale(lot, count);
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

/** Whether a material's certificate gives its lot's molar mass or an atomic weight (see materialMolarMassNodes). */
export function hasCertificateComposition(material: SolidMaterial): boolean {
  return material.certificateMolarMass !== undefined || material.certificateAtomicWeight !== undefined;
}

/**
 * M(compound) and M(analyte) for a material whose certificate gives its lot's values (CIAAW: a material of
 * known provenance may use its own atomic weights in place of the standard ones; Possolo et al., Pure Appl.
 * Chem. 90 (2018) 395, from memory):
 * - an atomic weight of element E: one source 'item:<id>:atomic-weight:E' replaces E's standard atomic
 *   weight in both molar masses, so they stay correlated;
 * - a molar mass: one source 'item:<id>:molar-mass' is M(compound), and M(analyte) = (M(compound) − M(rest))/n,
 *   where the rest (the compound without its n analyte units) keeps the standard atomic weights. The factor
 *   n·M(analyte)/M(compound) = 1 − M(rest)/M(compound) then carries the certificate's uncertainty once.
 * @throws PlanError when the element of the atomic weight is not in the compound
 */
export function materialMolarMassNodes(
  builder: ModelBuilder,
  material: SolidMaterial,
  compound: Composition,
  analyte: Composition,
  count: number,
  table: AtomicWeightTable,
  stepIndex: number,
  path: PlanPathSegment[],
): { compound: NodeReference; analyte: NodeReference } {
  const lotSource = (
    id: string,
    label: string,
    value: NonNullable<SolidMaterial['certificateMolarMass']>,
    field: string,
  ) =>
    builder.source({
      id: `item:${material.itemId}:${id}`,
      label: `${material.name} (${material.itemId}): ${label} from its certificate`,
      category: 'atomicWeight',
      estimate: value.valueGPerMol,
      unit: 'g/mol',
      distribution: value.uncertainty,
      sharing: 'item',
      itemId: material.itemId,
      stepIndex,
      path: [...path, field, 'uncertainty'],
    });
  const formulaPath = [...path, 'formula'];
  if (material.certificateMolarMass !== undefined) {
    const compoundNode = lotSource('molar-mass', 'molar mass', material.certificateMolarMass, 'certificateMolarMass');
    const rest = new Map(
      [...compound]
        .map(([symbol, atoms]) => [symbol, atoms - count * (analyte.get(symbol) ?? 0)] as const)
        .filter(([, atoms]) => atoms > 0),
    );
    const analyteTimesCount =
      rest.size === 0
        ? compoundNode
        : builder.subtract(compoundNode, molarMassNode(builder, rest, table, stepIndex, formulaPath));
    return { compound: compoundNode, analyte: builder.scale(analyteTimesCount, 1 / count) };
  }
  const lot = new Map<string, NodeReference>();
  const atomicWeight = material.certificateAtomicWeight;
  if (atomicWeight !== undefined) {
    if (!compound.has(atomicWeight.element))
      throw new PlanError(
        [...path, 'certificateAtomicWeight', 'element'],
        `The certificate's atomic weight is for ${atomicWeight.element}, which ${material.formula} does not contain.`,
      );
    lot.set(
      atomicWeight.element,
      lotSource(
        `atomic-weight:${atomicWeight.element}`,
        `atomic weight of ${atomicWeight.element}`,
        atomicWeight,
        'certificateAtomicWeight',
      ),
    );
  }
  return {
    compound: molarMassNode(builder, compound, table, stepIndex, formulaPath, lot),
    analyte: molarMassNode(builder, analyte, table, stepIndex, formulaPath, lot),
  };
}
