import type { PreparationListFilter, PreparationStatus } from '../../shared/contracts/preparations';
import type { Review } from '../../shared/contracts/reviews';
import { statesAllowing, VERSION_TRANSITIONS, type WithdrawnStatus } from '../../shared/domain/version-lifecycle';
import type { Db } from '../db/connection';
import { insertedId } from '../db/inserted-id';
import type { ApprovedAsColumns } from '../reviews/approved-record';

export interface PreparationRow {
  id: number;
  lab_id: number;
  title: string;
  analyte: string;
  material_code: string | null;
  created_by: number;
  created_by_name: string;
  created_at: string;
  updated_at: string;
}

export interface VersionRow extends ApprovedAsColumns {
  id: number;
  preparation_id: number;
  number: number;
  status: PreparationStatus;
  plan_json: string;
  overrides_json: string;
  seed: number;
  problem_json: string | null;
  snapshot_json: string | null;
  snapshot_sha256: string | null;
  /** SHA-256 over the snapshot hash and the frozen fields, set when the version is approved. */
  record_sha256: string | null;
  readings_json: string | null;
  result_statement: string | null;
  value: number | null;
  unit: string | null;
  relative_expanded_uncertainty: number | null;
  created_by: number;
  created_by_name: string;
  created_at: string;
  updated_at: string;
}

export interface ReviewRow {
  id: number;
  version_id: number;
  action: Review['action'];
  actor_user_id: number;
  actor_name: string;
  at: string;
  comment: string;
  snapshot_sha256: string | null;
  record_sha256: string | null;
}

export type VersionWrite = Pick<
  VersionRow,
  | 'plan_json'
  | 'overrides_json'
  | 'seed'
  | 'problem_json'
  | 'snapshot_json'
  | 'snapshot_sha256'
  | 'result_statement'
  | 'value'
  | 'unit'
  | 'relative_expanded_uncertainty'
  | 'updated_at'
>;

