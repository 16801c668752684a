import { z } from 'zod';
import { molarMass } from './chemical-formula';
import { analyteCountIn } from './composition-nodes';
import { standardUncertainty } from './distributions';
import {
  balanceSchema,
  certifiedSolutionSchema,
  formulaSchema,
  glassPipetteSchema,
  pistonPipetteSchema,
  solidMaterialSchema,
  volumetricFlaskSchema,
  type GlassPipette,
  type PistonPipette,
  type VolumetricFlask,
} from './equipment-schema';
import type { EngineWarning } from './engine-warning';
import { evaluatePlan } from './evaluate-plan';
import { minimumWeightG } from './minimum-weight';
import { parseWithSchema } from './parse-plan';
import { PlanError } from './plan-error';
import { groupedDigits } from './plan-limits';
import { settingsSchema, type PlanInput } from './plan-schema';
import { concentrationUnitNames, unitOf, type ConcentrationUnit } from './units';
import { pistonErrorsUl } from './volume-delivery';
import { waterDensityKgPerM3 } from './water-density';

/**
 * Partial routes (a start plus up to three dilutions) the search looks at before it stops: about half a
 * second of work on one core, whatever the size of the library. Without it the search of a target no
 * route reaches grows with the cube of the number of flask and pipette pairings.
 */
export const ROUTE_SEARCH_BUDGET = 2_000_000;

/** What the route finder is asked: target, material, the equipment on hand, and search limits. */
export const routeRequestSchema = z
  .object({
    target: z
      .object({
        value: z.number().positive('The target concentration must be greater than zero.'),
        unit: z.enum(concentrationUnitNames),
      })
      .strict(),
    /** The element or ion stated, as a formula ("Pb"). */
    analyte: z.object({ formula: formulaSchema }).strict(),
    material: z.discriminatedUnion('kind', [solidMaterialSchema, certifiedSolutionSchema]),
    balances: z.array(balanceSchema).default([]),
    flasks: z.array(volumetricFlaskSchema).min(1, 'The route finder needs at least one flask.'),
    pipettes: z.array(z.discriminatedUnion('kind', [glassPipetteSchema, pistonPipetteSchema])).default([]),
    /** Plan settings for the routes (outputUnit is taken from the target). */
    settings: settingsSchema.omit({ outputUnit: true }).partial().default({}),
    maximumDilutions: z.number().int().min(0).max(3).default(3),
    limit: z.number().int().positive().default(10),
    /** From a certified solution the reachable concentrations are discrete: accept routes within this relative distance of the target. */
    relativeTargetTolerance: z.number().positive().default(0.005),
    /** Most of the solid that may be weighed, g. */
    maximumMaterialG: z.number().positive().optional(),
    /** Partial routes the search may look at before it stops and answers with the best found so far. */
    searchBudget: z.number().int().positive().max(ROUTE_SEARCH_BUDGET).default(ROUTE_SEARCH_BUDGET),
  })
  .strict();

export type RouteRequest = z.input<typeof routeRequestSchema>;

export interface Route {
  plan: PlanInput;
  value: number;
  unit: ConcentrationUnit;
  relativeExpandedUncertainty: number;
  dilutionSteps: number;
  /** Solid weighed (g) or certified solution pipetted (mL). */
  materialUsed: { massG: number } | { volumeMl: number };
  /** Total volume of the flasks filled, mL. */
  solutionVolumeMl: number;
  /** One line: "0.1599 g on B-01 → F-100-A; 10 mL (GP-10-A) → F-100-B". */
  description: string;
  warnings: EngineWarning[];
}

export interface RouteResult {
  routes: Route[];
  /** Candidate routes that met every constraint and were scored. */
  feasibleCandidates: number;
  /** True when the search reached its budget before it had looked at every route. */
  stoppedEarly: boolean;
  /** The sentence to show the analyst when the search stopped early; null when it was complete. */
  searchNote: string | null;
}

interface Stage {
  pipetteIndex: number;
  flaskIndex: number;
  /** The flask's itemId: a flask holds one solution at a time, so a route never makes up in it twice. */
  flaskId: string;
  volumeMl: number;
  flaskMl: number;
  factor: number;
  relativeVariance: number;
}

interface Candidate {
  approximateVariance: number;
  startIndex: number;
  stages: Stage[];
  massG?: number;
}

/**
 * Enumerates preparation routes with 0–3 dilutions (pipette aliquot → flask) from a solid (weighed on a balance
 * into a first flask) or a certified solution, respecting minimum weight (USP <41>), balance capacity, the
 * items on hand (each flask, by itemId, used once: it holds one solution at a time; each aliquot smaller than the flask it comes from), and ranks them by
 * relative expanded uncertainty (compared at two significant digits), then fewer steps, less material, less
 * solution made.
 *
 * Search: depth-first with stages sorted by their relative variance and a bound from the best routes kept
 * (relative variances of independent stages add); the best candidates are then evaluated exactly with the
 * GUM engine, which also accounts for items shared between stages.
 * @throws PlanError for an impossible request
 */
