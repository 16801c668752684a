import { dominantAtomicWeightWarnings } from './atomic-weight-warning';
import { coverageFactorOf, coverageProbabilityOf, type CoverageSetting } from './coverage-setting';
import type { Distribution } from './distributions';
import type { EngineWarning } from './engine-warning';
import { ENGINE_VERSION } from './engine-version';
import { evaluateDuals } from './evaluate-duals';
import type { CompiledModel, SourceCategory } from './model-types';
import { formatResultStatement, roundToUncertainty, type RoundedResult } from './result-rounding';

/** One row of the uncertainty budget. */
export interface BudgetRow {
  sourceId: string;
  label: string;
  category: SourceCategory;
  evaluationType: 'A' | 'B';
  sharing: 'item' | 'use';
  stepIndices: number[];
  estimate: number;
  unit: string;
  distribution: Distribution['shape'];
  standardUncertainty: number;
  degreesOfFreedom: number;
  /** cᵢ = ∂y/∂xᵢ, in output unit per source unit. */
  sensitivityCoefficient: number;
  /** uᵢ(y) = |cᵢ|·u(xᵢ), in the output unit. */
  contribution: number;
  /** 100·uᵢ(y)²/u_c(y)². */
  indexPercent: number;
}

/** Contributions summed in quadrature over a group of rows (a step, a category). */
export interface BudgetGroup {
  key: string;
  label: string;
  contribution: number;
  indexPercent: number;
}

export interface BudgetResult {
  engineVersion: string;
  measurand: string;
  unit: string;
  value: number;
  standardUncertainty: number;
  relativeStandardUncertainty: number;
  effectiveDegreesOfFreedom: number;
  coverageProbability: number;
  coverageFactor: number;
  expandedUncertainty: number;
  relativeExpandedUncertainty: number;
  rows: BudgetRow[];
  byStep: BudgetGroup[];
  byCategory: BudgetGroup[];
  checkpoints: { stepIndex: number; label: string; value: number; unit: string; standardUncertainty: number }[];
  rounded: RoundedResult;
  statement: string;
  /** The temperature a result per volume is stated at (its volumes were corrected to it); absent otherwise. */
  referenceTemperatureC?: number;
  warnings: EngineWarning[];
}

/**
 * GUM first-order propagation (JCGM 100:2008 5.1.2) for independent sources:
 * u_c²(y) = Σ (cᵢ·u(xᵢ))², cᵢ = ∂y/∂xᵢ exact by automatic differentiation;
 * ν_eff = u_c⁴ / Σ (uᵢ(y)⁴/νᵢ) (Welch–Satterthwaite, JCGM 100:2008 G.4.1); U = k·u_c
 * with k = t_p(ν_eff) or the fixed k of the setting.
 */
export function propagate(model: CompiledModel, coverage: CoverageSetting): BudgetResult {
  const duals = evaluateDuals(model);
  const output = duals[model.outputNode];
  const value = output.value;
  const contributions = model.sources.map((source) => {
    const sensitivity = output.sensitivity(source.id);
    return { source, sensitivity, contribution: Math.abs(sensitivity) * source.standardUncertainty };
  });
  const variance = contributions.reduce((total, entry) => total + entry.contribution ** 2, 0);
  const standardUncertainty = Math.sqrt(variance);
  const degreesDenominator = contributions.reduce(
    (total, entry) =>
      entry.source.degreesOfFreedom === Infinity
        ? total
        : total + entry.contribution ** 4 / entry.source.degreesOfFreedom,
    0,
  );
  const effectiveDegreesOfFreedom = degreesDenominator === 0 ? Infinity : variance ** 2 / degreesDenominator;
  const coverageFactor = coverageFactorOf(coverage, effectiveDegreesOfFreedom);
  const coverageProbability = coverageProbabilityOf(coverage);
  const expandedUncertainty = coverageFactor * standardUncertainty;
  const share = (part: number) => (variance === 0 ? 0 : (100 * part) / variance);

  const rows: BudgetRow[] = contributions.map(({ source, sensitivity, contribution }) => ({
    sourceId: source.id,
    label: source.label,
    category: source.category,
    evaluationType: source.evaluationType,
    sharing: source.sharing,
    stepIndices: source.stepIndices,
    estimate: source.estimate,
    unit: source.unit,
    distribution: source.distribution.shape,
    standardUncertainty: source.standardUncertainty,
    degreesOfFreedom: source.degreesOfFreedom,
    sensitivityCoefficient: sensitivity,
    contribution,
    indexPercent: share(contribution ** 2),
  }));

  const group = (keyOf: (row: BudgetRow) => string, labelOf: (row: BudgetRow) => string): BudgetGroup[] => {
    const groups = new Map<string, { label: string; variance: number }>();
    for (const row of rows) {
      const key = keyOf(row);
      const entry = groups.get(key) ?? { label: labelOf(row), variance: 0 };
      entry.variance += row.contribution ** 2;
      groups.set(key, entry);
    }
    return [...groups].map(([key, entry]) => ({
      key,
      label: entry.label,
      contribution: Math.sqrt(entry.variance),
      indexPercent: share(entry.variance),
    }));
  };

  const stepLabel = (row: BudgetRow) =>
    row.stepIndices.length === 1
      ? `step ${row.stepIndices[0] + 1}`
      : `shared by steps ${row.stepIndices.map((index) => index + 1).join(', ')}`;

  return {
    engineVersion: ENGINE_VERSION,
    measurand: model.measurand,
    unit: model.outputUnit,
    value,
    standardUncertainty,
    relativeStandardUncertainty: standardUncertainty / Math.abs(value),
    effectiveDegreesOfFreedom,
    coverageProbability,
    coverageFactor,
    expandedUncertainty,
    relativeExpandedUncertainty: expandedUncertainty / Math.abs(value),
    rows,
    byStep: group((row) => row.stepIndices.join('+'), stepLabel),
    byCategory: group(
      (row) => row.category,
      (row) => row.category,
    ),
    checkpoints: model.checkpoints.map((checkpoint) => {
      const dual = duals[checkpoint.node];
      let checkpointVariance = 0;
      for (const source of model.sources)
        checkpointVariance += (dual.sensitivity(source.id) * source.standardUncertainty) ** 2;
      return {
        stepIndex: checkpoint.stepIndex,
        label: checkpoint.label,
        value: dual.value,
        unit: checkpoint.unit,
        standardUncertainty: Math.sqrt(checkpointVariance),
      };
    }),
    rounded: roundToUncertainty(value, expandedUncertainty),
    statement: formatResultStatement({
      measurand: model.measurand,
      value,
      expandedUncertainty,
      unit: model.outputUnit,
      coverageFactor,
      coverageProbability,
      referenceTemperatureC: model.referenceTemperatureC,
    }),
    ...(model.referenceTemperatureC === undefined ? {} : { referenceTemperatureC: model.referenceTemperatureC }),
    warnings: [...model.warnings, ...dominantAtomicWeightWarnings(rows)],
  };
}
