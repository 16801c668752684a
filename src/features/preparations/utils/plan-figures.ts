import type { Budget } from '../../../../shared/contracts/snapshot';
import { stepGroupName } from '../../../../shared/contracts/step-kinds';

/** What a preparation consumes and makes, read from its computed plan (inline equipment). */
export type PlanFigures = {
  /** Dilutions: aliquots taken (by pipette or by mass). */
  dilutionSteps: number;
  /** Solid weighed (g) or certified solution taken (mL, or g when weighed). */
  materialUsed: { massG: number } | { volumeMl: number } | null;
  /** Solution made but not carried forward: each flask's volume minus the aliquot taken from it. */
  wasteMl: number;
  /** The same for solutions made up to mass, in g. */
  wasteG: number;
  /** The last flask: the product. */
  productMl: number | null;
};

type Step = Record<string, unknown> & { kind: string };

const numberOf = (value: unknown) => (typeof value === 'number' && Number.isFinite(value) ? value : 0);
const nominalOf = (value: unknown) => numberOf((value as { nominalMl?: unknown } | undefined)?.nominalMl);

/**
 * Walks the steps: a make-up step leaves a solution of its flask's volume (or its weighed mass); the aliquot
 * taken from it next is carried forward and the rest of that solution is waste. The last solution is the product.
 */
export function planFigures(plan: Record<string, unknown>): PlanFigures {
  const steps = (Array.isArray(plan.steps) ? plan.steps : []) as Step[];
  let materialUsed = null as PlanFigures['materialUsed'];
  let wasteMl = 0;
  let wasteG = 0;
  let open = null as { volumeMl: number } | { massG: number } | null;
  let dilutionSteps = 0;
  for (const [index, step] of steps.entries()) {
    if (step.kind === 'weighSolid') materialUsed = { massG: numberOf(step.netMassG) };
    if (step.kind === 'pipetteAliquot' || step.kind === 'weighAliquot') {
      const taken: { volumeMl: number } | { massG: number } =
        step.kind === 'pipetteAliquot' ? { volumeMl: numberOf(step.volumeMl) } : { massG: numberOf(step.netMassG) };
      if (index > 0 && steps[index - 1].kind === 'startFromCertifiedSolution') materialUsed = taken;
      else dilutionSteps += 1;
      if (open && 'volumeMl' in open) wasteMl += open.volumeMl - ('volumeMl' in taken ? taken.volumeMl : 0);
      if (open && 'massG' in open) wasteG += open.massG - ('massG' in taken ? taken.massG : 0);
      open = null;
    }
    if (step.kind === 'makeUpToVolume') open = { volumeMl: nominalOf(step.flask) };
    if (step.kind === 'makeUpToMass') open = { massG: numberOf(step.finalMassG) };
  }
  return { dilutionSteps, materialUsed, wasteMl, wasteG, productMl: open && 'volumeMl' in open ? open.volumeMl : null };
}

/** The step with the largest share of the variance. */
export function dominantStep(budget: Budget) {
  return [...budget.byStep].sort((a, b) => b.indexPercent - a.indexPercent)[0] ?? null;
}

/** Budget group keys in reading order: steps by number, then the groups shared by several steps ("1+3"). */
const byStepOrder = (a: string, b: string) => {
  const [first, second] = [a, b].map((key) => key.split('+').map(Number));
  if (first.length !== second.length) return first.length - second.length;
  const differing = first.findIndex((number, index) => number !== second[index]);
  return differing < 0 ? 0 : first[differing] - second[differing];
};

/**
 * The compare chart's bars: for each budget group (a step, or the sources shared by several steps, such as one
 * pipette used in steps 2 and 4, which must not be left out) each preparation's share of the relative variance
 * (uᵢ(y)/y)² in %², so a preparation's bars add up to its (u_c(y)/y)² (JCGM 100:2008 5.1.2: variances add, standard
 * uncertainties do not). One entry per group, named as the record names it, with a value per preparation key.
 */
export function relativeVarianceByStep(
  preparations: { key: string; budget: Budget }[],
): Record<string, string | number>[] {
  const keys = [...new Set(preparations.flatMap(({ budget }) => budget.byStep.map((group) => group.key)))];
  return keys.sort(byStepOrder).map((groupKey) => {
    const entry: Record<string, string | number> = { step: stepGroupName(groupKey, []) };
    for (const { key, budget } of preparations) {
      const group = budget.byStep.find((each) => each.key === groupKey);
      if (group) entry[key] = ((100 * group.contribution) / budget.value) ** 2;
    }
    return entry;
  });
}

/**
 * One sentence answering "does one more dilution step lower the total uncertainty?" for two variants:
 * compares their relative expanded uncertainties (at two significant digits) and their number of dilutions.
 */
export function dilutionComparison(
  first: { title: string; dilutionSteps: number; relativeU: number },
  second: { title: string; dilutionSteps: number; relativeU: number },
): string {
  const percent = (value: number) => `${(value * 100).toPrecision(2)} %`;
  const [fewer, more] = first.dilutionSteps <= second.dilutionSteps ? [first, second] : [second, first];
  const sameU = percent(fewer.relativeU) === percent(more.relativeU);
  const extra = more.dilutionSteps - fewer.dilutionSteps;
  if (extra === 0) {
    return `“${first.title}” and “${second.title}” both use ${first.dilutionSteps} dilution ${first.dilutionSteps === 1 ? 'step' : 'steps'}; relative U ${percent(first.relativeU)} against ${percent(second.relativeU)}${sameU ? ': the same' : `: “${first.relativeU < second.relativeU ? first.title : second.title}” is lower`}.`;
  }
  const effect = sameU
    ? 'does not change the total uncertainty'
    : more.relativeU < fewer.relativeU
      ? 'lowers the total uncertainty'
      : 'raises the total uncertainty';
  return `“${more.title}” uses ${extra} more dilution ${extra === 1 ? 'step' : 'steps'} than “${fewer.title}” (${more.dilutionSteps} against ${fewer.dilutionSteps}); relative U ${percent(more.relativeU)} against ${percent(fewer.relativeU)}: the extra ${extra === 1 ? 'step' : 'steps'} ${effect}.`;
}
