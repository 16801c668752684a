import type { PlanProblem } from '../../../../shared/contracts/preparations';

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
    if (third === 'balance' || third === 'flask' || third === 'pipette')
      return fourth === 'override' ? `step-${second}-override` : `step-${second}-equipment`;
    if (third === 'netMassG' || third === 'volumeMl' || third === 'finalMassG' || third === 'solventMassG')
      return `step-${second}-quantity`;
    if (third === 'containerMassG') return `step-${second}-container`;
    if (third === 'extraSources' && typeof fourth === 'number') return `step-${second}-source-${fourth}`;
    return `step-${second}`;
  }
  return 'plan';
}
