import { massOnThePan, type AirBuoyancySetting } from './air-buoyancy';
import { standardAtomicWeights, type AtomicWeightTable } from './atomic-weights';
import { weighByDifference } from './balance-weighing';
import {
  certifiedSolutionDensity,
  knownCertifiedSolutionDensity,
  type DensityValue,
} from './certified-solution-density';
import { parseFormula, type Composition } from './chemical-formula';
import { analyteCountIn, hasCertificateComposition, materialMolarMassNodes, molarMassNode } from './composition-nodes';
import { addAbsoluteExtraSources, applyRelativeExtraSources } from './extra-sources';
import { checkFlaskHoldsNoSolution } from './flask-use';
import { ModelBuilder, type NodeReference } from './model-builder';
import type { CompiledModel } from './model-types';
import { parsePlan } from './parse-plan';
import { PlanError } from './plan-error';
import { checkAliquotFromSolution, checkPortionFitsMakeUp, type Amount } from './plan-plausibility';
import { settingsWithDefaults, type Plan, type PlanInput, type PlanStep } from './plan-schema';
import type { StepContext } from './step-context';
import { unitOf } from './units';
import { glasswareVolume, pistonVolume } from './volume-delivery';
import { waterDensityKgPerM3 } from './water-density';

/** Where the preparation stands between steps. */
type ChainState =
  | { kind: 'nothing' }
  /**
   * A quantity of analyte in hand (mg), e.g. a weighed solid or an aliquot not yet diluted;
   * `taken`: the solid's mass, or the aliquot's volume or mass, which the next make-up must hold;
   * `takenDensityGPerMl`: the estimated density of the solution an aliquot was taken from.
   */
  | {
      kind: 'portion';
      amountMg: NodeReference;
      fromSolid: boolean;
      taken: Amount;
      takenDensityGPerMl?: number;
    }
  /**
   * A solution: mass concentration (mg/L), mass fraction (mg/kg) or molality (mol/kg);
   * `density` converts between the first two, asked only when a conversion needs it (`purpose` says which, for
   * a refusal's words); `buoyancyDensity` is what an air-buoyancy correction of a weighing of it uses;
   * `holds` is how much was made (the flask's volume or the final mass) and at which step, when known (not for a
   * certified solution).
   */
  | {
      kind: 'solution';
      basis: 'massConcentration' | 'massFraction' | 'molality';
      value: NodeReference;
      density: (purpose: string) => DensityValue;
      buoyancyDensity: () => DensityValue;
      holds?: { amount: Amount; stepIndex: number };
    };

const basisUnit = { massConcentration: 'mg/L', massFraction: 'mg/kg', molality: 'mol/kg' } as const;

export interface CompileOptions {
  atomicWeights?: AtomicWeightTable;
}

/**
 * Turns a plan into its measurement model (sources + evaluation tape). Validates the plan first.
 * Chain: weighSolid → amount (mg) = m·1000·P·f·(buoyancy), f = n·M(analyte)/M(compound);
 * makeUpToVolume → c = amount·1000/V (mg/L); pipetteAliquot → amount = c·V/1000;
 * weighAliquot → amount = w·m/1000; makeUpToMass → w = amount·1000/m (mg/kg);
 * dissolveInSolvent → b = amount/(M(analyte)·m_solvent) (mol/kg); w = c/ρ, c = w·ρ.
 * @throws PlanError for an invalid plan or an impossible sequence of steps
 */
