import { calibrationCorrectionLabel } from './calibration-label';
import type { GlassPipette, PistonPipette, VolumetricFlask } from './equipment-schema';
import type { NodeReference } from './model-builder';
import { PlanError } from './plan-error';
import { itemLabel, type StepContext } from './step-context';

/**
 * Factor from a volume measured at the lab temperature t_lab to the volume the same liquid occupies at the
 * reference temperature t_ref: f = (1 + γ_container·(t_lab − t_cal))·(1 − γ_liquid·(t_lab − t_ref)).
 * The container term is the glassware's cubic expansion since its calibration at t_cal (γ_container = 0 for a
 * piston pipette, whose displacement does not follow the glass); the liquid term takes the liquid from t_lab to
 * t_ref (first order in γ·Δt, EURACHEM/CITAC CG4 3rd ed. A1; JCGM 100:2008 4.3.7). f = 1 when all three agree.
 * @example referenceVolumeFactor({ labTemperatureC: 25, referenceTemperatureC: 20, solutionExpansionPerC: 2.1e-4 }, 1e-5, 20) // 0.9990498…
 */
export function referenceVolumeFactor(
  settings: Pick<StepContext['settings'], 'labTemperatureC' | 'referenceTemperatureC' | 'solutionExpansionPerC'>,
  containerExpansionPerC: number,
  calibrationTemperatureC: number,
): number {
  const { labTemperatureC: lab, referenceTemperatureC: reference, solutionExpansionPerC: liquid } = settings;
  return (1 + containerExpansionPerC * (lab - calibrationTemperatureC)) * (1 - liquid * (lab - reference));
}

/**
 * Temperature effect on a volume V (mL): V·γ·δt, δt the liquid's deviation from the lab temperature
 * (JCGM 100:2008 4.3.7; EURACHEM/CITAC CG4 3rd ed. A1, which leaves out the glass's much smaller expansion here).
 * 'perUse': δt rectangular over ± temperatureHalfRangeC, drawn afresh for each use.
 * 'sharedLab': δt = δt_lab + δt_use, one lab deviation (rectangular ± temperatureHalfRangeC, source
 * 'lab:temperature') shared by every volume of the plan, plus a per-use difference (rectangular
 * ± operationTemperatureHalfRangeC); the shared part cancels in a ratio of volumes such as c₀·V_pipette/V_flask.
 */
function temperatureTerms(context: StepContext, volumeMl: number, name: string): NodeReference[] {
  const { builder, settings, stepIndex } = context;
  const expansion = volumeMl * settings.solutionExpansionPerC;
  const terms: NodeReference[] = [];
  const perUse = (halfRangeC: number, words: string) => {
    if (expansion * halfRangeC === 0) return;
    terms.push(
      builder.source({
        id: `step:${stepIndex}:temperature`,
        label: `Step ${stepIndex + 1}: ${name} ${words} (±${halfRangeC} °C)`,
        category: 'temperature',
        estimate: 0,
        unit: 'mL',
        distribution: { shape: 'rectangular', halfWidth: expansion * halfRangeC },
        sharing: 'use',
        stepIndex,
        path: [...context.path, 'settings'],
      }),
    );
  };
  if (settings.temperatureTreatment === 'perUse') {
    perUse(settings.temperatureHalfRangeC, 'temperature');
    return terms;
  }
  if (expansion * settings.temperatureHalfRangeC > 0) {
    const labDeviation = builder.source({
      id: 'lab:temperature',
      label: `Lab temperature (±${settings.temperatureHalfRangeC} °C about ${settings.labTemperatureC} °C), shared by every volume`,
      category: 'temperature',
      estimate: 0,
      unit: '°C',
      distribution: { shape: 'rectangular', halfWidth: settings.temperatureHalfRangeC },
      sharing: 'item',
      stepIndex,
      path: ['settings', 'temperatureHalfRangeC'],
    });
    terms.push(builder.scale(labDeviation, expansion));
  }
  perUse(settings.operationTemperatureHalfRangeC, 'temperature difference from the lab');
  return terms;
}

/** V = (V₀ + Σ item and per-use deviations)·f + Σ V·γ·δt, with f from referenceVolumeFactor. */
function referenceVolume(
  context: StepContext,
  terms: NodeReference[],
  volumeMl: number,
  factor: number,
  name: string,
): NodeReference {
  const { builder } = context;
  return builder.sum([builder.scale(builder.sum(terms), factor), ...temperatureTerms(context, volumeMl, name)]);
}