export function findRoutes(input: RouteRequest): RouteResult {
  const request = parseWithSchema(routeRequestSchema, input);
  const unit = unitOf(request.target.unit, ['target', 'unit']);
  if (unit.dimension === 'massFraction' || unit.dimension === 'molality') {
    throw new PlanError(
      ['target', 'unit'],
      'The route finder plans volumetric routes; give the target as a mass or amount concentration (e.g. mg/L or µmol/L).',
    );
  }
  const analyteMolarMass = molarMass(request.analyte.formula, undefined, ['analyte', 'formula']).valueGPerMol;
  const targetMgPerL =
    unit.dimension === 'massConcentration'
      ? request.target.value * unit.factorToBase
      : request.target.value * unit.factorToBase * analyteMolarMass * 1000;
  const settings = settingsSchema.parse({ ...request.settings, outputUnit: request.target.unit });
  const { maximumDilutions, limit, relativeTargetTolerance: tolerance } = request;
  const keep = Math.max(4 * limit, 20);
  const temperatureVariance = (settings.solutionExpansionPerC * settings.temperatureHalfRangeC) ** 2 / 3;
  const toleranceFactor = (shape: 'triangular' | 'rectangular' | undefined) =>
    (shape ?? settings.defaultGlasswareDistribution) === 'triangular' ? 6 : 3;
  const flaskVariance = (flask: VolumetricFlask) =>
    (flask.toleranceMl ** 2 / toleranceFactor(flask.toleranceDistribution) + flask.fillRepeatabilityMl ** 2) /
      flask.nominalMl ** 2 +
    temperatureVariance;

  let searchSteps = 0;
  /** Counts one partial route (or dilution stage) looked at; false once the budget is spent. */
  const withinBudget = () => {
    searchSteps += 1;
    return searchSteps <= request.searchBudget;
  };

  const stages: Stage[] = [];
  request.pipettes.forEach((pipette, pipetteIndex) => {
    for (const volumeMl of pipetteVolumesMl(pipette)) {
      const pipetteVariance =
        pipette.kind === 'glassPipette'
          ? (pipette.toleranceMl ** 2 / toleranceFactor(pipette.toleranceDistribution) +
              pipette.fillRepeatabilityMl ** 2) /
            volumeMl ** 2
          : pistonVariance(pipette, volumeMl);
      request.flasks.forEach((flask, flaskIndex) => {
        if (volumeMl >= flask.nominalMl || !withinBudget()) return;
        stages.push({
          pipetteIndex,
          flaskIndex,
          flaskId: flask.itemId,
          volumeMl,
          flaskMl: flask.nominalMl,
          factor: flask.nominalMl / volumeMl,
          relativeVariance: pipetteVariance + temperatureVariance + flaskVariance(flask),
        });
      });
    }
  });
  stages.sort((left, right) => left.relativeVariance - right.relativeVariance);

  const kept: Candidate[] = [];
  let feasibleCandidates = 0;
  const bound = () => (kept.length < keep ? Infinity : kept[kept.length - 1].approximateVariance);
  const offer = (candidate: Candidate) => {
    feasibleCandidates += 1;
    if (candidate.approximateVariance >= bound()) return;
    let position = kept.length;
    while (position > 0 && kept[position - 1].approximateVariance > candidate.approximateVariance) position -= 1;
    kept.splice(position, 0, candidate);
    if (kept.length > keep) kept.pop();
  };

  const material = request.material;
  if (material.kind === 'solidMaterial') {
    const purity = material.purity.massFraction;
    const compound = molarMass(material.formula, undefined, ['material', 'formula']);
    const analyte = molarMass(request.analyte.formula, undefined, ['analyte', 'formula']);
    const count = analyteCountIn(compound.composition, analyte.composition, material.analyteCount, ['material']);
    const factor = (count * analyte.valueGPerMol) / compound.valueGPerMol;
    const compositionVariance =
      (standardUncertainty(material.purity.uncertainty) / purity) ** 2 +
      (compound.standardUncertaintyGPerMol / compound.valueGPerMol) ** 2;
    const starts = request.balances.flatMap((balance, balanceIndex) =>
      request.flasks.map((flask, flaskIndex) => ({ balance, balanceIndex, flask, flaskIndex })),
    );
    starts.forEach((start, startIndex) => {
      const sensitivity = start.balance.sensitivity;
      const sensitivityVariance =
        sensitivity === undefined ? 0 : (sensitivity.relativeExpandedUncertainty / sensitivity.coverageFactor) ** 2;
      const readingVariance =
        2 *
        (start.balance.repeatabilityG ** 2 + start.balance.readabilityG ** 2 / 12 + start.balance.linearityG ** 2 / 3);
      const base = flaskVariance(start.flask) + compositionVariance + sensitivityVariance;
      const minimumG = minimumWeightG(start.balance.repeatabilityG, start.balance.readabilityG);
      const maximumG = Math.min(start.balance.capacityG, request.maximumMaterialG ?? Infinity);
      // m = c·V₀·D/(1000 mL/L · 1000 mg/g · P·f), D the product of the dilution factors.
      const massPerFactor = (targetMgPerL * start.flask.nominalMl) / (1e6 * purity * factor);
      const used = new Set<string>([start.flask.itemId]);
      const visit = (chosen: Stage[], dilution: number, variance: number, previousMl: number) => {
        const massG = massPerFactor * dilution;
        if (massG > maximumG) return;
        if (massG >= minimumG)
          offer({
            approximateVariance: variance + readingVariance / massG ** 2,
            startIndex,
            stages: [...chosen],
            massG,
          });
        if (chosen.length === maximumDilutions) return;
        for (const stage of stages) {
          if (variance + stage.relativeVariance >= bound() || !withinBudget()) break;
          if (
            used.has(stage.flaskId) ||
            stage.volumeMl >= previousMl ||
            massPerFactor * dilution * stage.factor > maximumG
          )
            continue;
          used.add(stage.flaskId);
          chosen.push(stage);
          visit(chosen, dilution * stage.factor, variance + stage.relativeVariance, stage.flaskMl);
          chosen.pop();
          used.delete(stage.flaskId);
        }
      };
      visit([], 1, base, start.flask.nominalMl);
    });
    return rankCandidates(
      kept,
      request,
      settings.outputUnit,
      limit,
      { feasibleCandidates, searchSteps },
      (candidate) => {
        const start = starts[candidate.startIndex];
        const massG = roundMass(candidate.massG ?? 0, start.balance.readabilityG);
        return {
          steps: [
            { kind: 'weighSolid', material, balance: start.balance, netMassG: massG },
            { kind: 'makeUpToVolume', flask: start.flask },
          ],
          materialUsed: { massG },
          firstLabel: `${massG} g on ${start.balance.itemId} → ${start.flask.itemId} (${start.flask.nominalMl} mL)`,
          startVolumeMl: start.flask.nominalMl,
          signature: JSON.stringify([start.balanceIndex, flaskSpecification(start.flask)]),
        };
      },
    );
  }

  const certifiedUnit = unitOf(material.certifiedUnit, ['material', 'certifiedUnit']);
  const densityGPerMl = material.densityGPerMl ?? waterDensityKgPerM3(settings.labTemperatureC) / 1000;
  const startMgPerL =
    material.certifiedValue *
    certifiedUnit.factorToBase *
    (certifiedUnit.dimension === 'massFraction' ? densityGPerMl : 1);
  const certificateVariance = (standardUncertainty(material.uncertainty) / material.certifiedValue) ** 2;
  const wantedDilution = startMgPerL / targetMgPerL;
  const used = new Set<string>();
  const visit = (chosen: Stage[], dilution: number, variance: number, previousMl: number) => {
    if (Math.abs(dilution / wantedDilution - 1) <= tolerance)
      offer({ approximateVariance: variance, startIndex: 0, stages: [...chosen] });
    if (chosen.length === maximumDilutions || dilution > wantedDilution * (1 + tolerance)) return;
    for (const stage of stages) {
      if (variance + stage.relativeVariance >= bound() || !withinBudget()) break;
      if (used.has(stage.flaskId) || stage.volumeMl >= previousMl) continue;
      used.add(stage.flaskId);
      chosen.push(stage);
      visit(chosen, dilution * stage.factor, variance + stage.relativeVariance, stage.flaskMl);
      chosen.pop();
      used.delete(stage.flaskId);
    }
  };
  visit([], 1, certificateVariance, Infinity);
  return rankCandidates(
    kept,
    request,
    settings.outputUnit,
    limit,
    { feasibleCandidates, searchSteps },
    (candidate) => ({
      steps: [{ kind: 'startFromCertifiedSolution', material }],
      materialUsed: { volumeMl: candidate.stages[0]?.volumeMl ?? 0 },
      firstLabel: `${material.name} (${material.itemId})`,
      startVolumeMl: 0,
      signature: '',
    }),
  );
}