export function compilePlan(input: PlanInput | Plan, options: CompileOptions = {}): CompiledModel {
  const plan = parsePlan(input);
  const atomicWeights = options.atomicWeights ?? standardAtomicWeights;
  const builder = new ModelBuilder();
  const analyte = parseFormula(plan.analyte.formula, ['analyte', 'formula'], atomicWeights);
  const analyteSymbol = plan.analyte.formula;
  let analyteMolarMass: NodeReference | undefined;
  const analyteMolarMassNode = (stepIndex: number) => {
    analyteMolarMass ??= molarMassNode(builder, analyte, atomicWeights, stepIndex, ['analyte', 'formula']);
    return analyteMolarMass;
  };
  const solutionDensity = solutionDensityNode(builder, plan);
  const waterGPerMl = waterDensityKgPerM3(plan.settings.labTemperatureC) / 1000;
  const airBuoyancy = effectiveAirBuoyancy(plan);
  /** A material's lot values, when its certificate gives them, are the plan's M(analyte) from then on. */
  const adoptAnalyteMolarMass = <Nodes extends { analyte: NodeReference }>(nodes: Nodes) => {
    analyteMolarMass = nodes.analyte;
    return nodes;
  };

  const settings = settingsWithDefaults(plan.settings);
  let state = { kind: 'nothing' } as ChainState;
  plan.steps.forEach((step, stepIndex) => {
    const context: StepContext = {
      builder,
      settings,
      atomicWeights,
      stepIndex,
      path: ['steps', stepIndex],
    };
    checkFlaskHoldsNoSolution(plan.steps, stepIndex);
    state = applyStep(context, step, state, {
      analyte,
      analyteMolarMassNode,
      adoptAnalyteMolarMass,
      solutionDensity,
      waterGPerMl,
      airBuoyancy,
    });
    if (state.kind === 'solution') {
      builder.checkpoint({
        stepIndex,
        label: `after step ${stepIndex + 1}`,
        node: state.value,
        unit: basisUnit[state.basis],
      });
    }
  });

  const finalState = state;
  if (finalState.kind !== 'solution') {
    throw new PlanError(
      ['steps', plan.steps.length - 1],
      'The plan ends without a solution; finish with a make-up step (to volume, to mass, or in solvent).',
    );
  }
  const output = unitOf(plan.settings.outputUnit, ['settings', 'outputUnit']);
  const outputNode = convertToUnit(builder, finalState, output, () => analyteMolarMassNode(plan.steps.length - 1));
  const symbol = { massConcentration: 'c', amountConcentration: 'c', massFraction: 'w', molality: 'b' }[
    output.dimension
  ];
  // A quantity per volume is stated at the reference temperature its volumes were corrected to.
  const perVolume = output.dimension === 'massConcentration' || output.dimension === 'amountConcentration';
  const referenceTemperatureC = perVolume ? settings.referenceTemperatureC : undefined;
  return builder.build(outputNode, output.name, `${symbol}(${analyteSymbol})`, referenceTemperatureC);
}

interface SharedNodes {
  analyte: Composition;
  analyteMolarMassNode: (stepIndex: number) => NodeReference;
  adoptAnalyteMolarMass: <Nodes extends { analyte: NodeReference }>(nodes: Nodes) => Nodes;
  /** Density of the solutions the plan prepares: the plan's stated one, or water at the lab temperature. */
  solutionDensity: DensityValue;
  /** Water at the lab temperature (Tanaka et al. 2001), g/mL. */
  waterGPerMl: number;
  airBuoyancy: AirBuoyancySetting | undefined;
}

/**
 * The plan's air-buoyancy setting; a plan written before it, whose weighSolid step carries its own
 * `airBuoyancy`, reads as "correct every weighing with these densities" (the air density without uncertainty).
 */
function effectiveAirBuoyancy(plan: Plan): AirBuoyancySetting | undefined {
  if (plan.settings.airBuoyancy !== undefined) return plan.settings.airBuoyancy;
  for (const step of plan.steps) {
    if (step.kind === 'weighSolid' && step.airBuoyancy !== undefined) {
      return { treatment: 'correct', airDensityHalfRangeKgPerM3: 0, ...step.airBuoyancy };
    }
  }
  return undefined;
}

/** A density in kg/m³, as air buoyancy reads it. */
function inKgPerM3(builder: ModelBuilder, density: DensityValue) {
  return { densityKgPerM3: builder.scale(density.node, 1000), densityEstimateKgPerM3: density.estimateGPerMl * 1000 };
}

