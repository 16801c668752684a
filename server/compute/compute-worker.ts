import type { Snapshot } from '../../shared/contracts/snapshot';
import { findRoutes, PlanError, type RouteRequest, type RouteResult } from '../../shared/uncertainty';
import { computeSnapshot } from '../preparations/compute-snapshot';

/** What a worker thread is asked to do: a stored budget's snapshot, or a route search. */
export type ComputeJob =
  { kind: 'snapshot'; input: Parameters<typeof computeSnapshot>[0] } | { kind: 'routes'; request: RouteRequest };

/** A PlanError does not survive the trip between threads as a class, so it travels as data. */
export type ComputeReply =
  { snapshot: Snapshot } | { routes: RouteResult } | { planError: { path: PlanError['path']; message: string } };

/** Runs one job in a worker thread of the compute pool (piscina calls the default export). */
export default function runComputeJob(job: ComputeJob): ComputeReply {
  try {
    return job.kind === 'snapshot' ? { snapshot: computeSnapshot(job.input) } : { routes: findRoutes(job.request) };
  } catch (error) {
    if (error instanceof PlanError) return { planError: { path: error.path, message: error.message } };
    throw error;
  }
}
