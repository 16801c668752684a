import { toEngineEquipment } from '../../../../shared/contracts/engine-equipment';
import type { EquipmentItem } from '../../../../shared/contracts/library';
import { overrideReasonSchema } from '../../../../shared/contracts/preparations';
import { earlierMakeUpInSameFlask, type PlanInput } from '../../../../shared/uncertainty';
import { isStepKind, STEP_KINDS, type StepKind } from '../../../../shared/contracts/step-kinds';
import { isStartKind } from './step-choices';
import { parseDecimal } from './parse-decimal';

export type ExtraSourceShape = 'normal' | 'rectangular' | 'triangular' | 'arcsine';

/** An extra named source as the editor holds it: the width as typed. */
export type DraftExtraSource = {
  key: string;
  name: string;
  effect: 'relative' | 'absolute';
  shape: ExtraSourceShape;
  /** Standard uncertainty for a normal source, half-width for the others. */
  amount: string;
};

/** One step as the editor holds it: library ids and the numbers as typed. */
export type DraftStep = {
  key: string;
  kind: StepKind;
  /** Library id of the balance, flask or pipette ('' while none is chosen). */
  equipmentId: string;
  /** Mass or volume as typed, in the unit `quantityUnit` gives (µL for a piston pipette, else STEP_KINDS[kind].quantity). */
  quantity: string;
  containerMassG: string;
  extraSources: DraftExtraSource[];
  /** A make-up in a flask an earlier step used: its earlier solution is bottled and the flask rinsed first. */
  flaskEmptiedBefore?: boolean;
};

/** The unit a step's quantity is typed in: a piston pipette's volume in µL, the unit of the item; else mL or g. */
export type QuantityUnit = 'g' | 'mL' | 'µL';

/** The unit the planner shows beside a step's quantity box, by the step's kind and the item chosen in it. */
export function quantityUnit(kind: StepKind, item: EquipmentItem | undefined): QuantityUnit | null {
  const quantity = STEP_KINDS[kind].quantity;
  if (quantity === null) return null;
  return kind === 'pipetteAliquot' && item?.kind === 'piston-pipette' ? 'µL' : quantity.unit;
}

/** Powers of ten from the unit typed to the unit the plan stores (volumeMl, …G): the one place µL meets mL. */
const TO_PLAN_POWER: Record<QuantityUnit, number> = { g: 0, mL: 0, µL: -3 };

/** A typed quantity as the plan stores it (µL → mL exactly: "250" → 0.25); null when empty, NaN when unreadable. */
export function quantityToPlan(text: string, unit: QuantityUnit): number | null {
  return parseDecimal(text, TO_PLAN_POWER[unit]);
}

/** A stored quantity as the planner shows it, in the unit typed (0.25 mL → "250" µL). */
function quantityFromPlan(value: unknown, unit: QuantityUnit): string {
  const stored = text(value);
  if (TO_PLAN_POWER[unit] === 0) return stored;
  const shown = parseDecimal(stored, -TO_PLAN_POWER[unit]);
  return shown === null || Number.isNaN(shown) ? stored : String(shown);
}

/**
 * A step with another balance, flask or pipette chosen. A one-mark pipette fills in its nominal volume; a volume
 * already typed keeps its meaning when the unit changes (1 mL becomes 1000 µL on choosing a piston pipette); a
 * new flask asks again whether an earlier solution was bottled.
 */
export function withEquipment(
  step: DraftStep,
  equipmentId: string,
  chosen: EquipmentItem | undefined,
  previous: EquipmentItem | undefined,
): DraftStep {
  const changed = { ...step, equipmentId, ...(step.kind === 'makeUpToVolume' ? { flaskEmptiedBefore: false } : {}) };
  if (step.kind !== 'pipetteAliquot') return changed;
  if (chosen?.kind === 'glass-pipette') return { ...changed, quantity: String(chosen.current.data.nominalMl) };
  const from = quantityUnit(step.kind, previous);
  const to = quantityUnit(step.kind, chosen);
  if (from === null || to === null || from === to) return changed;
  const inPlanUnit = quantityToPlan(step.quantity, from);
  return inPlanUnit === null || Number.isNaN(inPlanUnit)
    ? changed
    : { ...changed, quantity: quantityFromPlan(inPlanUnit, to) };
}

