import type { Db } from '../db/connection';

export interface OutboxRow {
  id: number;
  lab_id: number | null;
  message_id: string | null;
  from_address: string;
  to_address: string;
  subject: string;
  text_body: string;
  html_body: string | null;
  created_at: string;
}

export type DeliveryLogRow = Pick<OutboxRow, 'id' | 'to_address' | 'subject' | 'created_at'>;

/**
 * The captured mail. Messages are filed by recipient; a lab id is kept only on mail about that lab
 * (invitations, review notices), for the lab's delivery log, which never reads the bodies.
 */
export function outboxRepository(db: Db) {
  return {
    insert: (row: Omit<OutboxRow, 'id'>) => db('outbox').insert(row),
    deliveryLog: (labId: number): Promise<DeliveryLogRow[]> =>
      db('outbox')
        .where({ lab_id: labId })
        .orderBy('id', 'desc')
        .limit(200)
        .select('id', 'to_address', 'subject', 'created_at'),
    /** Bodies included: for the instance operator only. */
    captured: (to?: string): Promise<OutboxRow[]> => {
      const query = db('outbox').orderBy('id', 'desc').limit(200);
      // The operator's own filter: a `_` in an address matching any one character is harmless here.
      return to ? query.whereILike('to_address', `%${to}%`) : query;
    },
  };
}
export type OutboxRepository = ReturnType<typeof outboxRepository>;
