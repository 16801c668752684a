import { formatToReadability } from './format-number';

/** What the analyst does at one step, and which readings the sheet leaves blank for it. */
export type BenchLine = {
  stepNumber: number;
  action: string;
  /** Equipment IDs used in the step. */
  equipment: string[];
  readings: 'weighing' | 'volume' | 'none';
};

type Item = Record<string, unknown>;
const text = (value: unknown) => (typeof value === 'string' ? value : '');
const numberOf = (value: unknown) => (typeof value === 'number' ? value : Number.NaN);

/** A balance's reading to its scale interval: 0.1599 g on a d = 0.00001 g balance reads "0.15990 g". */
const onBalance = (massG: unknown, balance: Item) =>
  `${formatToReadability(numberOf(massG), numberOf(balance.readabilityG))} g`;

/**
 * The steps of a computed plan (inline equipment) as bench instructions: target masses to each balance's
 * readability, volumes as the glassware marks them (a one-mark pipette's nominal volume, a piston pipette's
 * set volume in µL, a flask's mark).
 */
export function benchSheetLines(plan: Record<string, unknown>, labTemperatureC: number): BenchLine[] {
  const steps = (Array.isArray(plan.steps) ? plan.steps : []) as Item[];
  return steps.map((step, index) => {
    const stepNumber = index + 1;
    const balance = (step.balance ?? {}) as Item;
    const material = (step.material ?? {}) as Item;
    switch (step.kind) {
      case 'weighSolid':
        return {
          stepNumber,
          action: `Weigh ${onBalance(step.netMassG, balance)} of ${text(material.name)} (${text(material.itemId)}) by difference on ${text(balance.itemId)}.`,
          equipment: [text(balance.itemId), text(material.itemId)],
          readings: 'weighing',
        };
      case 'startFromCertifiedSolution':
        return {
          stepNumber,
          action: `Take the certified solution ${text(material.name)} (${text(material.itemId)}, ${numberOf(material.certifiedValue)} ${text(material.certifiedUnit)}); let it reach room temperature and shake.`,
          equipment: [text(material.itemId)],
          readings: 'none',
        };
      case 'makeUpToVolume': {
        const flask = (step.flask ?? {}) as Item;
        return {
          stepNumber,
          action: `Transfer quantitatively into flask ${text(flask.itemId)} (${numberOf(flask.nominalMl)} mL, class ${text(flask.toleranceClass)}) and make up to the mark at about ${labTemperatureC} °C; stopper and mix.`,
          equipment: [text(flask.itemId)],
          readings: 'volume',
        };
      }
      case 'pipetteAliquot': {
        const pipette = (step.pipette ?? {}) as Item;
        const action =
          pipette.kind === 'pistonPipette'
            ? `Set piston pipette ${text(pipette.itemId)} to ${Math.round(numberOf(step.volumeMl) * 1000)} µL and deliver the aliquot.`
            : `Pipette ${numberOf(step.volumeMl)} mL with ${text(pipette.itemId)} (one mark, class ${text(pipette.toleranceClass)}) from the solution of step ${index}.`;
        return { stepNumber, action, equipment: [text(pipette.itemId)], readings: 'volume' };
      }
      case 'weighAliquot':
        return {
          stepNumber,
          action: `Weigh ${onBalance(step.netMassG, balance)} of the solution by difference on ${text(balance.itemId)}.`,
          equipment: [text(balance.itemId)],
          readings: 'weighing',
        };
      case 'makeUpToMass':
        return {
          stepNumber,
          action: `Add solvent to a total solution mass of ${onBalance(step.finalMassG, balance)} on ${text(balance.itemId)}; mix.`,
          equipment: [text(balance.itemId)],
          readings: 'weighing',
        };
      case 'dissolveInSolvent':
        return {
          stepNumber,
          action: `Dissolve in ${onBalance(step.solventMassG, balance)} of solvent weighed on ${text(balance.itemId)}.`,
          equipment: [text(balance.itemId)],
          readings: 'weighing',
        };
      default:
        return { stepNumber, action: `Step ${stepNumber}: ${text(step.kind)}.`, equipment: [], readings: 'none' };
    }
  });
}
