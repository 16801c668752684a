import type { EquipmentItem } from '../../../../shared/contracts/library';
import { stepGroupName } from '../../../../shared/contracts/step-kinds';
import type { DraftStep } from './plan-draft';

/** The budget group namer of the draft being edited: each step named by its item's library code (the material's for step 1). */
export function stepNamer(steps: DraftStep[], materialId: string, library: Map<string, EquipmentItem>) {
  const named = steps.map((step, index) => ({
    kind: step.kind,
    code: library.get(step.equipmentId)?.code ?? (index === 0 ? library.get(materialId)?.code : undefined),
  }));
  return (key: string): string => stepGroupName(key, named);
}
