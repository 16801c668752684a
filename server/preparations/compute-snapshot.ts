import { withPolicy } from '../../shared/contracts/engine-equipment';
import type { LabPolicy } from '../../shared/contracts/library';
import { warningsUnderPolicy } from '../../shared/contracts/warning-policy';
import type { Snapshot, UsedItem } from '../../shared/contracts/snapshot';
import {
  checkGumByMonteCarlo,
  ENGINE_VERSION,
  evaluatePlan,
  parsePlan,
  runMonteCarlo,
  validateAgainstGum,
  type BudgetResult,
  type Plan,
} from '../../shared/uncertainty';

/**
 * Runs the engine on a resolved plan: the GUM budget, then its JCGM 101:2008 §8 validation by the adaptive Monte
 * Carlo run with the given seed (checkGumByMonteCarlo: the same verdict the planner and the CLI reach). `trials`,
 * for integrations and load tests only (POST …/compute), runs that many trials instead and compares once.
 * Throws the engine's PlanError for a plan it cannot compute.
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
  const { monteCarlo, validation } =
    input.trials === undefined
      ? checkGumByMonteCarlo(plan, budget, { seed: input.seed })
      : fixedRun(plan, budget, input.seed, input.trials);
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

function fixedRun(plan: Plan, budget: BudgetResult, seed: number, trials: number) {
  const monteCarlo = runMonteCarlo(plan, { seed, trials });
  return { monteCarlo, validation: validateAgainstGum(budget, monteCarlo) };
}
