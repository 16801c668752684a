import type { EquipmentKind } from '../../../../shared/contracts/library';
import { STEP_KINDS, type StepKind } from '../../../../shared/contracts/step-kinds';

const ALL_KINDS = Object.keys(STEP_KINDS) as StepKind[];

/** A step that takes the plan's material: the plan's first step. */
export const isStartKind = (kind: StepKind) => STEP_KINDS[kind].materialKinds !== null;

/** Steps the analyst may add after the start (the start follows from the material). */
export const ADDABLE_STEP_KINDS: StepKind[] = ALL_KINDS.filter((kind) => !isStartKind(kind));

/** The step that starts a plan from a material of this kind. */
export const startKindFor = (materialKind: EquipmentKind): StepKind =>
  ALL_KINDS.find((kind) => STEP_KINDS[kind].materialKinds?.includes(materialKind)) ?? 'weighSolid';
