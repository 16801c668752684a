import type { Role } from '../../shared/contracts/roles';
import type { Db } from '../db/connection';
import { insertedId } from '../db/inserted-id';

export interface MemberRow {
  user_id: number;
  email: string;
  name: string;
  active: number | boolean;
  role: Role;
  created_at: string;
}

export function labsRepository(db: Db) {
  return {
    findById: (id: number): Promise<{ id: number; name: string; slug: string } | undefined> =>
      db('labs').where({ id }).first(),
    async insert(lab: { name: string; slug: string; createdAt: string }, trx: Db = db): Promise<number> {
      const [row] = await trx('labs')
        .insert({ name: lab.name, slug: lab.slug, created_at: lab.createdAt })
        .returning('id');
      return insertedId(row);
    },
    rolesOf: async (userId: number, labId: number): Promise<Role[]> =>
      (await db('memberships').where({ user_id: userId, lab_id: labId }).select('role')).map(
        (row: { role: Role }) => row.role,
      ),
    members: (labId: number): Promise<MemberRow[]> =>
      db('memberships as m')
        .join('users as u', 'u.id', 'm.user_id')
        .where('m.lab_id', labId)
        .orderBy(['u.name', 'm.role'])
        .select('u.id as user_id', 'u.email', 'u.name', 'u.active', 'm.role', 'm.created_at'),
    async addRole(userId: number, labId: number, role: Role, createdAt: string, trx: Db = db): Promise<void> {
      await trx('memberships')
        .insert({ user_id: userId, lab_id: labId, role, created_at: createdAt })
        .onConflict(['user_id', 'lab_id', 'role'])
        .ignore();
    },
    async setRoles(userId: number, labId: number, roles: Role[], createdAt: string, trx: Db): Promise<void> {
      await trx('memberships').where({ user_id: userId, lab_id: labId }).whereNotIn('role', roles).delete();
      for (const role of roles) {
        await trx('memberships')
          .insert({ user_id: userId, lab_id: labId, role, created_at: createdAt })
          .onConflict(['user_id', 'lab_id', 'role'])
          .ignore();
      }
    },
    removeMember: async (userId: number, labId: number, trx: Db): Promise<number> =>
      Number(await trx('memberships').where({ user_id: userId, lab_id: labId }).delete()),
    countActiveAdmins: async (labId: number, trx: Db = db): Promise<number> =>
      Number(
        (
          await trx('memberships as m')
            .join('users as u', 'u.id', 'm.user_id')
            .where({ 'm.lab_id': labId, 'm.role': 'admin', 'u.active': true })
            .countDistinct({ n: 'u.id' })
            .first()
        )?.n ?? 0,
      ),
  };
}
export type LabsRepository = ReturnType<typeof labsRepository>;
