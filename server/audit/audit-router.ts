import { Router } from 'express';
import { auditQuerySchema } from '../../shared/contracts/audit';
import type { Authorize, LabContext } from '../auth/authorize';
import type { Db } from '../db/connection';
import { toSafeCsv } from '../lib/csv-cells';
import { valid, validate } from '../lib/validate';
import { auditQuery } from './audit-query';

/** The audit trail for auditors, QA and the lab's administrator: filtered pages and a CSV export. */
export function auditRouter(deps: { db: Db; authorize: Authorize }) {
  const trail = auditQuery(deps.db);
  const router = Router({ mergeParams: true });
  const readers = deps.authorize.lab(['auditor', 'qa', 'admin']);

  router.get('/audit-events', readers, validate({ query: auditQuerySchema }), async (req, res) => {
    const { query } = valid(req, { query: auditQuerySchema });
    res.json(await trail.page((req.lab as LabContext).id, query));
  });

  router.get('/audit-events.csv', readers, validate({ query: auditQuerySchema }), async (req, res) => {
    const { query } = valid(req, { query: auditQuerySchema });
    const events = await trail.all((req.lab as LabContext).id, query);
    const csv = toSafeCsv([
      ['id', 'time_utc', 'actor', 'action', 'entity_type', 'entity_id', 'summary', 'before', 'after'],
      ...events.map((e) => [e.id, e.at, e.actor ?? '', e.action, e.entityType, e.entityId ?? '', e.summary, e.before == null ? '' : JSON.stringify(e.before), e.after == null ? '' : JSON.stringify(e.after)]),
    ]);
    res.attachment(`dilutrace-audit-${new Date().toISOString().slice(0, 10)}.csv`).type('text/csv').send(csv);
  });

  return router;
}
