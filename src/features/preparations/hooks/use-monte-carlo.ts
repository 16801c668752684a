import { useCallback, useEffect, useRef, useState } from 'react';
import type { GumValidation, MonteCarloResult, PlanInput } from '../../../../shared/uncertainty';
import type { MonteCarloReply, MonteCarloRequest, MonteCarloRunProgress } from '../worker/monte-carlo-messages';

/** How long edits must rest before Monte Carlo starts by itself. */
export const AUTO_START_DELAY_MS = 1000;

export type MonteCarloState =
  | { phase: 'idle' }
  | ({ phase: 'running' } & MonteCarloRunProgress)
  | { phase: 'done'; result: MonteCarloResult; validation: GumValidation; planKey: string }
  | { phase: 'cancelled' }
  | { phase: 'failed'; message: string };

/**
 * The Monte Carlo verdict run (checkGumByMonteCarlo, as the stored record takes it) for the live plan in a Web Worker,
 * so typing never waits for it: starts on demand and
 * AUTO_START_DELAY_MS after the plan stops changing; cancelling terminates the worker. A result
 * remembers the plan and seed it was computed for (`planKey`), so the page can tell when it is out of date.
 */
export function useMonteCarlo(plan: PlanInput | null, seed: number, options: { automatic: boolean }) {
  const [state, setState] = useState<MonteCarloState>({ phase: 'idle' });
  const workerRef = useRef<Worker | null>(null);
  const runIdRef = useRef(0);
  const planKey = plan ? `${seed}:${JSON.stringify(plan)}` : '';

  const stopWorker = useCallback(() => {
    workerRef.current?.terminate();
    workerRef.current = null;
  }, []);

  const start = useCallback(() => {
    if (!plan) return;
    stopWorker();
    const runId = (runIdRef.current += 1);
    const key = `${seed}:${JSON.stringify(plan)}`;
    const worker = new Worker(new URL('../worker/mc.worker.ts', import.meta.url), { type: 'module' });
    workerRef.current = worker;
    worker.onmessage = (event: MessageEvent<MonteCarloReply>) => {
      const reply = event.data;
      if (reply.runId !== runIdRef.current) return;
      if (reply.type === 'progress') {
        const { trialsDone, trialsPlanned, batches } = reply;
        setState({ phase: 'running', trialsDone, trialsPlanned, batches });
      } else if (reply.type === 'done') {
        setState({ phase: 'done', result: reply.result, validation: reply.validation, planKey: key });
        stopWorker();
      } else {
        setState({ phase: 'failed', message: reply.message });
        stopWorker();
      }
    };
    worker.onerror = () =>
      setState({ phase: 'failed', message: 'The Monte Carlo worker stopped unexpectedly. Start it again.' });
    setState({ phase: 'running', trialsDone: 0, trialsPlanned: 0 });
    const request: MonteCarloRequest = { type: 'start', runId, plan, seed };
    worker.postMessage(request);
  }, [plan, seed, stopWorker]);

  const cancel = useCallback(() => {
    runIdRef.current += 1;
    stopWorker();
    setState({ phase: 'cancelled' });
  }, [stopWorker]);

  // A changed plan makes a running calculation pointless; start again once edits settle.
  const startRef = useRef(start);
  startRef.current = start;
  useEffect(() => {
    if (!planKey || !options.automatic) return;
    const timer = setTimeout(() => startRef.current(), AUTO_START_DELAY_MS);
    return () => clearTimeout(timer);
  }, [planKey, options.automatic]);

  useEffect(() => stopWorker, [stopWorker]);

  return { state, start, cancel, planKey };
}
