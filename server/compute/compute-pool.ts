import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { PlanError } from '../../shared/uncertainty';
import type { computeSnapshot, Snapshot } from '../preparations/compute-snapshot';

export type ComputeInput = Parameters<typeof computeSnapshot>[0];

/** Computes snapshots away from the request thread, so one heavy Monte Carlo never stalls other users. */
export interface Computer {
  run(input: ComputeInput): Promise<Snapshot>;
  close(): Promise<void>;
}

interface Pending {
  resolve: (snapshot: Snapshot) => void;
  reject: (error: Error) => void;
}

type Reply = { id: number; snapshot?: Snapshot; error?: { message: string; planError: { path: (string | number)[] } | null } };

/**
 * A fixed pool of worker threads, started on first use. Jobs queue when every worker is busy;
 * a worker that dies fails its job and is replaced.
 */
export function createComputePool(size = Math.max(1, Math.min(2, availableParallelism() - 1))): Computer {
  const entry = new URL('./compute-worker.ts', import.meta.url).href;
  const bootstrap = new URL('./worker-bootstrap.mjs', import.meta.url);
  const idle: Worker[] = [];
  const busy = new Map<Worker, { id: number } & Pending>();
  const queue: ({ id: number; input: ComputeInput } & Pending)[] = [];
  let started = 0;
  let nextId = 1;
  let closed = false;

  const settle = (worker: Worker, reply: Reply) => {
    const job = busy.get(worker);
    busy.delete(worker);
    if (job && reply.id === job.id) {
      if (reply.snapshot) job.resolve(reply.snapshot);
      else if (reply.error?.planError) job.reject(new PlanError(reply.error.planError.path, reply.error.message));
      else job.reject(new Error(reply.error?.message ?? 'The computation failed.'));
    }
    idle.push(worker);
    pump();
  };

  const spawn = () => {
    const worker = new Worker(bootstrap, { workerData: { entry } });
    started += 1;
    worker.on('message', (reply: Reply) => settle(worker, reply));
    worker.on('error', (error) => {
      const job = busy.get(worker);
      busy.delete(worker);
      job?.reject(error);
    });
    worker.on('exit', () => {
      started -= 1;
      const at = idle.indexOf(worker);
      if (at >= 0) idle.splice(at, 1);
      const job = busy.get(worker);
      busy.delete(worker);
      job?.reject(new Error('The computation stopped unexpectedly.'));
      if (!closed) pump();
    });
    idle.push(worker);
  };

  function pump() {
    while (queue.length > 0) {
      if (idle.length === 0 && started < size) spawn();
      const worker = idle.pop();
      if (!worker) return;
      const job = queue.shift()!;
      busy.set(worker, job);
      worker.postMessage({ id: job.id, input: job.input });
    }
  }

  return {
    run(input) {
      if (closed) return Promise.reject(new Error('The compute pool is closed.'));
      return new Promise<Snapshot>((resolve, reject) => {
        queue.push({ id: nextId++, input, resolve, reject });
        pump();
      });
    },
    async close() {
      closed = true;
      await Promise.all([...idle, ...busy.keys()].map((worker) => worker.terminate()));
    },
  };
}
