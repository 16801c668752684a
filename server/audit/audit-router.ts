import { Router } from 'express';
import { auditQuerySchema } from '../../shared/contracts/audit';
import type { Authorize, LabContext } from '../auth/authorize';
import { valid, validate } from '../lib/validate';
import type { AuditService } from './audit-service';

/** The audit trail for auditors, QA and the lab's administrator: filtered pages and a CSV export. */
export function auditRouter(deps: { audit: AuditService; authorize: Authorize }) {
  const { audit } = deps;
  const router = Router({ mergeParams: true });
  const readers = deps.authorize.lab('readAuditTrail');

  router.get('/audit-events', readers, validate({ query: auditQuerySchema }), async (req, res) => {
    const { query } = valid(req, { query: auditQuerySchema });
    res.json(await audit.page((req.lab as LabContext).id, query));
  });

  router.get('/audit-events.csv', readers, validate({ query: auditQuerySchema }), async (req, res) => {
    const { query } = valid(req, { query: auditQuerySchema });
    const { limit: _limit, offset: _offset, ...filters } = query;
    res.attachment(audit.csvFileName()).type('text/csv');
    await audit.writeCsv((req.lab as LabContext).id, filters, res);
  });

  return router;
}
