import type { Distribution } from './distributions';
import type { EngineWarning } from './engine-warning';

/** What physical effect a source stands for; budgets are also summed per category. */
export const SOURCE_CATEGORIES = [
  'balanceRepeatability',
  'balanceReadability',
  'balanceLinearity',
  'balanceSensitivity',
  'volumetricTolerance',
  'fillRepeatability',
  'pipetteSystematicError',
  'pipetteRandomError',
  'temperature',
  'purity',
  'certifiedValue',
  'atomicWeight',
  'density',
  'userDefined',
  'calibrationCorrection',
  'airBuoyancy',
] as const;
export type SourceCategory = (typeof SOURCE_CATEGORIES)[number];

/**
 * Categories better equipment can lower: the balance, glassware, pipettes and temperature. The rest come with the
 * material (purity, certified value, atomic weights, density) or the user, and only a better certificate lowers them.
 */
export const EQUIPMENT_CATEGORIES: ReadonlySet<SourceCategory> = new Set<SourceCategory>([
  'balanceRepeatability',
  'balanceReadability',
  'balanceLinearity',
  'balanceSensitivity',
  'volumetricTolerance',
  'fillRepeatability',
  'pipetteSystematicError',
  'pipetteRandomError',
  'temperature',
]);

/**
 * One independent elementary input of the measurement model.
 * `sharing` is 'item' for a systematic effect of a physical item (one source however often the item is used)
 * and 'use' for an effect drawn afresh each time (a reading, a fill).
 */
export interface SourceDefinition {
  /** Stable, serialisable key, e.g. 'item:F-100-A:tolerance' or 'step:2:fill-repeatability'. */
  id: string;
  /** What a chemist reads in the budget, e.g. 'Flask F-100-A (100 mL): tolerance'. */
  label: string;
  category: SourceCategory;
  /** Best estimate of the input quantity, in `unit`. */
  estimate: number;
  unit: string;
  distribution: Distribution;
  standardUncertainty: number;
  degreesOfFreedom: number;
  evaluationType: 'A' | 'B';
  sharing: 'item' | 'use';
  itemId?: string;
  /** Indices of the plan steps that use this source (several for a shared item). */
  stepIndices: number[];
}

/** One operation of the model's evaluation tape; operands are indices of earlier nodes. */
export type TapeNode =
  | { operation: 'source'; sourceIndex: number }
  | { operation: 'constant'; value: number }
  | { operation: 'add' | 'subtract' | 'multiply' | 'divide'; left: number; right: number };

/** A named intermediate result worth showing (a step's concentration). */
export interface Checkpoint {
  stepIndex: number;
  label: string;
  node: number;
  unit: string;
}

/**
 * The measurement model as plain data: a flat list of sources and a tape of arithmetic
 * operations. Safe to post to a Web Worker; evaluated with dual numbers for the GUM budget
 * and column by column over Float64Arrays for Monte Carlo.
 */
export interface CompiledModel {
  modelFormat: 'dilutrace-model/1';
  sources: SourceDefinition[];
  nodes: TapeNode[];
  outputNode: number;
  outputUnit: string;
  /** What the output is, e.g. 'c(Pb)'. */
  measurand: string;
  /** Temperature (°C) the output is stated at, for a quantity per volume; absent for a mass fraction or molality. */
  referenceTemperatureC?: number;
  checkpoints: Checkpoint[];
  warnings: EngineWarning[];
}