function applyStep(context: StepContext, step: PlanStep, state: ChainState, shared: SharedNodes): ChainState {
  const { builder, path } = context;
  const requireState = (kind: ChainState['kind'], what: string) => {
    if (state.kind !== kind)
      throw new PlanError([...path, 'kind'], `Step ${context.stepIndex + 1} (${step.kind}) ${what}.`);
  };
  switch (step.kind) {
    case 'weighSolid': {
      requireState('nothing', 'must be the first step: a plan starts from one weighed solid or one certified solution');
      let mass = weighByDifference(context, step.balance, step.netMassG, step.containerMassG, 'netMassG');
      mass = addAbsoluteExtraSources(context, mass, step.extraSources, 'g');
      if (shared.airBuoyancy !== undefined) {
        const density = step.material.densityKgPerM3;
        if (density === undefined)
          throw new PlanError(
            [...path, 'material', 'densityKgPerM3'],
            `Enter the density of ${step.material.name} (${step.material.itemId}) in the library, from its safety data sheet or certificate: every weighing is ${shared.airBuoyancy.treatment === 'correct' ? 'corrected' : 'allowed an uncertainty'} for air buoyancy, which depends on the density of what is weighed.`,
          );
        mass = massOnThePan(
          context,
          mass,
          { densityKgPerM3: builder.constant(density), densityEstimateKgPerM3: density },
          shared.airBuoyancy,
          shared.waterGPerMl * 1000,
        );
      }
      const purity = builder.source({
        id: `item:${step.material.itemId}:purity`,
        label: `${step.material.name} (${step.material.itemId}): purity`,
        category: 'purity',
        estimate: step.material.purity.massFraction,
        unit: 'g/g',
        distribution: step.material.purity.uncertainty,
        sharing: 'item',
        itemId: step.material.itemId,
        stepIndex: context.stepIndex,
        path: [...path, 'material', 'purity', 'uncertainty'],
      });
      const formulaPath = [...path, 'material', 'formula'];
      const compound = parseFormula(step.material.formula, formulaPath, context.atomicWeights);
      const count = analyteCountIn(compound, shared.analyte, step.material.analyteCount, [...path, 'material']);
      const molarMasses = hasCertificateComposition(step.material)
        ? shared.adoptAnalyteMolarMass(
            materialMolarMassNodes(
              builder,
              step.material,
              compound,
              shared.analyte,
              count,
              context.atomicWeights,
              context.stepIndex,
              [...path, 'material'],
            ),
          )
        : {
            analyte: shared.analyteMolarMassNode(context.stepIndex),
            compound: molarMassNode(builder, compound, context.atomicWeights, context.stepIndex, formulaPath),
          };
      const factor = builder.divide(builder.scale(molarMasses.analyte, count), molarMasses.compound);
      const amountMg = builder.multiply(builder.multiply(builder.scale(mass, 1000), purity), factor);
      return {
        kind: 'portion',
        amountMg: applyRelativeExtraSources(context, amountMg, step.extraSources),
        fromSolid: true,
        taken: { unit: 'g', value: step.netMassG },
      };
    }
    case 'startFromCertifiedSolution': {
      requireState('nothing', 'must be the first step: a plan starts from one weighed solid or one certified solution');
      const material = step.material;
      const unit = unitOf(material.certifiedUnit, [...path, 'material', 'certifiedUnit']);
      let value = builder.add(
        builder.constant(material.certifiedValue),
        builder.source({
          id: `item:${material.itemId}:certified-value`,
          label: `${material.name} (${material.itemId}): certified value`,
          category: 'certifiedValue',
          estimate: 0,
          unit: unit.name,
          distribution: material.uncertainty,
          sharing: 'item',
          itemId: material.itemId,
          stepIndex: context.stepIndex,
          path: [...path, 'material', 'uncertainty'],
        }),
      );
      value = addAbsoluteExtraSources(context, value, step.extraSources, unit.name);
      value = applyRelativeExtraSources(context, builder.scale(value, unit.factorToBase), step.extraSources);
      // The certificate's density enters the model at once (as it always has); any other only when a conversion asks.
      let density = material.densityGPerMl === undefined ? undefined : knownCertifiedSolutionDensity(context, material);
      return {
        kind: 'solution',
        basis: unit.dimension === 'massFraction' ? 'massFraction' : 'massConcentration',
        value,
        density: (purpose) => (density ??= certifiedSolutionDensity(context, material, shared.waterGPerMl, purpose)),
        buoyancyDensity: () => density ?? knownCertifiedSolutionDensity(context, material) ?? shared.solutionDensity,
      };
    }
    case 'makeUpToVolume': {
      requireState(
        'portion',
        'makes up a weighed solid or an aliquot to volume; put a weighing or an aliquot before it',
      );
      if (state.kind !== 'portion') throw new Error('unreachable');
      // A flask cannot be made up to a mark below the liquid already in it (common practice: a dilution dilutes).
      checkPortionFitsMakeUp({
        stepIndex: context.stepIndex,
        portion: state.fromSolid ? undefined : state.taken,
        portionKind: 'aliquot',
        made: { unit: 'mL', value: step.flask.nominalMl },
        densityGPerMl: state.takenDensityGPerMl ?? shared.solutionDensity.estimateGPerMl,
        path: [...path, 'flask'],
      });
      const volume = addAbsoluteExtraSources(
        context,
        glasswareVolume(context, step.flask, 'flask'),
        step.extraSources,
        'mL',
      );
      const concentration = builder.scale(builder.divide(state.amountMg, volume), 1000);
      return {
        kind: 'solution',
        basis: 'massConcentration',
        value: applyRelativeExtraSources(context, concentration, step.extraSources),
        ...preparedSolutionDensity(shared),
        holds: { amount: { unit: 'mL', value: step.flask.nominalMl }, stepIndex: context.stepIndex },
      };
    }
    case 'pipetteAliquot': {
      requireState('solution', 'takes an aliquot of a solution; put a make-up step or a certified solution before it');
      if (state.kind !== 'solution') throw new Error('unreachable');
      if (state.basis === 'molality')
        throw new PlanError(
          [...path, 'kind'],
          'An aliquot by volume of a molality solution cannot be converted to an amount; weigh it instead.',
        );
      checkAliquotFromSolution({
        stepIndex: context.stepIndex,
        aliquot: { unit: 'mL', value: step.volumeMl },
        source: state.holds,
        densityGPerMl: state.buoyancyDensity().estimateGPerMl,
        path: [...path, 'volumeMl'],
      });
      const pipette = step.pipette;
      if (pipette.kind === 'glassPipette' && Math.abs(step.volumeMl - pipette.nominalMl) > 1e-9 * pipette.nominalMl) {
        throw new PlanError(
          [...path, 'volumeMl'],
          `A one-mark pipette delivers its nominal volume (${pipette.nominalMl} mL), not ${step.volumeMl} mL.`,
        );
      }
      let volume =
        pipette.kind === 'glassPipette'
          ? glasswareVolume(context, pipette, 'pipette')
          : pistonVolume(context, pipette, step.volumeMl);
      volume = addAbsoluteExtraSources(context, volume, step.extraSources, 'mL');
      const massConcentration =
        state.basis === 'massConcentration'
          ? state.value
          : builder.multiply(state.value, state.density(`is taken by volume in step ${context.stepIndex + 1}`).node);
      const amountMg = builder.scale(builder.multiply(massConcentration, volume), 1e-3);
      return {
        kind: 'portion',
        amountMg: applyRelativeExtraSources(context, amountMg, step.extraSources),
        fromSolid: false,
        taken: { unit: 'mL', value: step.volumeMl },
        takenDensityGPerMl: state.buoyancyDensity().estimateGPerMl,
      };
    }
    case 'weighAliquot': {
      requireState('solution', 'weighs an aliquot of a solution; put a make-up step or a certified solution before it');
      if (state.kind !== 'solution') throw new Error('unreachable');
      if (state.basis === 'molality')
        throw new PlanError(
          [...path, 'kind'],
          'Diluting a molality solution is not supported; prepare the molality directly.',
        );
      checkAliquotFromSolution({
        stepIndex: context.stepIndex,
        aliquot: { unit: 'g', value: step.netMassG },
        source: state.holds,
        densityGPerMl: state.buoyancyDensity().estimateGPerMl,
        path: [...path, 'netMassG'],
      });
      const mass = massOnThePan(
        context,
        addAbsoluteExtraSources(
          context,
          weighByDifference(context, step.balance, step.netMassG, step.containerMassG, 'netMassG'),
          step.extraSources,
          'g',
        ),
        inKgPerM3(builder, state.buoyancyDensity()),
        shared.airBuoyancy,
        shared.waterGPerMl * 1000,
      );
      const massFraction =
        state.basis === 'massFraction'
          ? state.value
          : builder.divide(state.value, state.density(`is weighed in step ${context.stepIndex + 1}`).node);
      const amountMg = builder.scale(builder.multiply(massFraction, mass), 1e-3);
      return {
        kind: 'portion',
        amountMg: applyRelativeExtraSources(context, amountMg, step.extraSources),
        fromSolid: false,
        taken: { unit: 'g', value: step.netMassG },
        takenDensityGPerMl: state.buoyancyDensity().estimateGPerMl,
      };
    }
    case 'makeUpToMass': {
      requireState(
        'portion',
        'makes up a weighed solid or an aliquot to a final mass; put a weighing or an aliquot before it',
      );
      if (state.kind !== 'portion') throw new Error('unreachable');
      checkPortionFitsMakeUp({
        stepIndex: context.stepIndex,
        portion: state.taken,
        portionKind: state.fromSolid ? 'solid' : 'aliquot',
        made: { unit: 'g', value: step.finalMassG },
        densityGPerMl: state.takenDensityGPerMl ?? shared.solutionDensity.estimateGPerMl,
        path: [...path, 'finalMassG'],
      });
      const mass = massOnThePan(
        context,
        addAbsoluteExtraSources(
          context,
          weighByDifference(context, step.balance, step.finalMassG, step.containerMassG, 'finalMassG'),
          step.extraSources,
          'g',
        ),
        inKgPerM3(builder, shared.solutionDensity),
        shared.airBuoyancy,
        shared.waterGPerMl * 1000,
      );
      const massFraction = builder.scale(builder.divide(state.amountMg, mass), 1000);
      return {
        kind: 'solution',
        basis: 'massFraction',
        value: applyRelativeExtraSources(context, massFraction, step.extraSources),
        ...preparedSolutionDensity(shared),
        holds: { amount: { unit: 'g', value: step.finalMassG }, stepIndex: context.stepIndex },
      };
    }
    case 'dissolveInSolvent': {
      requireState('portion', 'dissolves a weighed solid in a weighed mass of solvent; put the weighing before it');
      if (state.kind !== 'portion' || !state.fromSolid) {
        throw new PlanError(
          [...path, 'kind'],
          'A molality is prepared by dissolving the weighed solid itself; an aliquot of a solution already contains solvent.',
        );
      }
      // The solvent is water at the lab temperature (the design's aqueous solutions).
      const water = shared.waterGPerMl * 1000;
      const solvent = massOnThePan(
        context,
        addAbsoluteExtraSources(
          context,
          weighByDifference(context, step.balance, step.solventMassG, step.containerMassG, 'solventMassG'),
          step.extraSources,
          'g',
        ),
        { densityKgPerM3: builder.constant(water), densityEstimateKgPerM3: water },
        shared.airBuoyancy,
        water,
      );
      const molality = builder.divide(
        state.amountMg,
        builder.multiply(shared.analyteMolarMassNode(context.stepIndex), solvent),
      );
      return {
        kind: 'solution',
        basis: 'molality',
        value: applyRelativeExtraSources(context, molality, step.extraSources),
        ...preparedSolutionDensity(shared),
      };
    }
  }
}

