import { startMonteCarlo } from '../../../../shared/uncertainty';
import type { MonteCarloReply, MonteCarloRequest } from './monte-carlo-messages';

/** Trials per chunk (a few milliseconds each on a laptop core). */
const CHUNK_TRIALS = 65_536;
/** At most this often a progress message, so the page repaints its bar without being flooded. */
const PROGRESS_INTERVAL_MS = 100;

const scope = self as unknown as DedicatedWorkerGlobalScope;
const reply = (message: MonteCarloReply) => scope.postMessage(message);

// Runs one JCGM 101:2008 Monte Carlo calculation off the main thread; the page cancels by terminating the worker.
scope.onmessage = (event: MessageEvent<MonteCarloRequest>) => {
  const { runId, plan, seed, trials } = event.data;
  try {
    const run = startMonteCarlo(plan, { seed, trials });
    let reportedAt = 0;
    for (;;) {
      const progress = run.advance(CHUNK_TRIALS);
      if (progress.finished) break;
      if (performance.now() - reportedAt >= PROGRESS_INTERVAL_MS) {
        reportedAt = performance.now();
        reply({ type: 'progress', runId, trialsDone: progress.trialsDone, trialsPlanned: progress.trialsPlanned });
      }
    }
    reply({ type: 'done', runId, result: run.result() });
  } catch (error) {
    reply({ type: 'failed', runId, message: error instanceof Error ? error.message : 'The Monte Carlo run failed.' });
  }
};
