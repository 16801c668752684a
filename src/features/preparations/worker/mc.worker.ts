import { checkGumByMonteCarlo, evaluatePlan } from '../../../../shared/uncertainty';
import type { MonteCarloReply, MonteCarloRequest } from './monte-carlo-messages';

/** At most this often a progress message, so the page repaints its bar without being flooded. */
const PROGRESS_INTERVAL_MS = 100;

const scope = self as unknown as DedicatedWorkerGlobalScope;
const reply = (message: MonteCarloReply) => scope.postMessage(message);

// Takes the JCGM 101:2008 §8 verdict off the main thread with the same function as the stored record
// (checkGumByMonteCarlo), so the same plan and seed give the same verdict; the page cancels by terminating the worker.
scope.onmessage = (event: MessageEvent<MonteCarloRequest>) => {
  const { runId, plan, seed } = event.data;
  try {
    let reportedAt = 0;
    const { monteCarlo, validation } = checkGumByMonteCarlo(plan, evaluatePlan(plan), {
      seed,
      onProgress: ({ trialsDone, trialsPlanned, batches, finished }) => {
        if (finished || performance.now() - reportedAt < PROGRESS_INTERVAL_MS) return;
        reportedAt = performance.now();
        reply({ type: 'progress', runId, trialsDone, trialsPlanned, ...(batches ? { batches } : {}) });
      },
    });
    reply({ type: 'done', runId, result: monteCarlo, validation });
  } catch (error) {
    reply({ type: 'failed', runId, message: error instanceof Error ? error.message : 'The Monte Carlo run failed.' });
  }
};