/**
 * Volume of a one-mark flask or glass pipette at the reference temperature, in mL:
 * V = (V₀ + δ_item + δ_fill)·f + δ_T (f and δ_T: referenceVolumeFactor and temperatureTerms).
 * δ_item belongs to the item and is shared by every use: its calibration result when one is entered (estimate the
 * certificate's correction, normal with u = U/k, JCGM 100:2008 4.3.3), otherwise its class tolerance (triangular
 * or rectangular over ± the tolerance, ISO 1042:1998 / ISO 648:2008). δ_fill (normal, fill repeatability) is per use.
 */
export function glasswareVolume(
  context: StepContext,
  item: VolumetricFlask | GlassPipette,
  field: 'flask' | 'pipette',
): NodeReference {
  const { builder, stepIndex, path } = context;
  const name = itemLabel(item.kind === 'volumetricFlask' ? 'Flask' : 'Pipette', item.itemId, `${item.nominalMl} mL`);
  const terms: NodeReference[] = [builder.constant(item.nominalMl)];
  const calibration = item.calibration;
  if (calibration !== undefined) {
    terms.push(
      builder.source({
        id: `item:${item.itemId}:calibration`,
        label: calibrationCorrectionLabel(name, calibration.correctionMl, 'mL', calibration),
        category: 'calibrationCorrection',
        estimate: calibration.correctionMl,
        unit: 'mL',
        distribution: {
          shape: 'normal',
          expandedUncertainty: calibration.expandedUncertaintyMl,
          coverageFactor: calibration.coverageFactor,
        },
        sharing: 'item',
        itemId: item.itemId,
        stepIndex,
        path: [...path, field, 'calibration'],
      }),
    );
  } else if (item.toleranceMl > 0) {
    const shape = item.toleranceDistribution ?? context.settings.defaultGlasswareDistribution;
    terms.push(
      builder.source({
        id: `item:${item.itemId}:tolerance`,
        label: `${name}: tolerance ±${item.toleranceMl} mL (class ${item.toleranceClass})`,
        category: 'volumetricTolerance',
        estimate: 0,
        unit: 'mL',
        distribution: { shape, halfWidth: item.toleranceMl },
        sharing: 'item',
        itemId: item.itemId,
        stepIndex,
        path: [...path, field, 'toleranceMl'],
      }),
    );
  }
  if (item.fillRepeatabilityMl > 0) {
    terms.push(
      builder.source({
        id: `step:${stepIndex}:fill-repeatability`,
        label: `Step ${stepIndex + 1}: ${name} fill repeatability`,
        category: 'fillRepeatability',
        estimate: 0,
        unit: 'mL',
        distribution: { shape: 'normal', standardUncertainty: item.fillRepeatabilityMl },
        sharing: 'use',
        itemId: item.itemId,
        stepIndex,
        path: [...path, field, 'fillRepeatabilityMl'],
      }),
    );
  }
  const { settings } = context;
  const factor = referenceVolumeFactor(settings, settings.glassExpansionPerC, item.calibrationTemperatureC);
  return referenceVolume(context, terms, item.nominalMl, factor, name);
}

/**
 * Values listed at volumes, at the given volume: interpolated linearly between neighbours and held at the
 * nearest entry beyond the listed range. `points` must be sorted by volume.
 */
function interpolateAtVolume(points: { volumeUl: number; values: number[] }[], volumeUl: number): number[] {
  const first = points[0];
  const last = points[points.length - 1];
  if (volumeUl <= first.volumeUl) return first.values;
  if (volumeUl >= last.volumeUl) return last.values;
  const upperIndex = points.findIndex((point) => point.volumeUl >= volumeUl);
  const lower = points[upperIndex - 1];
  const upper = points[upperIndex];
  const fraction = (volumeUl - lower.volumeUl) / (upper.volumeUl - lower.volumeUl);
  return lower.values.map((value, index) => value + fraction * (upper.values[index] - value));
}

/**
 * ISO 8655-2:2002 errors of a piston pipette at a set volume, in µL: listed entries are converted to µL
 * (percent of their own volume), interpolated linearly between neighbours, and held at the nearest
 * entry beyond the listed range.
 */
export function pistonErrorsUl(pipette: PistonPipette, volumeUl: number): { systematicUl: number; randomUl: number } {
  const points = pipette.errorSpecifications
    .map((entry) => ({
      volumeUl: entry.volumeUl,
      values: [
        'absoluteUl' in entry.systematicError
          ? entry.systematicError.absoluteUl
          : (entry.systematicError.percent / 100) * entry.volumeUl,
        'absoluteUl' in entry.randomError
          ? entry.randomError.absoluteUl
          : (entry.randomError.percent / 100) * entry.volumeUl,
      ],
    }))
    .sort((left, right) => left.volumeUl - right.volumeUl);
  const [systematicUl, randomUl] = interpolateAtVolume(points, volumeUl);
  return { systematicUl, randomUl };
}

