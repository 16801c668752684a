import { auditQuerySchema, type AuditQuery } from '../../../../shared/contracts/audit';

/** Events per page of the audit trail. */
export const AUDIT_PAGE_SIZE = 50;

const FILTER_NAMES = ['actor', 'action', 'entityType', 'entityId', 'from', 'to'] as const;

/**
 * The audit filters in the page's address, checked with the API's own schema; a filter that does not
 * pass (a mistyped date) is dropped rather than failing the page.
 */
export function auditQueryFromSearch(search: URLSearchParams): AuditQuery {
  const raw: Record<string, string> = {};
  for (const name of [...FILTER_NAMES, 'offset'] as const) {
    const value = search.get(name)?.trim();
    if (value) raw[name] = value;
  }
  const parsed = auditQuerySchema.safeParse({ ...raw, limit: AUDIT_PAGE_SIZE });
  if (parsed.success) return parsed.data;
  const rejected = new Set(parsed.error.issues.map((issue) => String(issue.path[0])));
  const kept = Object.fromEntries(Object.entries(raw).filter(([name]) => !rejected.has(name)));
  const retried = auditQuerySchema.safeParse({ ...kept, limit: AUDIT_PAGE_SIZE });
  return retried.success ? retried.data : auditQuerySchema.parse({ limit: AUDIT_PAGE_SIZE });
}

/** The address parameters of a query: its filters, and the offset when not on the first page. */
export function auditSearchOf(query: Partial<AuditQuery>): Record<string, string | number | undefined> {
  const search: Record<string, string | number | undefined> = {};
  for (const name of FILTER_NAMES) search[name] = query[name] || undefined;
  search.offset = query.offset ? query.offset : undefined;
  return search;
}
