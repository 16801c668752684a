import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import type { Snapshot } from '../../shared/contracts/snapshot';
import { PlanError, type RouteRequest, type RouteResult } from '../../shared/uncertainty';
import { AppError } from '../lib/errors';
import type { ComputeJob, ComputeReply } from './compute-worker';
import { LabTurns } from './lab-turns';

export type SnapshotInput = Extract<ComputeJob, { kind: 'snapshot' }>['input'];

/** How much compute the server accepts at once, and for how long. */
export interface ComputeLimits {
  /** Worker threads running the engine. */
  threads: number;
  /** Jobs of one lab running or waiting at once; a lab past it is told to retry. */
  jobsPerLab: number;
  /** Jobs waiting for a thread, all labs together; past it the server answers 503. */
  queuedJobs: number;
  /** A job not finished this long after it was accepted (waiting included) is stopped. */
  timeoutMs: number;
}

export const DEFAULT_COMPUTE_LIMITS: ComputeLimits = {
  threads: Math.max(1, Math.min(2, availableParallelism() - 1)),
  jobsPerLab: 4,
  queuedJobs: 32,
  timeoutMs: 30_000,
};

/**
 * Runs the engine away from the request thread, so a heavy Monte Carlo or route search never stalls
 * other users. Every job belongs to a lab, has a time limit, and stops when `signal` aborts (the client
 * went away).
 */
export interface Computer {
  snapshot(labId: number, input: SnapshotInput, signal?: AbortSignal): Promise<Snapshot>;
  routes(labId: number, request: RouteRequest, signal?: AbortSignal): Promise<RouteResult>;
  /** Jobs running or waiting now; jobs stopped because their client went away; jobs stopped by the time limit. */
  stats(): { active: number; cancelled: number; timedOut: number };
  close(): Promise<void>;
}

const busy = (message: string) => new AppError('unavailable', 'compute_busy', message);

/**
 * A bounded pool of worker threads (piscina), started on first use. Each lab has a share of it (jobs
 * running or waiting), and waiting jobs are served in turns by lab.
 */
export function createComputePool(limits: Partial<ComputeLimits> = {}): Computer {
  const { threads, jobsPerLab, queuedJobs, timeoutMs } = { ...DEFAULT_COMPUTE_LIMITS, ...limits };
  const pool = new Piscina<ComputeJob, ComputeReply>({
    filename: new URL('./worker-bootstrap.mjs', import.meta.url).href,
    minThreads: 0,
    maxThreads: threads,
    maxQueue: queuedJobs,
    idleTimeout: 60_000,
  });
  // Jobs wait here, in turns by lab, and reach piscina only when a thread is free (piscina's own line is
  // first come, first served).
  const waiting = new LabTurns<() => void>();
  let running = 0;
  const activeByLab = new Map<number, number>();
  let active = 0;
  let cancelled = 0;
  let timedOut = 0;

  async function run(labId: number, job: ComputeJob, clientSignal?: AbortSignal): Promise<ComputeReply> {
    const ofLab = activeByLab.get(labId) ?? 0;
    if (ofLab >= jobsPerLab) {
      throw busy(
        `Your lab already has ${jobsPerLab} computations running or waiting. Try again when one has finished.`,
      );
    }
    if (active >= threads + queuedJobs)
      throw busy('The server is busy with other computations. Try again in a few seconds.');
    const deadline = AbortSignal.timeout(timeoutMs);
    const signal = clientSignal ? AbortSignal.any([clientSignal, deadline]) : deadline;
    activeByLab.set(labId, ofLab + 1);
    active += 1;
    try {
      await threadFor(labId, signal);
      try {
        return await pool.run(job, { signal });
      } finally {
        running -= 1;
        startWaiting();
      }
    } catch (error) {
      if (deadline.aborted) {
        timedOut += 1;
        throw new AppError(
          'unavailable',
          'compute_timeout',
          `The computation did not finish within ${Math.round(timeoutMs / 1000)} s and was stopped. Try again later, or use fewer Monte Carlo trials.`,
        );
      }
      if (clientSignal?.aborted) {
        cancelled += 1;
        throw new AppError(
          'unavailable',
          'compute_cancelled',
          'The computation was stopped because the request was closed.',
        );
      }
      if ((error as Error).message === 'Task queue is at limit')
        throw busy('The server is busy with other computations. Try again in a few seconds.');
      throw error;
    } finally {
      active -= 1;
      const left = (activeByLab.get(labId) ?? 1) - 1;
      if (left > 0) activeByLab.set(labId, left);
      else activeByLab.delete(labId);
    }
  }

  /** Resolves when a thread is free for this job (counted as running), or rejects if the job is aborted while it waits. */
  function threadFor(labId: number, signal: AbortSignal): Promise<void> {
    if (signal.aborted) return Promise.reject(signal.reason);
    if (running < threads && waiting.size === 0) {
      running += 1;
      waiting.served(labId);
      return Promise.resolve();
    }
    return new Promise((resolve, reject) => {
      const start = () => {
        signal.removeEventListener('abort', stop);
        running += 1;
        resolve();
      };
      const stop = () => {
        waiting.remove(labId, start);
        reject(signal.reason);
      };
      signal.addEventListener('abort', stop, { once: true });
      waiting.push(labId, start);
    });
  }

  function startWaiting() {
    while (running < threads) {
      const start = waiting.shift();
      if (!start) return;
      start();
    }
  }

  const unwrap = <T>(reply: ComputeReply, pick: (reply: ComputeReply) => T | undefined): T => {
    if ('planError' in reply) throw new PlanError(reply.planError.path, reply.planError.message);
    const value = pick(reply);
    if (value === undefined) throw new Error('The compute worker answered a different job.');
    return value;
  };

  return {
    async snapshot(labId, input, signal) {
      return unwrap(await run(labId, { kind: 'snapshot', input }, signal), (reply) =>
        'snapshot' in reply ? reply.snapshot : undefined,
      );
    },
    async routes(labId, request, signal) {
      return unwrap(await run(labId, { kind: 'routes', request }, signal), (reply) =>
        'routes' in reply ? reply.routes : undefined,
      );
    },
    stats: () => ({ active, cancelled, timedOut }),
    async close() {
      await pool.destroy();
    },
  };
}
