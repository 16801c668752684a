import { aliquotDrawnFrom, earlierMakeUpInSameFlask } from '../uncertainty/flask-use';
import type { Plan, PlanStep } from '../uncertainty/plan-schema';
import { formatToReadability } from './balance-reading';
import type { EquipmentKind } from './library';
import type { RecordedReadings } from './preparations';
import type { UsedItem } from './snapshot';

/**
 * Every step kind of the plan format, in one table: its name, what the planner says about it, which library
 * items fill its slots, the number the analyst types, the mass a bench reading replaces, and the instruction the
 * bench sheet and the PDF record print. The engine's plan schema names the kinds; a kind without an entry here
 * fails the type check.
 */

export type StepKind = PlanStep['kind'];
type StepOf<K extends StepKind> = Extract<PlanStep, { kind: K }>;

/** The slot of a step filled from the library besides the material (which the plan's material fills). */
type EquipmentSlot = 'balance' | 'flask' | 'pipette';

/** A step's number the analyst types (mass or volume), by its plan field name. */
type QuantityField = 'netMassG' | 'volumeMl' | 'finalMassG' | 'solventMassG';

/** The plan field a mass weighed at the bench replaces. */
type RecordedMassField = RecordedReadings['readings'][number]['field'];

/** Where a step holds a library item: the plan's material, or its balance, flask or pipette. */
type ItemSlot = 'material' | EquipmentSlot;

/** What an instruction needs besides the step itself. */
type InstructionContext = {
  /** The item in a slot of the step as the reader needs it: "BAL-05" at the bench, with revision and certificate in the record. */
  item: (slot: ItemSlot) => string;
  /** The step's position in the plan, from 0. */
  stepIndex: number;
  labTemperatureC: number;
};

type StepKindEntry<K extends StepKind> = {
  /** The step's name, everywhere it is named: "Step 2 · Make up to volume (VF-100-A)". */
  label: string;
  /** What the step does, in a line, for the planner's step card. */
  hint: string;
  /** Library kinds that may be the plan's material at this step; null when the step takes no material. */
  materialKinds: readonly EquipmentKind[] | null;
  /** The equipment slot the step fills from the library, its name on a form, and the library kinds that fill it. */
  slot: { name: EquipmentSlot; label: string; libraryKinds: readonly EquipmentKind[] } | null;
  /** The mass or volume the analyst plans. */
  quantity: { field: QuantityField & keyof StepOf<K>; label: string; unit: 'g' | 'mL' } | null;
  /** The mass a reading at the bench replaces; null for a step that is not weighed. */
  recordedMass: (RecordedMassField & keyof StepOf<K>) | null;
  /** A weighing that may name the container on the pan (for the capacity check). */
  container: boolean;
  /** What lies on the balance when the step is weighed, for the readings form ("aliquot of the solution"); null when nothing is weighed. */
  onThePan: ((materialName: string) => string) | null;
  /** The instruction for the step, printed on the bench sheet and in the PDF record. */
  instruction: (step: StepOf<K>, context: InstructionContext) => string;
};

const BALANCE = { name: 'balance', label: 'Balance', libraryKinds: ['balance'] } as const;

const onBalance = (massG: number, balance: { readabilityG: number }) =>
  `${formatToReadability(massG, balance.readabilityG)} g`;
const glassClass = (toleranceClass: 'A' | 'B' | 'own') =>
  toleranceClass === 'own' ? 'own calibration' : `class ${toleranceClass}`;
/** 0.25 mL → "250": a piston pipette's set volume in µL, without binary remainders. */
const microlitres = (volumeMl: number) => String(Number((volumeMl * 1000).toPrecision(12)));