/** The earlier step that made a solution in the flask this make-up step chose, if any (the engine's own rule). */
export function earlierStepInSameFlask(steps: readonly DraftStep[], index: number): number | undefined {
  const flaskIds = steps.map((step) =>
    step.kind === 'makeUpToVolume' && step.equipmentId ? step.equipmentId : undefined,
  );
  return earlierMakeUpInSameFlask(flaskIds, index);
}

/** Everything the plan editor edits; turned into the engine's plan document for the budget and the server. */
export type PlanDraft = {
  title: string;
  materialId: string;
  analyte: string;
  outputUnit: string;
  labTemperatureC: string;
  steps: DraftStep[];
  /** Reasons for using an overdue or expired item, by library id. */
  overrides: Record<string, string>;
  seed: number;
};

let keyCounter = 0;
/** A key for a new step or source, unique within the page (React lists and focus). */
export const newKey = (prefix: string) => `${prefix}-${Date.now().toString(36)}-${(keyCounter += 1)}`;

/** A fresh 32-bit Monte Carlo seed. */
export function randomSeed(): number {
  return crypto.getRandomValues(new Uint32Array(1))[0];
}

export function emptyStep(kind: StepKind): DraftStep {
  return { key: newKey('step'), kind, equipmentId: '', quantity: '', containerMassG: '', extraSources: [] };
}

export function emptyDraft(seed: number = randomSeed()): PlanDraft {
  return {
    title: '',
    materialId: '',
    analyte: '',
    outputUnit: 'mg/L',
    labTemperatureC: '20',
    steps: [],
    overrides: {},
    seed,
  };
}

const isRecord = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);
const text = (value: unknown) =>
  typeof value === 'number' && Number.isFinite(value) ? String(value) : typeof value === 'string' ? value : '';
const libraryIdOf = (value: unknown) => (isRecord(value) && typeof value.libraryId === 'string' ? value.libraryId : '');

function extraSourceFromPlan(source: unknown): DraftExtraSource | null {
  if (!isRecord(source) || !isRecord(source.distribution)) return null;
  const distribution = source.distribution;
  const shape = distribution.shape;
  if (shape !== 'normal' && shape !== 'rectangular' && shape !== 'triangular' && shape !== 'arcsine') return null;
  const amount =
    shape === 'normal'
      ? typeof distribution.standardUncertainty === 'number'
        ? distribution.standardUncertainty
        : Number(distribution.expandedUncertainty) / Number(distribution.coverageFactor)
      : distribution.halfWidth;
  return {
    key: newKey('source'),
    name: text(source.name),
    effect: source.effect === 'absolute' ? 'absolute' : 'relative',
    shape,
    amount: text(amount),
  };
}

/** Reads a stored plan document (or a route finder's plan) back into the editor, exactly as it was saved. */
export function draftFromPlan(
  plan: Record<string, unknown>,
  extras: { title: string; overrides: { libraryId: string; reason: string }[]; seed: number },
): PlanDraft {
  const settings = isRecord(plan.settings) ? plan.settings : {};
  const steps = Array.isArray(plan.steps) ? plan.steps.filter(isRecord) : [];
  const start = steps.find((step) => isStepKind(step.kind) && isStartKind(step.kind));
  return {
    title: extras.title,
    materialId: libraryIdOf(start?.material),
    analyte: isRecord(plan.analyte) ? text(plan.analyte.formula) : '',
    outputUnit: text(settings.outputUnit) || 'mg/L',
    labTemperatureC: text(settings.labTemperatureC) || '20',
    overrides: Object.fromEntries(extras.overrides.map((override) => [override.libraryId, override.reason])),
    seed: extras.seed,
    steps: steps
      .filter((step): step is Record<string, unknown> & { kind: StepKind } => isStepKind(step.kind))
      .map((step) => {
        const info = STEP_KINDS[step.kind];
        const piston = isRecord(step.pipette) && step.pipette.kind === 'pistonPipette';
        return {
          key: newKey('step'),
          kind: step.kind,
          equipmentId: info.slot ? libraryIdOf(step[info.slot.name]) : '',
          quantity: info.quantity
            ? quantityFromPlan(step[info.quantity.field], piston ? 'µL' : info.quantity.unit)
            : '',
          ...(step.flaskEmptiedBefore === true ? { flaskEmptiedBefore: true } : {}),
          containerMassG:
            step.containerMassG === undefined || step.containerMassG === 0 ? '' : text(step.containerMassG),
          extraSources: (Array.isArray(step.extraSources) ? step.extraSources : [])
            .map(extraSourceFromPlan)
            .filter((source) => source !== null),
        };
      }),
  };
}

