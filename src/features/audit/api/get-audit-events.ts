import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { auditPageSchema, auditQuerySchema, type AuditPage, type AuditQuery } from '../../../../shared/contracts/audit';
import { api } from '../../../lib/api-client';
import { auditKeys } from './audit-keys';

/** The query string of the audit filters, without the ones left empty. */
export function auditQueryString(query: Partial<AuditQuery>): string {
  const search = new URLSearchParams();
  for (const [name, value] of Object.entries(query))
    if (value !== undefined && value !== '') search.set(name, String(value));
  return search.toString();
}

/** One page of the lab's audit trail, newest first, with the number of events the filters match. */
export function getAuditEvents(labId: number, query: AuditQuery): Promise<AuditPage> {
  return api.get(`/api/labs/${labId}/audit-events?${auditQueryString(query)}`, auditPageSchema);
}

export const auditEventsQueryOptions = (labId: number, query: AuditQuery) =>
  queryOptions({
    queryKey: auditKeys.page(labId, query),
    queryFn: () => getAuditEvents(labId, query),
  });

export function useAuditEvents(labId: number, query: AuditQuery): AuditPage {
  return useSuspenseQuery(auditEventsQueryOptions(labId, query)).data;
}

/** The CSV download of every event the filters match (no paging). */
export function auditCsvUrl(labId: number, query: AuditQuery): string {
  const { limit: _limit, offset: _offset, ...filters } = query;
  const search = auditQueryString(filters);
  return `/api/labs/${labId}/audit-events.csv${search ? `?${search}` : ''}`;
}

/** The filter of one preparation's own history (every version): the latest 25 events. */
export const preparationHistoryQuery = (preparationId: number): AuditQuery =>
  auditQuerySchema.parse({ entityType: 'preparation', entityId: String(preparationId), limit: 25 });