export const STEP_KINDS: { [K in StepKind]: StepKindEntry<K> } = {
  weighSolid: {
    label: 'Weigh the solid',
    hint: 'Weigh the reference material by difference (gross − tare).',
    materialKinds: ['solid-material'],
    slot: BALANCE,
    quantity: { field: 'netMassG', label: 'Net mass', unit: 'g' },
    recordedMass: 'netMassG',
    container: true,
    onThePan: (materialName) => materialName || 'the solid',
    instruction: (step, { item }) =>
      `Weigh ${onBalance(step.netMassG, step.balance)} of ${step.material.name} — ${item('material')} — by difference on ${item('balance')}.`,
  },
  startFromCertifiedSolution: {
    label: 'Start from the certified solution',
    hint: 'The certified solution is the starting concentration.',
    materialKinds: ['solution-material'],
    slot: null,
    quantity: null,
    recordedMass: null,
    container: false,
    onThePan: null,
    instruction: (step, { item }) =>
      `Let the certified solution ${step.material.name} (${step.material.certifiedValue} ${step.material.certifiedUnit}) — ${item('material')} — reach room temperature, and shake it.`,
  },
  makeUpToVolume: {
    label: 'Make up to volume',
    hint: 'Transfer into the flask and fill to the mark.',
    materialKinds: null,
    slot: { name: 'flask', label: 'Volumetric flask', libraryKinds: ['flask'] },
    quantity: null,
    recordedMass: null,
    container: false,
    onThePan: null,
    instruction: (step, { item, labTemperatureC }) =>
      `Transfer quantitatively into the ${step.flask.nominalMl} mL flask ${item('flask')}, ${glassClass(step.flask.toleranceClass)}${step.flaskEmptiedBefore ? ' (its earlier solution bottled and the flask rinsed)' : ''}, and make up to the mark at about ${labTemperatureC} °C; stopper and mix.`,
  },
  pipetteAliquot: {
    label: 'Pipette an aliquot',
    hint: 'Take an aliquot of the solution with a pipette.',
    materialKinds: null,
    slot: { name: 'pipette', label: 'Pipette', libraryKinds: ['glass-pipette', 'piston-pipette'] },
    quantity: { field: 'volumeMl', label: 'Volume', unit: 'mL' },
    recordedMass: null,
    container: false,
    onThePan: null,
    instruction: (step, { item, stepIndex }) => {
      const from = stepIndex > 0 ? ` from the solution of step ${stepIndex}` : '';
      return step.pipette.kind === 'pistonPipette'
        ? `Set the piston pipette ${item('pipette')} to ${microlitres(step.volumeMl)} µL and deliver the aliquot${from}.`
        : `Pipette ${step.volumeMl} mL${from} with the one-mark pipette ${item('pipette')}, ${glassClass(step.pipette.toleranceClass)}.`;
    },
  },
  weighAliquot: {
    label: 'Weigh an aliquot',
    hint: 'Take an aliquot of the solution by mass.',
    materialKinds: null,
    slot: BALANCE,
    quantity: { field: 'netMassG', label: 'Aliquot mass', unit: 'g' },
    recordedMass: 'netMassG',
    container: true,
    onThePan: () => 'aliquot of the solution',
    instruction: (step, { item }) =>
      `Weigh ${onBalance(step.netMassG, step.balance)} of the solution by difference on ${item('balance')}.`,
  },
  makeUpToMass: {
    label: 'Make up to mass',
    hint: 'Dilute with solvent to a weighed total mass.',
    materialKinds: null,
    slot: BALANCE,
    quantity: { field: 'finalMassG', label: 'Final solution mass', unit: 'g' },
    recordedMass: 'finalMassG',
    container: true,
    onThePan: () => 'solution made up to mass',
    instruction: (step, { item }) =>
      `Add solvent to a total solution mass of ${onBalance(step.finalMassG, step.balance)} on ${item('balance')}; mix.`,
  },
  dissolveInSolvent: {
    label: 'Dissolve in solvent',
    hint: 'Dissolve the weighed solid in a weighed mass of solvent (molality).',
    materialKinds: null,
    slot: BALANCE,
    quantity: { field: 'solventMassG', label: 'Solvent mass', unit: 'g' },
    recordedMass: 'solventMassG',
    container: true,
    onThePan: () => 'solvent',
    instruction: (step, { item }) =>
      `Dissolve in ${onBalance(step.solventMassG, step.balance)} of solvent weighed on ${item('balance')}.`,
  },
};

/**
 * What to do first, before some steps, by step index (from 0): for a make-up in a flask that held an earlier
 * solution of the plan (`flaskEmptiedBefore`), bottle that solution and rinse the flask, before the aliquot for
 * the make-up (which is then taken from the bottle). So neither the bench sheet nor the PDF record ever has the
 * analyst transfer into a flask that still holds the stock. Steps not yet complete are `undefined`.
 */
