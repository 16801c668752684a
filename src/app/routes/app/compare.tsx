import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { preparationQueryOptions, usePreparationList } from '../../../lib/api/preparation';
import { CompareView } from '../../../features/preparations/components/compare-view';
import { activeMembership } from '../../../lib/authorization';

/** The ids in `?ids=1,2,3`: whole positive numbers, each once, at most four. */
function idsFrom(search: URLSearchParams): number[] {
  const ids = (search.get('ids') ?? '')
    .split(',')
    .map(Number)
    .filter((id) => Number.isInteger(id) && id > 0);
  return [...new Set(ids)].slice(0, 4);
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    const ids = idsFrom(new URL(request.url).searchParams);
    // Fresh copies: a variant may have been saved a moment ago.
    if (me?.activeLabId)
      await Promise.all(
        ids.map((id) =>
          queryClient.fetchQuery({ ...preparationQueryOptions(me.activeLabId as number, id), staleTime: 0 }),
        ),
      );
    return null;
  };

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  const [searchParams] = useSearchParams();
  const ids = idsFrom(searchParams);
  return (
    <>
      <title>Compare · Dilutrace</title>
      <PageHeader
        title="Compare preparations"
        description="Stored results side by side: value, uncertainty, where it comes from, what each route uses and throws away."
      />
      {!membership || ids.length < 2 ? (
        <Alert tone="info" title="Choose two to four preparations">
          Tick them on the <a href={paths.app.preparations.href()}>preparations list</a>, or duplicate a preparation
          into a variant and compare it with the original.
        </Alert>
      ) : (
        <ComparePage labId={membership.id} ids={ids} />
      )}
    </>
  );
}

function ComparePage({ labId, ids }: { labId: number; ids: number[] }) {
  const preparations = usePreparationList(labId, ids);
  return <CompareView preparations={preparations} hrefOf={(id) => paths.app.preparation.href(id)} />;
}
