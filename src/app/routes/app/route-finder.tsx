import type { QueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { useNavigate } from 'react-router';
import type { EquipmentKind } from '../../../../shared/contracts/library';
import { ROLE_LABELS } from '../../../../shared/contracts/roles';
import { NotPermitted } from '../../../components/errors/not-permitted';
import { Alert } from '../../../components/ui/alert';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { useCreatePreparation } from '../../../features/preparations/api/create-preparation';
import {
  useFindRoutes,
  type FoundRoute,
  type RouteFinderRequest,
} from '../../../features/route-finder/api/find-routes';
import { RouteFinderForm } from '../../../features/route-finder/components/route-finder-form';
import { RoutesTable } from '../../../features/route-finder/components/routes-table';
import { activeEquipmentQueryOptions, useActiveEquipment } from '../../../lib/api/lab-equipment';
import { activeMembership, can } from '../../../lib/authorization';

const MATERIAL_KINDS: readonly EquipmentKind[] = ['solid-material', 'solution-material'];

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me?.activeLabId) await queryClient.ensureQueryData(activeEquipmentQueryOptions(me.activeLabId));
  return null;
};

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  if (!membership || !can(membership.roles, 'findRoutes')) {
    return (
      <>
        <title>Route finder · Dilutrace</title>
        <NotPermitted title="Route finder" neededRole={`${ROLE_LABELS.analyst} or ${ROLE_LABELS.qa}`} />
      </>
    );
  }
  return <RouteFinderPage labId={membership.id} planner={can(membership.roles, 'planPreparations')} />;
}

function RouteFinderPage({ labId, planner }: { labId: number; planner: boolean }) {
  const library = useActiveEquipment(labId);
  // The lab's active reference materials, solids first, then certified solutions (read from the planner's cache entry).
  const materials = useMemo(
    () => MATERIAL_KINDS.flatMap((kind) => library.filter((item) => item.kind === kind)),
    [library],
  );
  const find = useFindRoutes(labId);
  const create = useCreatePreparation(labId);
  const navigate = useNavigate();
  const [request, setRequest] = useState<RouteFinderRequest | null>(null);
  const [planningRank, setPlanningRank] = useState<number | null>(null);

  const plan = (route: FoundRoute, rank: number) => {
    if (!request) return;
    setPlanningRank(rank);
    create.mutate(
      {
        title:
          `${request.analyte} ${request.target.value} ${request.target.unit}, route ${rank}: ${route.description}`.slice(
            0,
            200,
          ),
        plan: route.plan,
      },
      {
        onSuccess: (detail) => navigate(paths.app.preparation.href(detail.id)),
        onSettled: () => setPlanningRank(null),
      },
    );
  };

  return (
    <>
      <title>Route finder · Dilutrace</title>
      <PageHeader
        title="Route finder"
        description="Give the target and the material: Dilutrace tries the routes of up to three dilutions with the lab’s current balances, flasks and pipettes and ranks them by relative expanded uncertainty. A very large search stops early and says so."
      />
      <div className="mb-8 rounded-lg border border-line bg-surface p-5">
        <RouteFinderForm
          materials={materials}
          pending={find.isPending}
          onSubmit={(next) => {
            setRequest(next);
            find.mutate(next);
          }}
        />
      </div>
      {find.error ? <Alert tone="danger">{find.error.message}</Alert> : null}
      {create.error ? <Alert tone="danger">{create.error.message}</Alert> : null}
      {find.data ? (
        <section aria-labelledby="routes-heading">
          <h2 id="routes-heading" className="mb-2 text-xl font-bold">
            {find.data.routes.length === 0
              ? 'No route reaches this target'
              : `The ${find.data.routes.length} best routes`}
          </h2>
          <p className="mb-3 text-sm text-muted">
            {find.data.feasibleCandidates.toLocaleString('en-GB')} routes met every constraint (minimum weight,
            capacity, volumes on hand).
            {planner ? ' “Plan this route” makes it a draft preparation and opens it.' : ''}
          </p>
          {find.data.searchNote ? (
            <div className="mb-3">
              <Alert tone="info" title="Search stopped early">
                {find.data.searchNote}
              </Alert>
            </div>
          ) : null}
          {find.data.routes.length > 0 ? (
            <RoutesTable routes={find.data.routes} onPlan={planner ? plan : null} planningRank={planningRank} />
          ) : null}
          {find.data.skipped.length > 0 ? (
            <p className="mt-3 text-sm text-muted">Left out (overdue or expired): {find.data.skipped.join('; ')}.</p>
          ) : null}
        </section>
      ) : null}
    </>
  );
}
