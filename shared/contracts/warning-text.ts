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
    case 'dominantAtomicWeight': {
      const { element, itemId, indexPercent } = warning.params;
      const what =
        itemId === null
          ? `The standard atomic weight of ${element ?? 'the analyte'}`
          : `The certificate's ${element === null ? 'molar mass' : `atomic weight of ${element}`} for ${itemId}`;
      const remedy =
        itemId === null
          ? "the lot's atomic weight or molar mass from its certificate would lower it"
          : 'a certificate with a smaller uncertainty would lower it';
      return `${what} contributes ${Math.round(indexPercent)} % of the variance: ${remedy}; better glassware or a better balance would not.`;
    }
    case 'dominantStep': {
      const { stepKind } = warning.params;
      const label = stepKind ? STEP_KINDS[stepKind].label.toLowerCase() : 'this step';
      const share = `Step ${warning.stepIndex + 1} (${label}) contributes ${Math.round(warning.params.indexPercent)} % of the variance`;
      return warning.params.lowerableByEquipment
        ? `${share}: better equipment here lowers the uncertainty most.`
        : `${share}, mostly from the material (its certificate, purity or atomic weights): better equipment would not lower it; a certificate with a smaller uncertainty, or the lot's atomic weight or molar mass, would.`;
    }
    case 'flaggedItem':
      return `${warning.params.itemCode}: ${warning.params.flags.join('; ')}.`;
    case 'recordedText':
      return warning.params.text;
  }
}
