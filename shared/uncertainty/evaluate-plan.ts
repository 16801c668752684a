import { propagate, type BudgetResult } from './gum-budget';
import { compilePlan, type CompileOptions } from './plan-compiler';
import { parsePlan } from './parse-plan';
import type { Plan, PlanInput } from './plan-schema';

/**
 * The GUM uncertainty budget of a plan: validates it, builds its measurement model and
 * propagates (see propagate for the formulas), with the plan's coverage setting.
 * @throws PlanError for an invalid plan
 */
export function evaluatePlan(input: PlanInput | Plan, options: CompileOptions = {}): BudgetResult {
  const plan = parsePlan(input);
  return propagate(compilePlan(plan, options), plan.settings.coverage);
}
