import { Router } from 'express';
import type { OutboxMessage } from '../../shared/contracts/members';
import type { Authorize } from '../auth/authorize';
import type { Db } from '../db/connection';
import { outboxRepository } from './outbox-repository';

/** The captured mail of one lab, for its administrators (GET /api/labs/:labId/outbox). */
export function outboxRouter(deps: { db: Db; authorize: Authorize }) {
  const outbox = outboxRepository(deps.db);
  const router = Router({ mergeParams: true });
  router.get('/outbox', deps.authorize.lab(['admin']), async (req, res) => {
    const rows = await outbox.listForLab((req.lab as { id: number }).id);
    const messages: OutboxMessage[] = rows.map((row) => ({
      id: row.id,
      to: row.to_address,
      from: row.from_address,
      subject: row.subject,
      text: row.text_body,
      html: row.html_body,
      createdAt: row.created_at,
    }));
    res.json(messages);
  });
  return router;
}
