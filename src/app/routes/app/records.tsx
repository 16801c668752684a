import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { approvedRecordsQueryOptions, useApprovedRecords } from '../../../features/records/api/get-approved-records';
import { ApprovedRecordsTable } from '../../../features/records/components/approved-records-table';
import { RecordsSearch } from '../../../features/records/components/records-search';
import { activeMembership } from '../../../lib/authorization';

const searchFrom = (params: URLSearchParams) => (params.get('q') ?? '').trim().slice(0, 200);

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (me?.activeLabId && me.labs.some((lab) => lab.id === me.activeLabId)) {
      await queryClient.fetchQuery(
        approvedRecordsQueryOptions(me.activeLabId, searchFrom(new URL(request.url).searchParams)),
      );
    }
    return null;
  };

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  if (!membership) {
    return (
      <>
        <title>Approved records · Dilutrace</title>
        <PageHeader title="Approved records" />
        <Alert tone="info" title="No lab yet">
          Records belong to a lab. A lab administrator can invite you by e-mail.
        </Alert>
      </>
    );
  }
  return <ApprovedRecordsPage labId={membership.id} />;
}

function ApprovedRecordsPage({ labId }: { labId: number }) {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const search = searchFrom(searchParams);
  const records = useApprovedRecords(labId, search);
  return (
    <>
      <title>Approved records · Dilutrace</title>
      <PageHeader
        title="Approved records"
        description="Every approved preparation version of the lab, signed and unchangeable. Open one to read its budget and review trail and to verify its fingerprint; download the signed PDF or the stored snapshot."
      />
      <RecordsSearch key={search} initial={search} onSearch={(next) => navigate(paths.app.records.href(next))} />
      <ApprovedRecordsTable labId={labId} records={records} search={search} />
    </>
  );
}
