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

export function outboxRepository(db: Db) {
  return {
    insert: (row: Omit<OutboxRow, 'id'>) => db('outbox').insert(row),
    listForLab: (labId: number): Promise<OutboxRow[]> => db('outbox').where({ lab_id: labId }).orderBy('id', 'desc').limit(200),
    all: (): Promise<OutboxRow[]> => db('outbox').orderBy('id', 'desc'),
  };
}
