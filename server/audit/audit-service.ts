import type { AuditEvent, AuditPage, AuditQuery } from '../../shared/contracts/audit';
import { writeSafeCsv } from '../lib/csv-cells';
import type { AuditFilters, AuditTrailRepository } from './audit-trail-repository';

const CSV_HEADER = ['id', 'time_utc', 'actor', 'action', 'entity_type', 'entity_id', 'summary', 'before', 'after'];

const csvRow = (e: AuditEvent): unknown[] => [
  e.id,
  e.at,
  e.actor ?? '',
  e.action,
  e.entityType,
  e.entityId ?? '',
  e.summary,
  e.before == null ? '' : JSON.stringify(e.before),
  e.after == null ? '' : JSON.stringify(e.after),
];

/** Reading a lab's audit trail: the filtered pages of the audit screen and the full CSV export. */
export function auditService(deps: { trail: AuditTrailRepository; now: () => Date }) {
  const { trail, now } = deps;
  return {
    page: (labId: number, query: AuditQuery): Promise<AuditPage> => trail.page(labId, query),

    /** The export's file name, dated by the app's clock. */
    csvFileName: (): string => `dilutrace-audit-${now().toISOString().slice(0, 10)}.csv`,

    /** Streams every matching event (no cap), newest first, as CSV into `out`. */
    async writeCsv(labId: number, filters: AuditFilters, out: NodeJS.WritableStream): Promise<void> {
      async function* rows() {
        yield CSV_HEADER;
        for await (const event of trail.events(labId, filters)) yield csvRow(event);
      }
      await writeSafeCsv(rows(), out);
    },
  };
}
export type AuditService = ReturnType<typeof auditService>;
