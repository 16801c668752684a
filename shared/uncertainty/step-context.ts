import type { AtomicWeightTable } from './atomic-weights';
import type { ModelBuilder } from './model-builder';
import type { PlanPathSegment } from './plan-error';
import type { EngineSettings } from './plan-schema';

/** What every step builder needs: the model being recorded, the plan's settings, and where the step sits. */
export interface StepContext {
  builder: ModelBuilder;
  settings: EngineSettings;
  atomicWeights: AtomicWeightTable;
  stepIndex: number;
  path: PlanPathSegment[];
}

/** 'Balance B-01', 'Flask F-100-A (100 mL)': how an item is named in budget rows. */
export function itemLabel(kind: string, itemId: string, detail?: string): string {
  return detail === undefined ? `${kind} ${itemId}` : `${kind} ${itemId} (${detail})`;
}
