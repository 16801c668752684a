import { Router } from 'express';
import type { DeliveryLogEntry } from '../../shared/contracts/members';
import type { Authorize } from '../auth/authorize';
import type { Db } from '../db/connection';
import { outboxRepository } from './outbox-repository';

/**
 * A lab's mail delivery log for its administrators (GET /api/labs/:labId/delivery-log): to, subject
 * and time of the mail about this lab. Bodies, links and tokens stay with the instance operator.
 */
export function deliveryLogRouter(deps: { db: Db; authorize: Authorize }) {
  const outbox = outboxRepository(deps.db);
  const router = Router({ mergeParams: true });
  router.get('/delivery-log', deps.authorize.lab(['admin']), async (req, res) => {
    const rows = await outbox.deliveryLog((req.lab as { id: number }).id);
    const entries: DeliveryLogEntry[] = rows.map((row) => ({ id: row.id, to: row.to_address, subject: row.subject, createdAt: row.created_at }));
    res.json(entries);
  });
  return router;
}
