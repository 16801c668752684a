import { withPolicy } from '../../shared/contracts/engine-equipment';
import type { LabPolicy } from '../../shared/contracts/library';
import { warningsUnderPolicy } from '../../shared/contracts/warning-policy';
import type { Snapshot, UsedItem } from '../../shared/contracts/snapshot';
import { ENGINE_VERSION, evaluatePlan, parsePlan, runMonteCarlo, validateAgainstGum } from '../../shared/uncertainty';

/** Monte Carlo trials for a stored budget: enough for two significant digits of u in typical chains. */
export const SERVER_TRIALS = 200_000;

/**
 * Runs the engine on a resolved plan: GUM budget, Monte Carlo with the given seed, and the JCGM 101:2008 §8
 * validation of one against the other. Throws the engine's PlanError for a plan it cannot compute.
 */
export function computeSnapshot(input: {
  plan: Record<string, unknown>;
  items: UsedItem[];
  seed: number;
  computedAt: string;
  policy: LabPolicy;
  trials?: number;
}): Snapshot {
  const plan = parsePlan(withPolicy(input.plan, input.policy));
  const budget = evaluatePlan(plan);
  const monteCarlo = runMonteCarlo(plan, { seed: input.seed, trials: input.trials ?? SERVER_TRIALS });
  const validation = validateAgainstGum(budget, monteCarlo);
  return {
    engineVersion: ENGINE_VERSION,
    computedAt: input.computedAt,
    seed: input.seed,
    trials: monteCarlo.trials,
    plan,
    items: input.items,
    budget,
    monteCarlo,
    validation,
    warnings: warningsUnderPolicy(budget.warnings, input.policy),
  };
}
