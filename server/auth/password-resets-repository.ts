import type { Db } from '../db/connection';

export interface PasswordResetRow {
  id: number;
  user_id: number;
  token_hash: string;
  created_at: string;
  expires_at: string;
  used_at: string | null;
}

export function passwordResetsRepository(db: Db) {
  return {
    insert: (row: Omit<PasswordResetRow, 'id' | 'used_at'>) => db('password_resets').insert(row),
    findByTokenHash: (tokenHash: string): Promise<PasswordResetRow | undefined> =>
      db('password_resets').where({ token_hash: tokenHash }).first(),
    /** Marks the link used if it is still unused and unexpired at `at`; 1 when this call consumed it, 0 otherwise. */
    consume: async (id: number, at: string, trx: Db = db): Promise<number> =>
      Number(
        await trx('password_resets')
          .where({ id })
          .whereNull('used_at')
          .where('expires_at', '>', at)
          .update({ used_at: at }),
      ),
  };
}
export type PasswordResetsRepository = ReturnType<typeof passwordResetsRepository>;
