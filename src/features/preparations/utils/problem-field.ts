import type { PlanProblem } from '../../../../shared/contracts/preparations';
import { STEP_KINDS } from '../../../../shared/contracts/step-kinds';

const ENTRIES = Object.values(STEP_KINDS);
/** The step fields the editor shows as its equipment choice, and as its mass or volume. */
const EQUIPMENT_FIELDS = new Set<unknown>(ENTRIES.map((entry) => entry.slot?.name));
const QUANTITY_FIELDS = new Set<unknown>(ENTRIES.map((entry) => entry.quantity?.field));

/**
 * Where a problem is shown in the editor:
 * 'title' | 'material' | 'materialOverride' | 'analyte' | 'outputUnit' | 'labTemperatureC' | 'plan' |
 * `step-${i}-equipment` | `step-${i}-override` | `step-${i}-quantity` | `step-${i}-container` |
 * `step-${i}-source-${j}` | `step-${i}`.
 */
export function problemField(problem: PlanProblem): string {
  const [first, second, third, fourth] = problem.path;
  if (first === 'title') return 'title';
  if (first === 'material') return second === 'override' ? 'materialOverride' : 'material';
  if (first === 'analyte') return 'analyte';
  if (first === 'settings')
    return second === 'outputUnit' ? 'outputUnit' : second === 'labTemperatureC' ? 'labTemperatureC' : 'plan';
  if (first === 'steps' && typeof second === 'number') {
    if (third === 'material') return 'material';
    if (third !== undefined && EQUIPMENT_FIELDS.has(third))
      return fourth === 'override' ? `step-${second}-override` : `step-${second}-equipment`;
    if (third !== undefined && QUANTITY_FIELDS.has(third)) return `step-${second}-quantity`;
    if (third === 'containerMassG') return `step-${second}-container`;
    if (third === 'extraSources' && typeof fourth === 'number') return `step-${second}-source-${fourth}`;
    return `step-${second}`;
  }
  return 'plan';
}
