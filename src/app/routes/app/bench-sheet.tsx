import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { paths } from '../../../config/paths';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { activeEquipmentQueryOptions, useActiveEquipment } from '../../../lib/api/lab-equipment';
import { preparationQueryOptions, usePreparation } from '../../../lib/api/preparation';
import { BenchSheet } from '../../../features/preparations/components/bench-sheet';
import { ReadingsForm } from '../../../features/preparations/components/readings-form';
import { activeMembership } from '../../../lib/authorization';
import { idFromParam } from '../../../lib/route-params';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    const id = idFromParam(params.preparationId);
    if (me?.activeLabId && id) {
      await Promise.all([
        // The sheet prints what the server holds now, not a copy cached before the last autosave.
        queryClient.fetchQuery({ ...preparationQueryOptions(me.activeLabId, id), staleTime: 0 }),
        queryClient.ensureQueryData(activeEquipmentQueryOptions(me.activeLabId)),
      ]);
    }
    return null;
  };

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  const id = idFromParam(useParams().preparationId);
  if (!membership || !id) {
    return (
      <Alert tone="info" title="No such preparation">
        Open a preparation from the list first.
      </Alert>
    );
  }
  return <BenchSheetPage labId={membership.id} preparationId={id} />;
}

function BenchSheetPage({ labId, preparationId }: { labId: number; preparationId: number }) {
  const detail = usePreparation(labId, preparationId);
  const library = useActiveEquipment(labId);
  const version = detail.current;
  const recordsReadings = version.allowedActions.recordReadings;
  return (
    <>
      <title>{`Bench sheet · ${detail.title} · Dilutrace`}</title>
      <p className="mb-3 flex flex-wrap justify-between gap-4 print:hidden">
        <Link to={paths.app.preparation.href(detail.id)}>← Back to the workspace</Link>
        {recordsReadings ? (
          <a href="#record-readings-heading">
            {version.readings ? 'Correct the readings' : 'Record the readings'} after preparing ↓
          </a>
        ) : null}
      </p>
      <BenchSheet detail={detail} library={library} />
      {recordsReadings ? (
        <ReadingsForm labId={labId} detail={detail} recordHref={paths.app.record.href(detail.id, version.number)} />
      ) : null}
    </>
  );
}
