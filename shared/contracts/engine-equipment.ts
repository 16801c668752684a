import type {
  Balance,
  CertifiedSolution,
  GlassPipette,
  PistonPipette,
  PlanInput,
  SolidMaterial,
  VolumetricFlask,
} from '../uncertainty';
import type {
  BalanceData,
  EquipmentItem,
  GlasswareData,
  LabPolicy,
  PistonPipetteData,
  SolidMaterialData,
  SolutionMaterialData,
} from './library';

/**
 * Turns a library item's current revision into the engine's inline equipment, keeping the library
 * id and revision id so a stored plan says exactly which revision it used. Client (live budget) and
 * server (stored budget) both use this, so they compute from the same numbers.
 */
export type EngineEquipment =
  Balance | VolumetricFlask | GlassPipette | PistonPipette | SolidMaterial | CertifiedSolution;

export function toEngineEquipment(item: Pick<EquipmentItem, 'id' | 'kind' | 'code' | 'current'>): EngineEquipment {
  const refs = { itemId: item.code, libraryId: String(item.id), revisionId: String(item.current.id) };
  const data = item.current.data;
  switch (item.kind) {
    case 'balance': {
      const d = data as BalanceData;
      return {
        kind: 'balance',
        ...refs,
        description: d.description || undefined,
        capacityG: d.capacityG,
        readabilityG: d.readabilityG,
        repeatabilityG: d.repeatabilityG,
        linearityG: d.linearityG,
        sensitivity: {
          relativeExpandedUncertainty: d.sensitivityRelativeExpanded,
          coverageFactor: d.sensitivityCoverageFactor,
        },
      };
    }
    case 'flask':
    case 'glass-pipette': {
      const d = data as GlasswareData;
      return {
        kind: item.kind === 'flask' ? 'volumetricFlask' : 'glassPipette',
        ...refs,
        description: d.description || undefined,
        nominalMl: d.nominalMl,
        toleranceClass: d.glassClass,
        toleranceMl: d.toleranceMl,
        toleranceDistribution: d.toleranceDistribution ?? undefined,
        fillRepeatabilityMl: d.fillRepeatabilityMl,
        calibrationTemperatureC: d.calibrationTemperatureC,
      };
    }
    case 'piston-pipette': {
      const d = data as PistonPipetteData;
      return {
        kind: 'pistonPipette',
        ...refs,
        description: d.description || undefined,
        volumeRangeUl: { minimumUl: d.minVolumeUl, maximumUl: d.maxVolumeUl },
        errorSpecifications: d.points.map((p) => ({
          volumeUl: p.volumeUl,
          systematicError: { absoluteUl: p.systematicErrorUl },
          randomError: { absoluteUl: p.randomErrorUl },
        })),
        systematicErrorDistribution: 'rectangular',
        calibrationTemperatureC: 20,
      };
    }
    case 'solid-material': {
      const d = data as SolidMaterialData;
      const u = d.purityUncertainty;
      return {
        kind: 'solidMaterial',
        ...refs,
        name: d.name,
        formula: d.formula,
        purity: {
          massFraction: d.purity,
          uncertainty:
            u.shape === 'normal'
              ? { shape: 'normal', expandedUncertainty: u.expandedUncertainty, coverageFactor: u.coverageFactor }
              : { shape: 'rectangular', halfWidth: u.halfWidth },
        },
      };
    }
    case 'solution-material': {
      const d = data as SolutionMaterialData;
      return {
        kind: 'certifiedSolution',
        ...refs,
        name: d.name,
        certifiedValue: d.certifiedValue,
        certifiedUnit: d.certifiedUnit,
        uncertainty: { shape: 'normal', expandedUncertainty: d.expandedUncertainty, coverageFactor: d.coverageFactor },
        densityGPerMl: d.densityGPerMl ?? undefined,
        densityStandardUncertaintyGPerMl: d.densityUncertaintyGPerMl ?? undefined,
      };
    }
  }
}

/** The plan settings a lab's policy sets; the plan keeps its own output unit and lab temperature. */
export function policySettings(
  policy: LabPolicy,
): Pick<
  PlanInput['settings'],
  'coverage' | 'defaultGlasswareDistribution' | 'temperatureHalfRangeC' | 'monteCarloInterval'
> {
  return {
    coverage:
      policy.coverage.mode === 'probability' ? { probability: policy.coverage.probability } : { k: policy.coverage.k },
    defaultGlasswareDistribution: policy.glasswareDistribution,
    temperatureHalfRangeC: policy.temperatureHalfRangeC,
    monteCarloInterval: policy.monteCarloInterval,
  };
}

/** The plan with the lab policy's settings in force; client (live budget) and server (stored budget) both apply it. */
export function withPolicy<Plan extends { settings?: unknown }>(plan: Plan, policy: LabPolicy): Plan {
  const settings = typeof plan.settings === 'object' && plan.settings !== null ? plan.settings : {};
  return { ...plan, settings: { ...settings, ...policySettings(policy) } };
}
