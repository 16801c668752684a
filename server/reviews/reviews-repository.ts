import type { Db } from '../db/connection';
import type { VersionRow } from '../preparations/preparations-repository';

export type SubmittedRow = VersionRow & { title: string; submitted_at: string; submitted_by: string; comment: string };

export interface ApprovedRecordRow {
  preparation_id: number;
  title: string;
  analyte: string;
  number: number;
  analyst: string;
  approved_by: string;
  approved_at: string;
  result_statement: string | null;
  snapshot_sha256: string;
}

/** Reads across versions and their reviews: what waits for QA, and the approved records. */
export function reviewsRepository(db: Db) {
  return {
    /** Each submission of a version still submitted, oldest first (a resubmitted version appears once per submission). */
    submissions: (labId: number): Promise<SubmittedRow[]> =>
      db('preparation_versions as v')
        .join('preparations as p', 'p.id', 'v.preparation_id')
        .join('version_reviews as r', (j) => j.on('r.version_id', 'v.id').andOnVal('r.action', '=', 'submitted'))
        .join('users as u', 'u.id', 'r.actor_user_id')
        .where({ 'p.lab_id': labId, 'v.status': 'submitted' })
        .select('v.*', 'p.title', 'r.at as submitted_at', 'u.name as submitted_by', 'r.comment')
        .orderBy('r.at', 'asc'),

    /** Approved versions, newest first (at most 500); title and analyte are the frozen ones where the version has them. */
    approved(labId: number, q?: string): Promise<ApprovedRecordRow[]> {
      const title = db.raw('coalesce(v.approved_title, p.title)');
      const analyte = db.raw('coalesce(v.approved_analyte, p.analyte)');
      const query = db('preparation_versions as v')
        .join('preparations as p', 'p.id', 'v.preparation_id')
        .join('users as a', 'a.id', 'p.created_by')
        .join('version_reviews as r', (j) => j.on('r.version_id', 'v.id').andOnVal('r.action', '=', 'approved'))
        .join('users as u', 'u.id', 'r.actor_user_id')
        .where({ 'p.lab_id': labId, 'v.status': 'approved' })
        .select(
          'p.id as preparation_id',
          { title },
          { analyte },
          'v.number',
          'a.name as analyst',
          'u.name as approved_by',
          'r.at as approved_at',
          'v.result_statement',
          'v.snapshot_sha256',
        )
        .orderBy('r.at', 'desc')
        .limit(500);
      // lower() … like lower(?) and whereILike are case-blind on SQLite and PostgreSQL alike.
      if (q) {
        const pattern = `%${q}%`;
        query.andWhere((w) =>
          w
            .whereRaw('lower(coalesce(v.approved_title, p.title)) like lower(?)', [pattern])
            .orWhereRaw('lower(coalesce(v.approved_analyte, p.analyte)) like lower(?)', [pattern])
            .orWhereILike('a.name', pattern)
            .orWhereILike('p.material_code', pattern),
        );
      }
      return query;
    },
  };
}
export type ReviewsRepository = ReturnType<typeof reviewsRepository>;