/**
 * The calibration correction of a piston pipette at a set volume, in µL, with its standard uncertainty U/k:
 * interpolated linearly between calibrated volumes; undefined outside them (no calibration there).
 */
export function pistonCalibrationUl(
  pipette: PistonPipette,
  volumeUl: number,
): { correctionUl: number; standardUncertaintyUl: number } | undefined {
  const points = (pipette.calibration?.points ?? [])
    .map((point) => ({
      volumeUl: point.volumeUl,
      values: [point.correctionUl, point.expandedUncertaintyUl / point.coverageFactor],
    }))
    .sort((left, right) => left.volumeUl - right.volumeUl);
  if (points.length === 0) return undefined;
  const margin = 1e-9 * volumeUl;
  if (volumeUl < points[0].volumeUl - margin || volumeUl > points[points.length - 1].volumeUl + margin)
    return undefined;
  const [correctionUl, standardUncertaintyUl] = interpolateAtVolume(points, volumeUl);
  return { correctionUl, standardUncertaintyUl };
}

/**
 * Volume delivered by a piston pipette at its set volume, at the reference temperature, in mL:
 * V = (V_set + δ_systematic + δ_random)·f + δ_T (f and δ_T: referenceVolumeFactor with no container term,
 * and temperatureTerms). δ_systematic belongs to the pipette at that set volume and is shared by every use: the
 * calibration correction at that volume when the pipette was calibrated there (normal, u = U/k), otherwise the
 * maximum permissible systematic error (rectangular by default, ISO 8655-2:2002). δ_random (normal, the
 * permissible random error as a standard deviation) is per use.
 * @throws PlanError when the set volume is outside the pipette's range
 */
export function pistonVolume(context: StepContext, pipette: PistonPipette, volumeMl: number): NodeReference {
  const { builder, stepIndex, path } = context;
  const volumeUl = volumeMl * 1000;
  const { minimumUl, maximumUl } = pipette.volumeRangeUl;
  if (volumeUl < minimumUl * (1 - 1e-9) || volumeUl > maximumUl * (1 + 1e-9)) {
    throw new PlanError(
      [...path, 'volumeMl'],
      `Piston pipette ${pipette.itemId} sets ${minimumUl}–${maximumUl} µL; ${volumeUl} µL is outside its range.`,
    );
  }
  const name = itemLabel('Piston pipette', pipette.itemId, `${volumeUl} µL`);
  const errors = pistonErrorsUl(pipette, volumeUl);
  const calibration = pistonCalibrationUl(pipette, volumeUl);
  const terms: NodeReference[] = [builder.constant(volumeMl)];
  if (calibration !== undefined) {
    terms.push(
      builder.source({
        id: `item:${pipette.itemId}:calibration@${volumeUl}uL`,
        label: calibrationCorrectionLabel(name, calibration.correctionUl, 'µL', pipette.calibration ?? {}),
        category: 'calibrationCorrection',
        estimate: calibration.correctionUl / 1000,
        unit: 'mL',
        distribution: { shape: 'normal', standardUncertainty: calibration.standardUncertaintyUl / 1000 },
        sharing: 'item',
        itemId: pipette.itemId,
        stepIndex,
        path: [...path, 'pipette', 'calibration'],
      }),
    );
  } else if (errors.systematicUl > 0) {
    terms.push(
      builder.source({
        id: `item:${pipette.itemId}:systematic@${volumeUl}uL`,
        label: `${name}: systematic error ±${round(errors.systematicUl)} µL (ISO 8655-2)`,
        category: 'pipetteSystematicError',
        estimate: 0,
        unit: 'mL',
        distribution: { shape: pipette.systematicErrorDistribution, halfWidth: errors.systematicUl / 1000 },
        sharing: 'item',
        itemId: pipette.itemId,
        stepIndex,
        path: [...path, 'pipette', 'errorSpecifications'],
      }),
    );
  }
  if (errors.randomUl > 0) {
    terms.push(
      builder.source({
        id: `step:${stepIndex}:random-error`,
        label: `Step ${stepIndex + 1}: ${name} random error (ISO 8655-2)`,
        category: 'pipetteRandomError',
        estimate: 0,
        unit: 'mL',
        distribution: { shape: 'normal', standardUncertainty: errors.randomUl / 1000 },
        sharing: 'use',
        itemId: pipette.itemId,
        stepIndex,
        path: [...path, 'pipette', 'errorSpecifications'],
      }),
    );
  }
  const factor = referenceVolumeFactor(context.settings, 0, pipette.calibrationTemperatureC);
  return referenceVolume(context, terms, volumeMl, factor, name);
}

function round(value: number): number {
  return Number(value.toPrecision(4));
}
