import { parentPort } from 'node:worker_threads';
import { PlanError } from '../../shared/uncertainty';
import { computeSnapshot } from '../preparations/compute-snapshot';

type Job = { id: number; input: Parameters<typeof computeSnapshot>[0] };

/** Runs the engine for the request thread: GUM, Monte Carlo and validation of one resolved plan. */
parentPort?.on('message', ({ id, input }: Job) => {
  try {
    parentPort?.postMessage({ id, snapshot: computeSnapshot(input) });
  } catch (error) {
    const planError = error instanceof PlanError ? { path: error.path } : null;
    parentPort?.postMessage({ id, error: { message: (error as Error).message, planError } });
  }
});
