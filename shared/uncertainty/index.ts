// Public entry point of the uncertainty engine, shared by the server and the client (and its Web Worker).
export { ENGINE_VERSION } from './engine-version';
export { PlanError, type PlanPathSegment } from './plan-error';
export { stepSchema, type Plan, type PlanInput } from './plan-schema';
export type {
  Balance,
  VolumetricFlask,
  GlassPipette,
  PistonPipette,
  SolidMaterial,
  CertifiedSolution,
} from './equipment-schema';
export { parsePlan } from './parse-plan';
export { compilePlan } from './plan-compiler';
export { earlierMakeUpInSameFlask } from './flask-use';
export { evaluatePlan } from './evaluate-plan';
export type { EngineWarning } from './engine-warning';
export { propagate, type BudgetResult, type BudgetRow, type BudgetGroup } from './gum-budget';
export type { CompiledModel, SourceCategory } from './model-types';
export { formatDegreesOfFreedom } from './effective-degrees';
export { roundToUncertainty } from './result-rounding';
export { resultStatement, type StatedResult } from './result-statement';
export { concentrationUnitNames } from './units';
export { runMonteCarlo, type MonteCarloResult } from './monte-carlo';
export { checkGumByMonteCarlo, validateAgainstGum, type GumValidation } from './validation';
export { RandomGenerator } from './random-generator';
export { findRoutes, type RouteRequest, type RouteResult } from './route-finder';
export { planJsonSchema } from './plan-json-schema';
