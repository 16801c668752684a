import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import type { routeFinderRequestSchema } from '../../../../shared/contracts/preparations';
import { engineWarningSchema } from '../../../../shared/contracts/warnings';
import { api } from '../../../lib/api-client';

export type RouteFinderRequest = z.output<typeof routeFinderRequestSchema>;

/** The engine's Route (shared/uncertainty route-finder.ts) as JSON; its plan is checked again by the server when a route is planned. */
const routeSchema = z.object({
  plan: z.record(z.string(), z.unknown()),
  value: z.number(),
  unit: z.string(),
  relativeExpandedUncertainty: z.number(),
  dilutionSteps: z.number().int(),
  materialUsed: z.union([z.object({ massG: z.number() }), z.object({ volumeMl: z.number() })]),
  solutionVolumeMl: z.number(),
  description: z.string(),
  warnings: z.array(engineWarningSchema),
});
const routeResultSchema = z.object({
  routes: z.array(routeSchema),
  feasibleCandidates: z.number().int(),
  /** Set when the search reached its budget; searchNote is then the sentence to show. */
  stoppedEarly: z.boolean(),
  searchNote: z.string().nullable(),
  skipped: z.array(z.string()),
});
export type FoundRoute = z.infer<typeof routeSchema>;
export type RouteFinderResult = z.infer<typeof routeResultSchema>;

export function findRoutes(labId: number, request: RouteFinderRequest): Promise<RouteFinderResult> {
  return api.post(`/api/labs/${labId}/route-finder`, request, routeResultSchema);
}

/** Asks the server's route finder (the engine over the lab's current library and policy). */
export function useFindRoutes(labId: number) {
  return useMutation({ mutationFn: (request: RouteFinderRequest) => findRoutes(labId, request) });
}