function rankCandidates(
  candidates: Candidate[],
  request: z.output<typeof routeRequestSchema>,
  outputUnit: ConcentrationUnit,
  limit: number,
  search: { feasibleCandidates: number; searchSteps: number },
  startOf: (candidate: Candidate) => {
    steps: PlanInput['steps'];
    materialUsed: Route['materialUsed'];
    firstLabel: string;
    startVolumeMl: number;
    signature: string;
  },
): RouteResult {
  // Items with identical specifications (two 1000 mL class A flasks) give the same route twice: keep one.
  const seen = new Set<string>();
  const distinct = candidates.filter((candidate) => {
    const signature = JSON.stringify([
      startOf(candidate).signature,
      candidate.stages.map((stage) => [
        stage.pipetteIndex,
        stage.volumeMl,
        flaskSpecification(request.flasks[stage.flaskIndex]),
      ]),
    ]);
    if (seen.has(signature)) return false;
    seen.add(signature);
    return true;
  });
  const routes = distinct.map((candidate): Route => {
    const start = startOf(candidate);
    const steps: PlanInput['steps'] = [...start.steps];
    const labels = [start.firstLabel];
    for (const stage of candidate.stages) {
      const pipette = request.pipettes[stage.pipetteIndex];
      const flask = request.flasks[stage.flaskIndex];
      steps.push({ kind: 'pipetteAliquot', pipette, volumeMl: stage.volumeMl }, { kind: 'makeUpToVolume', flask });
      labels.push(`${stage.volumeMl} mL (${pipette.itemId}) → ${flask.itemId} (${flask.nominalMl} mL)`);
    }
    const plan: PlanInput = {
      formatVersion: 1,
      title: `Route to ${request.target.value} ${request.target.unit}`,
      analyte: request.analyte,
      settings: { ...request.settings, outputUnit },
      steps,
    };
    const budget = evaluatePlan(plan);
    return {
      plan,
      value: budget.value,
      unit: outputUnit,
      relativeExpandedUncertainty: budget.relativeExpandedUncertainty,
      dilutionSteps: candidate.stages.length,
      materialUsed: start.materialUsed,
      solutionVolumeMl: start.startVolumeMl + candidate.stages.reduce((sum, stage) => sum + stage.flaskMl, 0),
      description: labels.join('; '),
      warnings: budget.warnings,
    };
  });
  const material = (route: Route) =>
    'massG' in route.materialUsed ? route.materialUsed.massG : route.materialUsed.volumeMl;
  routes.sort(
    (left, right) =>
      twoDigits(left.relativeExpandedUncertainty) - twoDigits(right.relativeExpandedUncertainty) ||
      left.dilutionSteps - right.dilutionSteps ||
      material(left) - material(right) ||
      left.solutionVolumeMl - right.solutionVolumeMl,
  );
  const stoppedEarly = search.searchSteps > request.searchBudget;
  return {
    routes: routes.slice(0, limit),
    feasibleCandidates: search.feasibleCandidates,
    stoppedEarly,
    searchNote: stoppedEarly
      ? `The search stopped after ${groupedDigits(request.searchBudget)} candidate routes, so a better route may exist. ` +
        'Allow fewer dilutions, or retire equipment the lab no longer uses, for a complete search.'
      : null,
  };
}

