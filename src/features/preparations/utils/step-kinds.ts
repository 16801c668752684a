import type { EquipmentKind } from '../../../../shared/contracts/library';
import type { PlanStep } from '../../../../shared/uncertainty';

export type StepKind = PlanStep['kind'];

/** A step's number the analyst types (mass or volume), by its plan field name. */
export type QuantityField = 'netMassG' | 'volumeMl' | 'finalMassG' | 'solventMassG';

/** The equipment slot a step fills from the library (materials come from the plan's material). */
export type EquipmentSlot = 'balance' | 'flask' | 'pipette';

export type StepKindInfo = {
  label: string;
  /** What the step does, in a line, for the step card. */
  hint: string;
  slot: EquipmentSlot | null;
  quantity: { field: QuantityField; label: string; unit: 'g' | 'mL' } | null;
  /** A weighing that may name the container on the pan (for the capacity check). */
  container: boolean;
};

/** Every step the plan format knows, in the words the editor uses. */
export const STEP_KINDS: Record<StepKind, StepKindInfo> = {
  weighSolid: {
    label: 'Weigh the solid',
    hint: 'Weigh the reference material by difference (gross − tare).',
    slot: 'balance',
    quantity: { field: 'netMassG', label: 'Net mass', unit: 'g' },
    container: true,
  },
  startFromCertifiedSolution: {
    label: 'Start from the certified solution',
    hint: 'The certified solution is the starting concentration.',
    slot: null,
    quantity: null,
    container: false,
  },
  makeUpToVolume: {
    label: 'Make up to volume',
    hint: 'Transfer into the flask and fill to the mark.',
    slot: 'flask',
    quantity: null,
    container: false,
  },
  pipetteAliquot: {
    label: 'Pipette an aliquot',
    hint: 'Take an aliquot of the solution with a pipette.',
    slot: 'pipette',
    quantity: { field: 'volumeMl', label: 'Volume', unit: 'mL' },
    container: false,
  },
  weighAliquot: {
    label: 'Weigh an aliquot',
    hint: 'Take an aliquot of the solution by mass.',
    slot: 'balance',
    quantity: { field: 'netMassG', label: 'Aliquot mass', unit: 'g' },
    container: true,
  },
  makeUpToMass: {
    label: 'Make up to mass',
    hint: 'Dilute with solvent to a weighed total mass.',
    slot: 'balance',
    quantity: { field: 'finalMassG', label: 'Final solution mass', unit: 'g' },
    container: true,
  },
  dissolveInSolvent: {
    label: 'Dissolve in solvent',
    hint: 'Dissolve the weighed solid in a weighed mass of solvent (molality).',
    slot: 'balance',
    quantity: { field: 'solventMassG', label: 'Solvent mass', unit: 'g' },
    container: true,
  },
};

/** Steps the analyst may add after the start (the start follows from the material). */
export const ADDABLE_STEP_KINDS: StepKind[] = [
  'makeUpToVolume',
  'pipetteAliquot',
  'weighAliquot',
  'makeUpToMass',
  'dissolveInSolvent',
];

/** Which library kinds fill each slot. */
export const SLOT_KINDS: Record<EquipmentSlot, EquipmentKind[]> = {
  balance: ['balance'],
  flask: ['flask'],
  pipette: ['glass-pipette', 'piston-pipette'],
};

/** The step that starts a plan from a material of this kind. */
export const startKindFor = (materialKind: EquipmentKind): StepKind =>
  materialKind === 'solution-material' ? 'startFromCertifiedSolution' : 'weighSolid';

export const isStartKind = (kind: StepKind) => kind === 'weighSolid' || kind === 'startFromCertifiedSolution';
