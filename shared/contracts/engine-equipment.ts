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
        repeatabilityReadings: d.repeatabilityReadings ?? undefined,
        linearityG: d.linearityG,
        sensitivity: {
          relativeExpandedUncertainty: d.sensitivityRelativeExpanded,
          coverageFactor: d.sensitivityCoverageFactor,
          // An older revision has no correction field at all: read it as none.
          ...((d.calibrationCorrectionRelative ?? null) === null
            ? {}
            : { relativeCorrection: d.calibrationCorrectionRelative as number, ...calibrationOrigin(d) }),
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
        ...glasswareCalibration(d),
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
        ...pistonCalibration(d),
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
        // The library keeps g/cm³ as chemists write it; the engine reads kg/m³ (1 g/cm³ = 1000 kg/m³).
        densityKgPerM3:
          d.densityGPerCm3 === null || d.densityGPerCm3 === undefined ? undefined : d.densityGPerCm3 * 1000,
        ...certificateComposition(d),
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
        matrix: d.matrix || undefined,
      };
    }
  }
}

/** The certificate and date a calibration result names in the budget. */
function calibrationOrigin(d: { certificateReference: string; calibratedOn: string | null }) {
  return {
    ...(d.certificateReference ? { certificate: d.certificateReference } : {}),
    ...(d.calibratedOn ? { date: d.calibratedOn } : {}),
  };
}

/** A flask's or glass pipette's calibration result, when all of it is entered (older revisions have none). */
function glasswareCalibration(d: GlasswareData): Pick<VolumetricFlask, 'calibration'> {
  const correctionMl = d.calibrationCorrectionMl ?? null;
  const expandedUncertaintyMl = d.calibrationExpandedUncertaintyMl ?? null;
  const coverageFactor = d.calibrationCoverageFactor ?? null;
  if (correctionMl === null || expandedUncertaintyMl === null || coverageFactor === null) return {};
  return { calibration: { correctionMl, expandedUncertaintyMl, coverageFactor, ...calibrationOrigin(d) } };
}

/** A piston pipette's calibration corrections, at the volumes where they were entered. */
function pistonCalibration(d: PistonPipetteData): Pick<PistonPipette, 'calibration'> {
  const coverageFactor = d.calibrationCoverageFactor ?? null;
  const points = d.points.flatMap((p) =>
    p.correctionUl == null || p.correctionExpandedUl == null || coverageFactor === null
      ? []
      : [
          {
            volumeUl: p.volumeUl,
            correctionUl: p.correctionUl,
            expandedUncertaintyUl: p.correctionExpandedUl,
            coverageFactor,
          },
        ],
  );
  return points.length === 0 ? {} : { calibration: { points, ...calibrationOrigin(d) } };
}

/**
 * The lot's values a solid's certificate gives, as the engine uses them: a molar mass with its uncertainty
 * (a molar mass without one is only checked against the formula, in the library), or the analyte's atomic weight.
 */
function certificateComposition(
  d: SolidMaterialData,
): Pick<SolidMaterial, 'certificateMolarMass' | 'certificateAtomicWeight'> {
  // A revision stored before these fields existed has none of them: the same as null.
  const source = d.compositionSource ?? '';
  const lotValue = (value?: number | null, expanded?: number | null, coverageFactor?: number | null) =>
    value == null || expanded == null || coverageFactor == null
      ? undefined
      : {
          valueGPerMol: value,
          uncertainty: { shape: 'normal', expandedUncertainty: expanded, coverageFactor } as const,
          source,
        };
  const molarMass = lotValue(
    d.certificateMolarMassGPerMol,
    d.certificateMolarMassExpandedUncertaintyGPerMol,
    d.certificateMolarMassCoverageFactor,
  );
  if (molarMass) return { certificateMolarMass: molarMass };
  const atomicWeight = lotValue(
    d.analyteAtomicWeightGPerMol,
    d.analyteAtomicWeightExpandedUncertaintyGPerMol,
    d.analyteAtomicWeightCoverageFactor,
  );
  return atomicWeight ? { certificateAtomicWeight: { element: d.analyte, ...atomicWeight } } : {};
}

/** The plan settings a lab's policy sets; the plan keeps its own output unit and lab temperature. */
export function policySettings(
  policy: LabPolicy,
): Pick<
  PlanInput['settings'],
  | 'coverage'
  | 'defaultGlasswareDistribution'
  | 'temperatureHalfRangeC'
  | 'referenceTemperatureC'
  | 'temperatureTreatment'
  | 'operationTemperatureHalfRangeC'
  | 'linearityCorrelation'
  | 'linearityCorrelationNetFraction'
  | 'airBuoyancy'
  | 'certifiedSolutionDensity'
  | 'monteCarloInterval'
> {
  return {
    // Weights of conventional density 8000 kg/m³ (OIML R 111-1).
    airBuoyancy: { ...policy.airBuoyancy, weightDensityKgPerM3: 8000 },
    certifiedSolutionDensity: policy.solutionDensity,
    coverage:
      policy.coverage.mode === 'probability' ? { probability: policy.coverage.probability } : { k: policy.coverage.k },
    defaultGlasswareDistribution: policy.glasswareDistribution,
    temperatureHalfRangeC: policy.temperatureHalfRangeC,
    referenceTemperatureC: policy.referenceTemperatureC,
    temperatureTreatment: policy.temperatureTreatment,
    operationTemperatureHalfRangeC: policy.operationTemperatureHalfRangeC,
    linearityCorrelation: policy.linearityCorrelation,
    linearityCorrelationNetFraction: policy.linearityCorrelationNetFraction,
    monteCarloInterval: policy.monteCarloInterval,
  };
}

/** The plan with the lab policy's settings in force; client (live budget) and server (stored budget) both apply it. */
export function withPolicy<Plan extends { settings?: unknown }>(plan: Plan, policy: LabPolicy): Plan {
  const settings = typeof plan.settings === 'object' && plan.settings !== null ? plan.settings : {};
  return { ...plan, settings: { ...settings, ...policySettings(policy) } };
}
