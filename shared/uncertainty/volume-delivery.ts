import type { GlassPipette, PistonPipette, VolumetricFlask } from './equipment-schema';
import type { NodeReference } from './model-builder';
import { PlanError } from './plan-error';
import { itemLabel, type StepContext } from './step-context';

/**
 * Temperature effect on a delivered or contained volume V (mL): δ_T = V·γ·ΔT with ΔT rectangular
 * over ± the lab's half-range, drawn afresh for each use (JCGM 100:2008 4.3.7; EURACHEM/CITAC CG4 3rd ed. A1).
 */
function temperatureEffect(context: StepContext, volumeMl: number, label: string): NodeReference | undefined {
  const halfWidth = volumeMl * context.settings.solutionExpansionPerC * context.settings.temperatureHalfRangeC;
  if (halfWidth === 0) return undefined;
  return context.builder.source({
    id: `step:${context.stepIndex}:temperature`,
    label: `Step ${context.stepIndex + 1}: ${label} temperature (±${context.settings.temperatureHalfRangeC} °C)`,
    category: 'temperature',
    estimate: 0,
    unit: 'mL',
    distribution: { shape: 'rectangular', halfWidth },
    sharing: 'use',
    stepIndex: context.stepIndex,
    path: [...context.path, 'settings'],
  });
}

/**
 * Volume of a one-mark flask or glass pipette, in mL: V = V₀ + δ_tolerance + δ_fill + δ_T.
 * δ_tolerance (triangular or rectangular over ± the class tolerance, ISO 1042:1998 / ISO 648:2008) belongs to the item
 * and is shared by every use; δ_fill (normal, fill repeatability) and δ_T are per use.
 */
export function glasswareVolume(
  context: StepContext,
  item: VolumetricFlask | GlassPipette,
  field: 'flask' | 'pipette',
): NodeReference {
  const { builder, stepIndex, path } = context;
  const name = itemLabel(item.kind === 'volumetricFlask' ? 'Flask' : 'Pipette', item.itemId, `${item.nominalMl} mL`);
  const terms: NodeReference[] = [builder.constant(item.nominalMl)];
  if (item.toleranceMl > 0) {
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
  const temperature = temperatureEffect(context, item.nominalMl, name);
  if (temperature !== undefined) terms.push(temperature);
  return builder.sum(terms);
}

/**
 * ISO 8655-2:2002 errors of a piston pipette at a set volume, in µL: listed entries are converted to µL
 * (percent of their own volume), interpolated linearly between neighbours, and held at the nearest
 * entry beyond the listed range.
 */
export function pistonErrorsUl(pipette: PistonPipette, volumeUl: number): { systematicUl: number; randomUl: number } {
  const entries = pipette.errorSpecifications
    .map((entry) => ({
      volumeUl: entry.volumeUl,
      systematicUl:
        'absoluteUl' in entry.systematicError
          ? entry.systematicError.absoluteUl
          : (entry.systematicError.percent / 100) * entry.volumeUl,
      randomUl:
        'absoluteUl' in entry.randomError
          ? entry.randomError.absoluteUl
          : (entry.randomError.percent / 100) * entry.volumeUl,
    }))
    .sort((left, right) => left.volumeUl - right.volumeUl);
  const first = entries[0];
  const last = entries[entries.length - 1];
  if (volumeUl <= first.volumeUl) return first;
  if (volumeUl >= last.volumeUl) return last;
  const upperIndex = entries.findIndex((entry) => entry.volumeUl >= volumeUl);
  const lower = entries[upperIndex - 1];
  const upper = entries[upperIndex];
  const fraction = (volumeUl - lower.volumeUl) / (upper.volumeUl - lower.volumeUl);
  return {
    systematicUl: lower.systematicUl + fraction * (upper.systematicUl - lower.systematicUl),
    randomUl: lower.randomUl + fraction * (upper.randomUl - lower.randomUl),
  };
}

/**
 * Volume delivered by a piston pipette at its set volume, in mL: V = V_set + δ_systematic + δ_random + δ_T.
 * δ_systematic (rectangular by default over ± the maximum permissible systematic error) belongs to the
 * pipette at that set volume and is shared by every use; δ_random (normal, the permissible random error
 * as a standard deviation) and δ_T are per use.
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
  const terms: NodeReference[] = [builder.constant(volumeMl)];
  if (errors.systematicUl > 0) {
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
  const temperature = temperatureEffect(context, volumeMl, name);
  if (temperature !== undefined) terms.push(temperature);
  return builder.sum(terms);
}

function round(value: number): number {
  return Number(value.toPrecision(4));
}
