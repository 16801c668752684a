import type { Db } from '../db/connection';

export interface PolicyRow {
  policy_json: string;
  updated_at: string;
  updated_by_name: string | null;
}

/** Each lab's stored budget policy (one row per lab, replaced on every change). */
export function policyRepository(db: Db) {
  return {
    find: (labId: number): Promise<PolicyRow | undefined> =>
      db('lab_policies as p')
        .leftJoin('users as u', 'u.id', 'p.updated_by')
        .where('p.lab_id', labId)
        .select('p.policy_json', 'p.updated_at', 'u.name as updated_by_name')
        .first(),
    async save(
      row: { labId: number; policyJson: string; updatedAt: string; updatedBy: number },
      trx: Db = db,
    ): Promise<void> {
      await trx('lab_policies')
        .insert({
          lab_id: row.labId,
          policy_json: row.policyJson,
          updated_at: row.updatedAt,
          updated_by: row.updatedBy,
        })
        .onConflict('lab_id')
        .merge();
    },
  };
}
export type PolicyRepository = ReturnType<typeof policyRepository>;
