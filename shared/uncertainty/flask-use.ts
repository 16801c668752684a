import { PlanError } from './plan-error';
import type { PlanStep } from './plan-schema';

/**
 * The latest earlier step that made up a solution in the same flask, or undefined.
 * `flaskIds` holds, for each step, the identity of the flask it makes up to volume in (undefined for any other
 * step): the plan's itemId, or the planner's library id, so the planner and the engine ask the same question.
 *
 * @example
 * earlierMakeUpInSameFlask([undefined, 'F1', undefined, 'F1'], 3) // 1
 */
export function earlierMakeUpInSameFlask(
  flaskIds: readonly (string | undefined)[],
  stepIndex: number,
): number | undefined {
  const flask = flaskIds[stepIndex];
  if (flask === undefined || flask === '') return undefined;
  for (let index = stepIndex - 1; index >= 0; index -= 1) if (flaskIds[index] === flask) return index;
  return undefined;
}

/** For each step of a plan, the itemId of the flask it makes up to volume in. */
function planFlaskIds(steps: readonly PlanStep[]): (string | undefined)[] {
  return steps.map((step) => (step.kind === 'makeUpToVolume' ? step.flask.itemId : undefined));
}

/**
 * The aliquot step just before a make-up, when it draws from the solution made at `earlierIndex`
 * (the step after that make-up takes an aliquot of it, and this make-up follows at once).
 */
export function aliquotDrawnFrom(steps: readonly { kind: string }[], earlierIndex: number, stepIndex: number) {
  const aliquotIndex = stepIndex - 1;
  const isAliquot = steps[aliquotIndex]?.kind === 'pipetteAliquot' || steps[aliquotIndex]?.kind === 'weighAliquot';
  return isAliquot && aliquotIndex === earlierIndex + 1 ? aliquotIndex : undefined;
}

/**
 * A flask holds one solution at a time (common practice). Making up to volume in a flask that an earlier step of
 * the plan made a solution in is refused unless the step says that solution was first transferred to a storage
 * bottle (or used up) and the flask rinsed (`flaskEmptiedBefore`); the aliquot of this step is then taken from the
 * bottle. Saying so of a flask no earlier step used is refused too, so the bench sheet never asks for a transfer
 * out of an empty flask.
 * @throws PlanError at the step's flask, naming both steps
 */
export function checkFlaskHoldsNoSolution(steps: readonly PlanStep[], stepIndex: number): void {
  const step = steps[stepIndex];
  if (step.kind !== 'makeUpToVolume') return;
  const earlier = earlierMakeUpInSameFlask(planFlaskIds(steps), stepIndex);
  const flask = step.flask.itemId;
  if (earlier === undefined) {
    if (step.flaskEmptiedBefore)
      throw new PlanError(
        ['steps', stepIndex, 'flaskEmptiedBefore'],
        `Step ${stepIndex + 1}: no earlier step makes a solution in flask ${flask}, so there is nothing to transfer out of it; ` +
          'remove the statement that it was emptied first.',
      );
    return;
  }
  if (step.flaskEmptiedBefore) return;
  const aliquot = aliquotDrawnFrom(steps, earlier, stepIndex);
  const drawn = aliquot === undefined ? '' : `, from which step ${aliquot + 1} takes its aliquot`;
  throw new PlanError(
    ['steps', stepIndex, 'flask'],
    `Step ${stepIndex + 1}: flask ${flask} still holds the solution made up in it at step ${earlier + 1}${drawn}. ` +
      `Choose another flask, or state that the solution of step ${earlier + 1} is first transferred to a labelled storage bottle and the flask rinsed.`,
  );
}