/** A flask's data without its identity: two flasks with equal specifications are interchangeable. */
function flaskSpecification(flask: VolumetricFlask): string {
  return JSON.stringify([flask.nominalMl, flask.toleranceMl, flask.toleranceDistribution, flask.fillRepeatabilityMl]);
}

function twoDigits(value: number): number {
  return Number(value.toPrecision(2));
}

/** Set volumes worth trying: a glass pipette's nominal volume; a piston pipette's listed volumes within range and its largest. */
function pipetteVolumesMl(pipette: GlassPipette | PistonPipette): number[] {
  if (pipette.kind === 'glassPipette') return [pipette.nominalMl];
  const { minimumUl, maximumUl } = pipette.volumeRangeUl;
  const volumes = new Set<number>([maximumUl]);
  for (const entry of pipette.errorSpecifications)
    if (entry.volumeUl >= minimumUl && entry.volumeUl <= maximumUl) volumes.add(entry.volumeUl);
  return [...volumes].map((volumeUl) => volumeUl / 1000);
}

function pistonVariance(pipette: PistonPipette, volumeMl: number): number {
  const errors = pistonErrorsUl(pipette, volumeMl * 1000);
  const systematicFactor = pipette.systematicErrorDistribution === 'triangular' ? 6 : 3;
  return (errors.systematicUl ** 2 / systematicFactor + errors.randomUl ** 2) / (volumeMl * 1000) ** 2;
}

/** Rounds a mass to the balance's readability (the mass the analyst aims at). */
function roundMass(massG: number, readabilityG: number): number {
  if (!(readabilityG > 0)) return Number(massG.toPrecision(6));
  const decimals = Math.max(0, Math.ceil(-Math.log10(readabilityG)));
  return Number(massG.toFixed(decimals));
}
