// Public entry point of the uncertainty engine, shared by the server and the client (and its Web Worker).
export { ENGINE_VERSION } from './engine-version';
export { PlanError, type PlanPathSegment } from './plan-error';
export {
  MAXIMUM_PLAN_STEPS,
  MAXIMUM_EXTRA_SOURCES_PER_STEP,
  MAXIMUM_FORMULA_LENGTH,
  MAXIMUM_FORMULA_NESTING,
  MAXIMUM_MONTE_CARLO_TRIALS,
} from './plan-limits';
export {
  planSchema,
  stepSchema,
  settingsSchema,
  coverageSchema,
  type Plan,
  type PlanInput,
  type PlanStep,
} from './plan-schema';
export { distributionSchema, extraSourceSchema } from './distribution-schema';
export {
  balanceSchema,
  volumetricFlaskSchema,
  glassPipetteSchema,
  pistonPipetteSchema,
  solidMaterialSchema,
  certifiedSolutionSchema,
  type Balance,
  type VolumetricFlask,
  type GlassPipette,
  type PistonPipette,
  type SolidMaterial,
  type CertifiedSolution,
} from './equipment-schema';
export { parsePlan } from './parse-plan';
export { compilePlan, type CompileOptions } from './plan-compiler';
export { evaluatePlan } from './evaluate-plan';
export type { EngineWarning } from './engine-warning';
export { propagate, type BudgetResult, type BudgetRow, type BudgetGroup } from './gum-budget';
export type { CompiledModel, SourceDefinition, SourceCategory, TapeNode, Checkpoint } from './model-types';
export { standardUncertainty, degreesOfFreedom, type Distribution } from './distributions';
export { DualNumber } from './dual-number';
export {
  MAXIMUM_COVERAGE_FACTOR,
  coverageFactor,
  studentTQuantile,
  studentTCumulative,
  normalCumulative,
  twoSigmaProbability,
} from './coverage-factor';
export type { CoverageSetting } from './coverage-setting';
export { formatDegreesOfFreedom } from './effective-degrees';
export { roundToUncertainty, formatResultStatement, type RoundedResult } from './result-rounding';
export { parseFormula, molarMass, type Composition, type MolarMass } from './chemical-formula';
export {
  standardAtomicWeights,
  atomicWeightSource,
  parseAtomicWeightTable,
  type AtomicWeight,
  type AtomicWeightTable,
} from './atomic-weights';
export { waterDensityKgPerM3 } from './water-density';
export { minimumWeightG } from './minimum-weight';
export {
  concentrationUnits,
  concentrationUnitNames,
  unitOf,
  type ConcentrationUnit,
  type UnitDimension,
} from './units';
export {
  runMonteCarlo,
  startMonteCarlo,
  type MonteCarloOptions,
  type MonteCarloResult,
  type MonteCarloRun,
  type MonteCarloProgress,
} from './monte-carlo';
export { validateAgainstGum, type GumValidation } from './validation';
export { numericalTolerance, type Interval, type Histogram } from './coverage-interval';
export { RandomGenerator } from './random-generator';
export {
  findRoutes,
  routeRequestSchema,
  ROUTE_SEARCH_BUDGET,
  type RouteRequest,
  type Route,
  type RouteResult,
} from './route-finder';
export { planJsonSchema } from './plan-json-schema';