function extraSourceToPlan(source: DraftExtraSource) {
  const amount = parseDecimal(source.amount) ?? Number.NaN;
  const distribution =
    source.shape === 'normal'
      ? { shape: 'normal', standardUncertainty: amount }
      : { shape: source.shape, halfWidth: amount };
  return { name: source.name.trim(), effect: source.effect, distribution };
}

function buildPlan(draft: PlanDraft, library: Map<string, EquipmentItem>, withTitle: boolean): PlanInput {
  // Each item inline from the library's current revision, with its libraryId and revisionId (an unknown id stays a bare reference).
  const writeEquipment = (id: string) => {
    const item = library.get(id);
    return item ? toEngineEquipment(item) : { libraryId: id };
  };
  const material = draft.materialId ? writeEquipment(draft.materialId) : undefined;
  const steps = draft.steps.map((step, index) => {
    const info = STEP_KINDS[step.kind];
    const out: Record<string, unknown> = { kind: step.kind };
    if (isStartKind(step.kind) && material) out.material = material;
    if (info.slot && step.equipmentId) out[info.slot.name] = writeEquipment(step.equipmentId);
    if (info.quantity) {
      const item = library.get(step.equipmentId);
      // A one-mark glass pipette delivers its nominal volume, whatever was typed.
      const glassVolume =
        step.kind === 'pipetteAliquot' && item?.kind === 'glass-pipette'
          ? (item.current.data.nominalMl as number)
          : undefined;
      const typed = quantityToPlan(step.quantity, quantityUnit(step.kind, item) ?? info.quantity.unit);
      out[info.quantity.field] = glassVolume ?? (typed === null ? undefined : typed);
    }
    // Said only of a flask an earlier step used: elsewhere there is nothing to bottle (and the engine refuses it).
    if (step.flaskEmptiedBefore && earlierStepInSameFlask(draft.steps, index) !== undefined)
      out.flaskEmptiedBefore = true;
    if (info.container) {
      const container = parseDecimal(step.containerMassG);
      if (container !== null) out.containerMassG = container;
    }
    out.extraSources = step.extraSources.map(extraSourceToPlan);
    return out;
  });
  const temperature = parseDecimal(draft.labTemperatureC);
  return {
    formatVersion: 1,
    ...(withTitle && draft.title.trim() ? { title: draft.title.trim() } : {}),
    analyte: { formula: draft.analyte.trim() },
    settings: {
      outputUnit: draft.outputUnit as PlanInput['settings']['outputUnit'],
      ...(temperature === null ? {} : { labTemperatureC: temperature }),
    },
    steps: steps as PlanInput['steps'],
  };
}

/** The plan with every item inline from the library's current revision, as the engine (and the server, after resolving) computes it; the title is left out, so renaming never restarts a calculation. */
export function enginePlan(draft: PlanDraft, library: Map<string, EquipmentItem>): PlanInput {
  return buildPlan(draft, library, false);
}

/** The plan to save, with its title; the server resolves every libraryId to the current revision again before computing. */
export function storedPlan(draft: PlanDraft, library: Map<string, EquipmentItem>): Record<string, unknown> {
  return buildPlan(draft, library, true);
}

/** The override reasons worth sending: items the plan uses, with a reason the server accepts (the shared schema). */
export function overridesToSave(draft: PlanDraft): { libraryId: string; reason: string }[] {
  const used = new Set([draft.materialId, ...draft.steps.map((step) => step.equipmentId)]);
  return Object.entries(draft.overrides)
    .filter(([libraryId, reason]) => used.has(libraryId) && overrideReasonSchema.safeParse(reason).success)
    .map(([libraryId, reason]) => ({ libraryId, reason: reason.trim() }));
}