export function preparationsRepository(db: Db) {
  const versions = (trx: Db = db) =>
    trx('preparation_versions as v')
      .join('users as u', 'u.id', 'v.created_by')
      .select('v.*', 'u.name as created_by_name');

  return {
    list(labId: number, filter: PreparationListFilter): Promise<(PreparationRow & { latest_version_id: number })[]> {
      const latest = db('preparation_versions')
        .select('preparation_id')
        .max({ latest_number: 'number' })
        .groupBy('preparation_id')
        .as('l');
      const query = db('preparations as p')
        .join('users as u', 'u.id', 'p.created_by')
        .join(latest, 'l.preparation_id', 'p.id')
        .join('preparation_versions as v', (j) => j.on('v.preparation_id', 'p.id').andOn('v.number', 'l.latest_number'))
        .where('p.lab_id', labId)
        .select('p.*', 'u.name as created_by_name', 'v.id as latest_version_id')
        .orderBy('p.updated_at', 'desc')
        .limit(500);
      if (filter.status) query.andWhere('v.status', filter.status);
      if (filter.analyst) query.andWhere('p.created_by', filter.analyst);
      if (filter.material) query.andWhereRaw('lower(p.material_code) = lower(?)', [filter.material]);
      if (filter.from) query.andWhere('p.updated_at', '>=', `${filter.from}T00:00:00.000Z`);
      if (filter.to) query.andWhere('p.updated_at', '<=', `${filter.to}T23:59:59.999Z`);
      if (filter.q) query.andWhereILike('p.title', `%${filter.q}%`); // case-blind on SQLite and PostgreSQL alike
      return query;
    },
    find: (labId: number, id: number, trx: Db = db): Promise<PreparationRow | undefined> =>
      trx('preparations as p')
        .join('users as u', 'u.id', 'p.created_by')
        .where({ 'p.id': id, 'p.lab_id': labId })
        .select('p.*', 'u.name as created_by_name')
        .first(),
    versionsOf: (preparationId: number, trx: Db = db): Promise<VersionRow[]> =>
      versions(trx).where('v.preparation_id', preparationId).orderBy('v.number', 'desc'),
    versionsByIds: (ids: number[]): Promise<VersionRow[]> =>
      ids.length ? versions().whereIn('v.id', ids) : Promise.resolve([]),
    version: (preparationId: number, number: number, trx: Db = db): Promise<VersionRow | undefined> =>
      versions(trx).where({ 'v.preparation_id': preparationId, 'v.number': number }).first(),
    async insertPreparation(
      row: {
        labId: number;
        title: string;
        analyte: string;
        materialCode: string | null;
        createdBy: number;
        at: string;
      },
      trx: Db,
    ): Promise<number> {
      const [inserted] = await trx('preparations')
        .insert({
          lab_id: row.labId,
          title: row.title,
          analyte: row.analyte,
          material_code: row.materialCode,
          created_by: row.createdBy,
          created_at: row.at,
          updated_at: row.at,
        })
        .returning('id');
      return insertedId(inserted);
    },
    touchPreparation: (
      id: number,
      row: { title: string; analyte: string; materialCode: string | null; at: string },
      trx: Db,
    ) =>
      trx('preparations')
        .where({ id })
        .update({ title: row.title, analyte: row.analyte, material_code: row.materialCode, updated_at: row.at }),
    async insertVersion(
      preparationId: number,
      number: number,
      row: VersionWrite & { created_by: number; created_at: string },
      trx: Db,
    ): Promise<number> {
      const [inserted] = await trx('preparation_versions')
        .insert({ preparation_id: preparationId, number, status: 'draft', ...row })
        .returning('id');
      return insertedId(inserted);
    },
    /** Only a draft (or a returned version) changes in place; the WHERE makes that hold even if two requests race. */
    updateDraft: (versionId: number, row: VersionWrite, trx: Db) =>
      trx('preparation_versions').where({ id: versionId }).whereIn('status', statesAllowing('edit')).update(row),
    /** Stores the actual readings and their recomputed result; only before the version is submitted. */
    recordReadings: (versionId: number, row: VersionWrite & { readings_json: string }, trx: Db) =>
      trx('preparation_versions')
        .where({ id: versionId })
        .whereIn('status', statesAllowing('recordReadings'))
        .update({ ...row, status: VERSION_TRANSITIONS.recordReadings.to }),
    /**
     * Moves a version through a transition of the lifecycle table from the state it was read in;
     * returns 0 when it was not in `from` any more or the table does not allow the transition from there.
     */
    transition: (versionId: number, from: PreparationStatus, transition: 'submit' | 'return', trx: Db) =>
      trx('preparation_versions')
        .where({ id: versionId, status: from })
        .whereIn('status', statesAllowing(transition))
        .update({ status: VERSION_TRANSITIONS[transition].to }),
    /** Takes a submitted version back to `to`; 0 when it was not submitted any more (QA decided first). */
    withdraw: (versionId: number, to: WithdrawnStatus, trx: Db) =>
      trx('preparation_versions')
        .where({ id: versionId })
        .whereIn('status', statesAllowing('withdraw'))
        .update({ status: to }),
    /** Approves a submitted version and freezes what it shows, in one update; 0 when it was not submitted any more. */
    approve: (versionId: number, frozen: ApprovedAsColumns & { record_sha256: string }, trx: Db) =>
      trx('preparation_versions')
        .where({ id: versionId })
        .whereIn('status', statesAllowing('approve'))
        .update({ status: VERSION_TRANSITIONS.approve.to, ...frozen }),
    reviewsOf: (versionId: number, trx: Db = db): Promise<ReviewRow[]> =>
      trx('version_reviews as r')
        .join('users as u', 'u.id', 'r.actor_user_id')
        .where('r.version_id', versionId)
        .orderBy('r.id')
        .select('r.*', 'u.name as actor_name'),
    insertReview: (
      row: Omit<ReviewRow, 'id' | 'actor_name' | 'record_sha256'> & { record_sha256?: string | null },
      trx: Db,
    ) => trx('version_reviews').insert(row),
  };
}
export type PreparationsRepository = ReturnType<typeof preparationsRepository>;
