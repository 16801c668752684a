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
  revoked_at: string | null;
}

export function invitationsRepository(db: Db) {
  return {
    async insert(
      row: Omit<InvitationRow, 'id' | 'accepted_at' | 'accepted_user_id' | 'revoked_at' | 'invited_by_name'>,
    ): Promise<number> {
      const [inserted] = await db('invitations').insert(row).returning('id');
      return insertedId(inserted);
    },
    findByTokenHash: (tokenHash: string): Promise<InvitationRow | undefined> =>
      db('invitations').where({ token_hash: tokenHash }).first(),
    findById: (id: number): Promise<InvitationRow | undefined> =>
      db('invitations as i')
        .join('users as u', 'u.id', 'i.invited_by')
        .where('i.id', id)
        .select('i.*', 'u.name as invited_by_name')
        .first(),
    listForLab: (labId: number): Promise<InvitationRow[]> =>
      db('invitations as i')
        .join('users as u', 'u.id', 'i.invited_by')
        .where('i.lab_id', labId)
        .orderBy('i.id', 'desc')
        .select('i.*', 'u.name as invited_by_name'),
    /** Claims a pending invitation; the affected-row count (0 or 1) says whether this call won it. */
    claim: async (id: number, at: string, trx: Db): Promise<boolean> =>
      Number(
        await trx('invitations')
          .where({ id })
          .whereNull('accepted_at')
          .whereNull('revoked_at')
          .update({ accepted_at: at }),
      ) === 1,
    setAcceptedUser: (id: number, userId: number, trx: Db) =>
      trx('invitations').where({ id }).update({ accepted_user_id: userId }),
    /** Revokes a pending invitation of this lab; false when it was already accepted or revoked. */
    revoke: async (id: number, labId: number, by: number, at: string): Promise<boolean> =>
      Number(
        await db('invitations')
          .where({ id, lab_id: labId })
          .whereNull('accepted_at')
          .whereNull('revoked_at')
          .update({ revoked_at: at, revoked_by: by }),
      ) === 1,
  };
}
export type InvitationsRepository = ReturnType<typeof invitationsRepository>;
