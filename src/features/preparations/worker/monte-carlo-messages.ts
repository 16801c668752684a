import type { MonteCarloResult, PlanInput } from '../../../../shared/uncertainty';

/** What the page asks the Monte Carlo worker. */
export type MonteCarloRequest = { type: 'start'; runId: number; plan: PlanInput; seed: number; trials: number };

/** What the worker answers: progress after each chunk, then the result or the engine's message. */
export type MonteCarloReply =
  | { type: 'progress'; runId: number; trialsDone: number; trialsPlanned: number }
  | { type: 'done'; runId: number; result: MonteCarloResult }
  | { type: 'failed'; runId: number; message: string };
