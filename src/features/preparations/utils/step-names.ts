import type { EquipmentItem } from '../../../../shared/contracts/library';
import type { DraftStep } from './plan-draft';
import { STEP_KINDS } from './step-kinds';

/**
 * Names a budget group (BudgetGroup.key: "0", or "1+3" for an item shared by steps 2 and 4):
 * "Step 1 · Weigh the solid (BAL-05)", "Shared by steps 2, 4".
 */
export function stepNamer(steps: DraftStep[], materialId: string, library: Map<string, EquipmentItem>) {
  return (key: string): string => {
    const indices = key.split('+').map(Number);
    if (indices.length > 1) return `Shared by steps ${indices.map((index) => index + 1).join(', ')}`;
    const step = steps[indices[0]];
    if (!step) return `Step ${indices[0] + 1}`;
    const code = library.get(step.equipmentId)?.code ?? (indices[0] === 0 ? library.get(materialId)?.code : undefined);
    return `Step ${indices[0] + 1} · ${STEP_KINDS[step.kind].label}${code ? ` (${code})` : ''}`;
  };
}
