import type { GumValidation, MonteCarloResult, PlanInput } from '../../../../shared/uncertainty';

/** What the page asks the Monte Carlo worker: the verdict run for this plan and seed. */
export type MonteCarloRequest = { type: 'start'; runId: number; plan: PlanInput; seed: number };

/** Progress of the adaptive run: trials so far, and batches done against the fewest it runs and the most it may. */
export type MonteCarloRunProgress = {
  trialsDone: number;
  trialsPlanned: number;
  batches?: { done: number; minimum: number; maximum: number };
};

/** What the worker answers: progress now and then, then the result with its verdict, or the engine's message. */
export type MonteCarloReply =
  | ({ type: 'progress'; runId: number } & MonteCarloRunProgress)
  | { type: 'done'; runId: number; result: MonteCarloResult; validation: GumValidation }
  | { type: 'failed'; runId: number; message: string };
