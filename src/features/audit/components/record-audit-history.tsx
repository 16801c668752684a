import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { preparationHistoryQuery, useAuditEvents } from '../api/get-audit-events';
import { AuditTable } from './audit-table';

/** The audit events of one preparation (every version), newest first, for auditors, QA and the administrator. */
export function RecordAuditHistory({ labId, preparationId }: { labId: number; preparationId: number }) {
  const query = preparationHistoryQuery(preparationId);
  const page = useAuditEvents(labId, query);
  return (
    <section aria-labelledby="record-audit-heading">
      <h2 id="record-audit-heading" className="mb-3 text-xl font-bold">
        Audit history of this preparation
      </h2>
      <AuditTable events={page.events} caption="Audit events of this preparation, newest first" />
      <p className="mt-2 text-sm text-muted">
        {page.total > page.events.length
          ? `The latest ${page.events.length} of ${page.total} events. `
          : `${page.total} ${page.total === 1 ? 'event' : 'events'}. `}
        <Link to={paths.app.audit.href({ entityType: query.entityType, entityId: query.entityId })}>
          Open in the audit trail
        </Link>
      </p>
    </section>
  );
}
