import { minimumWeightText } from './balance-reading';
import { itemLabel } from '../uncertainty/step-context';
import { STEP_KINDS } from './step-kinds';
import type { Warning } from './warnings';

/**
 * The English words of a warning: the one place they are made, for the planner, the record page, the PDF,
 * the route finder and the CLI alike. A warning stored as a sentence (`recordedText`) is its own words.
 */
export function warningText(warning: Warning): string {
  switch (warning.code) {
    case 'belowMinimumWeight': {
      const { balanceItemId, netMassG, minimumWeightG } = warning.params;
      return `Step ${warning.stepIndex + 1}: ${netMassG} g is below the minimum weight of ${itemLabel('Balance', balanceItemId)} (${minimumWeightText(minimumWeightG)} by USP <41>: 2·s/m ≤ 0.10 %, s ≥ 0.41·d).`;
    }
    case 'infiniteMonteCarloVariance': {
      const step = `Step ${warning.stepIndex + 1}: `;
      // Per-use sources are labelled "Step n: …" already; the warning says the step once.
      const sourceLabels = warning.params.sourceLabels.map((label) =>
        label.startsWith(step) ? label.slice(step.length) : label,
      );
      return `${step}${sourceLabels.join('; ')} ${sourceLabels.length === 1 ? 'rests' : 'rest'} on 3 or fewer readings (2 or fewer degrees of freedom), so Monte Carlo draws ${sourceLabels.length === 1 ? 'it' : 'them'} from a Student t whose variance is infinite: the Monte Carlo standard deviation means nothing. Its coverage interval and the GUM result stand; more readings remove this.`;
    }
    case 'assumedWaterDensity': {
      const { materialItemId, materialName, certifiedUnit, densityGPerMl, standardUncertaintyGPerMl } = warning.params;
      const uncertainty =
        standardUncertaintyGPerMl > 0 ? ` with a standard uncertainty of ${standardUncertaintyGPerMl} g/mL` : '';
      return `Step ${warning.stepIndex + 1}: ${materialName} (${materialItemId}) is certified in ${certifiedUnit} and its density is not known, so water's density (${densityGPerMl.toFixed(4)} g/mL) was used${uncertainty}. Enter the density from its certificate, or add its matrix to the lab's density table.`;
    }
    case 'dominantStep': {
      const { stepKind } = warning.params;
      const label = stepKind ? STEP_KINDS[stepKind].label.toLowerCase() : 'this step';
      return `Step ${warning.stepIndex + 1} (${label}) contributes ${Math.round(warning.params.indexPercent)} % of the variance: better equipment here lowers the uncertainty most.`;
    }
    case 'flaggedItem':
      return `${warning.params.itemCode}: ${warning.params.flags.join('; ')}.`;
    case 'recordedText':
      return warning.params.text;
  }
}
