import type { Role } from '../../shared/contracts/roles';
import type { Db } from '../db/connection';
import { insertedId } from '../db/inserted-id';

export interface UserRow {
  id: number;
  email: string;
  name: string;
  password_hash: string;
  active: number | boolean;
  operator: number | boolean;
  created_at: string;
}

export interface MembershipRow {
  lab_id: number;
  lab_name: string;
  role: Role;
}

export function usersRepository(db: Db) {
  return {
    findByEmail: (email: string): Promise<UserRow | undefined> =>
      db('users').where({ email: email.toLowerCase() }).first(),
    findById: (id: number): Promise<UserRow | undefined> => db('users').where({ id }).first(),
    async insert(
      user: { email: string; name: string; passwordHash: string; createdAt: string },
      trx: Db = db,
    ): Promise<number> {
      const [row] = await trx('users')
        .insert({
          email: user.email.toLowerCase(),
          name: user.name,
          password_hash: user.passwordHash,
          active: true,
          created_at: user.createdAt,
        })
        .returning('id');
      return insertedId(row);
    },
    setPassword: (id: number, passwordHash: string, trx: Db = db) =>
      trx('users').where({ id }).update({ password_hash: passwordHash }),
    /** Swaps in a rehashed password only if the stored hash is still `old` (a reset meanwhile wins). */
    replacePasswordHash: (id: number, old: string, next: string) =>
      db('users').where({ id, password_hash: old }).update({ password_hash: next }),
    setActive: (id: number, active: boolean, trx: Db = db) => trx('users').where({ id }).update({ active }),
    setOperator: (id: number, operator: boolean, trx: Db = db) => trx('users').where({ id }).update({ operator }),
    isOperator: async (id: number): Promise<boolean> =>
      Boolean((await db('users').where({ id, active: true }).first('operator'))?.operator),
    list: (): Promise<UserRow[]> => db('users').orderBy('email'),
    labNamesByUser: async (): Promise<Map<number, string[]>> => {
      const rows: { user_id: number; name: string }[] = await db('memberships as m')
        .join('labs as l', 'l.id', 'm.lab_id')
        .distinct('m.user_id', 'l.name')
        .orderBy(['m.user_id', 'l.name']);
      const byUser = new Map<number, string[]>();
      for (const row of rows) byUser.set(row.user_id, [...(byUser.get(row.user_id) ?? []), row.name]);
      return byUser;
    },
    count: async (): Promise<number> => Number((await db('users').count({ n: '*' }).first())?.n ?? 0),
    memberships: (userId: number): Promise<MembershipRow[]> =>
      db('memberships as m')
        .join('labs as l', 'l.id', 'm.lab_id')
        .where('m.user_id', userId)
        .orderBy(['l.name', 'm.role'])
        .select('m.lab_id', 'l.name as lab_name', 'm.role'),
  };
}
export type UsersRepository = ReturnType<typeof usersRepository>;
