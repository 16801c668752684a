import type { Role } from '../../shared/contracts/roles';
import type { Db } from '../db/connection';
import { insertedId } from '../db/inserted-id';

export interface InvitationRow {
  id: number;
  lab_id: number;
  email: string;
  name: string;
  role: Role;
  token_hash: string;
  invited_by: number;
  invited_by_name?: string;
  created_at: string;
  expires_at: string;
  accepted_at: string | null;
  accepted_user_id: number | null;
}

export function invitationsRepository(db: Db) {
  return {
    async insert(row: Omit<InvitationRow, 'id' | 'accepted_at' | 'accepted_user_id' | 'invited_by_name'>): Promise<number> {
      const [inserted] = await db('invitations').insert(row).returning('id');
      return insertedId(inserted);
    },
    findByTokenHash: (tokenHash: string): Promise<InvitationRow | undefined> => db('invitations').where({ token_hash: tokenHash }).first(),
    findById: (id: number): Promise<InvitationRow | undefined> =>
      db('invitations as i').join('users as u', 'u.id', 'i.invited_by').where('i.id', id).select('i.*', 'u.name as invited_by_name').first(),
    listForLab: (labId: number): Promise<InvitationRow[]> =>
      db('invitations as i')
        .join('users as u', 'u.id', 'i.invited_by')
        .where('i.lab_id', labId)
        .orderBy('i.id', 'desc')
        .select('i.*', 'u.name as invited_by_name'),
    markAccepted: (id: number, userId: number, at: string, trx: Db = db) =>
      trx('invitations').where({ id }).whereNull('accepted_at').update({ accepted_at: at, accepted_user_id: userId }),
  };
}