/** A solution the plan prepared: its density is the plan's one density of prepared solutions. */
function preparedSolutionDensity(shared: SharedNodes) {
  return { density: () => shared.solutionDensity, buoyancyDensity: () => shared.solutionDensity };
}

/** Density of prepared solutions (g/mL): the plan's stated value with its uncertainty, or water at the lab temperature (Tanaka 2001). */
function solutionDensityNode(builder: ModelBuilder, plan: Plan): DensityValue {
  const stated = plan.settings.solutionDensity;
  if (stated === undefined) {
    const water = waterDensityKgPerM3(plan.settings.labTemperatureC) / 1000;
    return { node: builder.constant(water), estimateGPerMl: water };
  }
  const node = builder.add(
    builder.constant(stated.densityGPerMl),
    builder.source({
      id: 'plan:solution-density',
      label: 'Density of the prepared solutions',
      category: 'density',
      estimate: 0,
      unit: 'g/mL',
      distribution: { shape: 'normal', standardUncertainty: stated.standardUncertaintyGPerMl },
      sharing: 'item',
      stepIndex: 0,
      path: ['settings', 'solutionDensity'],
    }),
  );
  return { node, estimateGPerMl: stated.densityGPerMl };
}

function convertToUnit(
  builder: ModelBuilder,
  state: Extract<ChainState, { kind: 'solution' }>,
  unit: ReturnType<typeof unitOf>,
  analyteMolarMass: () => NodeReference,
): NodeReference {
  const mismatch = () =>
    new PlanError(
      ['settings', 'outputUnit'],
      `The plan prepares a ${describeBasis(state.basis)}; it cannot be stated in ${unit.name}.`,
    );
  if (state.basis === 'molality') {
    if (unit.dimension !== 'molality') throw mismatch();
    return builder.scale(state.value, 1 / unit.factorToBase);
  }
  if (unit.dimension === 'molality') throw mismatch();
  const density = () => state.density(`is stated in ${unit.name}`).node;
  const massConcentration = () =>
    state.basis === 'massConcentration' ? state.value : builder.multiply(state.value, density());
  switch (unit.dimension) {
    case 'massConcentration':
      return builder.scale(massConcentration(), 1 / unit.factorToBase);
    case 'amountConcentration':
      // c[mol/L] = c[mg/L] / (1000 mg/g · M[g/mol])
      return builder.scale(builder.divide(massConcentration(), analyteMolarMass()), 1e-3 / unit.factorToBase);
    case 'massFraction': {
      const massFraction = state.basis === 'massFraction' ? state.value : builder.divide(state.value, density());
      return builder.scale(massFraction, 1 / unit.factorToBase);
    }
  }
}

function describeBasis(basis: 'massConcentration' | 'massFraction' | 'molality'): string {
  return {
    massConcentration: 'mass concentration',
    massFraction: 'mass fraction',
    molality: 'molality (mol/kg of solvent)',
  }[basis];
}
