import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { ROLE_LABELS } from '../../../../shared/contracts/roles';
import { NotPermitted } from '../../../components/errors/not-permitted';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { auditCsvUrl, auditEventsQueryOptions, useAuditEvents } from '../../../features/audit/api/get-audit-events';
import { AuditFilters } from '../../../features/audit/components/audit-filters';
import { AuditPager } from '../../../features/audit/components/audit-pager';
import { AuditTable } from '../../../features/audit/components/audit-table';
import { AUDIT_PAGE_SIZE, auditQueryFromSearch, auditSearchOf } from '../../../features/audit/utils/audit-search';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { activeMembership, activeRoles, can } from '../../../lib/authorization';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (me?.activeLabId && can(activeRoles(me), 'readAuditTrail')) {
      await queryClient.fetchQuery(
        auditEventsQueryOptions(me.activeLabId, auditQueryFromSearch(new URL(request.url).searchParams)),
      );
    }
    return null;
  };

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  if (!membership || !can(membership.roles, 'readAuditTrail')) {
    return (
      <>
        <title>Audit trail · Dilutrace</title>
        <NotPermitted
          title="Audit trail"
          neededRole={`${ROLE_LABELS.auditor}, ${ROLE_LABELS.qa} or ${ROLE_LABELS.admin}`}
        />
      </>
    );
  }
  return <AuditTrailPage labId={membership.id} />;
}

function AuditTrailPage({ labId }: { labId: number }) {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const query = auditQueryFromSearch(searchParams);
  const page = useAuditEvents(labId, query);
  const filterKey = JSON.stringify(auditSearchOf({ ...query, offset: 0 }));
  return (
    <>
      <title>Audit trail · Dilutrace</title>
      <PageHeader
        title="Audit trail"
        description="Every action in the lab: who did it, when (in UTC), and what it changed. Events are never edited or removed."
        actions={
          <a
            href={auditCsvUrl(labId, query)}
            download
            className="rounded-md border border-line-strong bg-surface px-4 py-2 font-semibold whitespace-nowrap text-ink no-underline hover:bg-paper"
          >
            Export CSV
          </a>
        }
      />
      <AuditFilters
        key={filterKey}
        query={query}
        onApply={(next) => navigate(paths.app.audit.href(auditSearchOf(next)))}
        onClear={() => navigate(paths.app.audit.href())}
      />
      <AuditTable events={page.events} caption="Audit events, newest first" />
      <AuditPager
        offset={query.offset}
        pageSize={AUDIT_PAGE_SIZE}
        shown={page.events.length}
        total={page.total}
        hrefAt={(offset) => paths.app.audit.href(auditSearchOf({ ...query, offset }))}
      />
    </>
  );
}