export function firstInstructions(steps: readonly (PlanStep | undefined)[]): Map<number, string> {
  const flaskIds = steps.map((step) => (step?.kind === 'makeUpToVolume' ? step.flask.itemId : undefined));
  const kinds = steps.map((step) => ({ kind: step?.kind ?? '' }));
  const lines = new Map<number, string>();
  steps.forEach((step, stepIndex) => {
    const earlier = earlierMakeUpInSameFlask(flaskIds, stepIndex);
    if (step?.kind !== 'makeUpToVolume' || !step.flaskEmptiedBefore || earlier === undefined) return;
    const aliquotIndex = stepIndex - 1;
    const beforeAliquot =
      (kinds[aliquotIndex].kind === 'pipetteAliquot' || kinds[aliquotIndex].kind === 'weighAliquot') &&
      aliquotIndex > earlier;
    const fromIt = beforeAliquot && aliquotDrawnFrom(kinds, earlier, stepIndex) !== undefined;
    const flask = step.flask.itemId;
    lines.set(
      beforeAliquot ? aliquotIndex : stepIndex,
      `First transfer the solution of step ${earlier + 1} from ${flask} into a labelled storage bottle, and rinse ${flask}` +
        (fromIt ? '; take this aliquot from that bottle.' : '.'),
    );
  });
  return lines;
}

/** True for a kind the plan format knows (and not for "toString" or other names every object has). */
export const isStepKind = (kind: unknown): kind is StepKind =>
  typeof kind === 'string' && Object.hasOwn(STEP_KINDS, kind);

/** What a reading at the bench of this kind of step is, in words: "net mass", "final solution mass". */
export const readingWords = (kind: StepKind): string => STEP_KINDS[kind].quantity?.label.toLowerCase() ?? 'mass';

/** The instruction for one step of a computed plan. */
export function stepInstruction(step: PlanStep, context: InstructionContext): string {
  // Each entry's instruction takes its own kind of step; this step is of the kind it was looked up by.
  const instruction = STEP_KINDS[step.kind].instruction as (step: PlanStep, context: InstructionContext) => string;
  return instruction(step, context);
}

/** A slot left empty, in the words the planner shows at the field and the server puts after "Step n: ". */
export const emptySlotWords = (slotName: string) => `Choose the ${slotName} from the lab’s library.`;

/** An item of the wrong kind in a slot, in the planner's and the server's words alike. */
export const wrongItemWords = (itemCode: string, slotNoun: string) => `${itemCode} is not a ${slotNoun}.`;

/** An item as a computed plan holds it inline: its code (itemId) and the library entry it was resolved from. */
type InlineItem = { itemId: string; libraryId?: string };

/** The item in a slot of a computed step, when the step has that slot. */
export function itemIn(step: PlanStep, slot: ItemSlot): InlineItem | undefined {
  const held: Partial<Record<ItemSlot, InlineItem>> = step;
  return held[slot];
}

/** A step as a budget group's name needs it: its kind and the code of the library item that names it. */
type NamedStep = { kind: string; code?: string };

/**
 * Names a budget group (the engine's BudgetGroup.key: "0", or "1+3" for an item shared by steps 2 and 4), on every
 * screen and in the PDF: "Step 1 · Weigh the solid (BAL-05)", "Shared by steps 2 and 4". A step is named by its
 * balance, flask or pipette, else by its material; a step the list does not hold is "Step n".
 */
export function stepGroupName(key: string, steps: readonly NamedStep[]): string {
  const numbers = key.split('+').map((index) => Number(index) + 1);
  if (numbers.some((number) => !Number.isInteger(number))) return key;
  if (numbers.length > 1)
    return `Shared by steps ${numbers.slice(0, -1).join(', ')} and ${numbers[numbers.length - 1]}`;
  const step = steps[numbers[0] - 1];
  if (!step) return `Step ${numbers[0]}`;
  const label = isStepKind(step.kind) ? STEP_KINDS[step.kind].label : step.kind;
  return `Step ${numbers[0]} · ${label}${step.code ? ` (${step.code})` : ''}`;
}

/** The budget group namer of a computed version: each step named by the library code of the item that names it. */
export function snapshotStepNamer(snapshot: { plan: Plan; items: UsedItem[] }): (key: string) => string {
  const steps = snapshot.plan.steps.map((step) => {
    const slot = STEP_KINDS[step.kind].slot;
    const item = (slot && itemIn(step, slot.name)) ?? itemIn(step, 'material');
    const used = snapshot.items.find((each) => item?.libraryId !== undefined && each.libraryId === item.libraryId);
    return { kind: step.kind, code: used?.code ?? item?.itemId };
  });
  return (key) => stepGroupName(key, steps);
}
