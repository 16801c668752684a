import type { AuditQuery } from '../../../../shared/contracts/audit';

/** Query keys of the audit trail, scoped by lab; `auditKeys.lab(labId)` reaches every page of it. */
export const auditKeys = {
  all: ['audit'] as const,
  lab: (labId: number) => [...auditKeys.all, labId] as const,
  page: (labId: number, query: AuditQuery) => [...auditKeys.lab(labId), 'page', query] as const,
};
