import type { DeliveryLogEntry } from '../../shared/contracts/members';
import type { OutboxRepository } from './outbox-repository';

/** A lab's mail delivery log: to, subject and time of the mail about this lab, never bodies or links. */
export function deliveryLogService(deps: { outbox: OutboxRepository }) {
  return {
    async entries(labId: number): Promise<DeliveryLogEntry[]> {
      const rows = await deps.outbox.deliveryLog(labId);
      return rows.map((row) => ({ id: row.id, to: row.to_address, subject: row.subject, createdAt: row.created_at }));
    },
  };
}
export type DeliveryLogService = ReturnType<typeof deliveryLogService>;
