import type { EquipmentKind } from '../../shared/contracts/library';
import type { Db } from '../db/connection';
import { insertedId } from '../db/inserted-id';

export interface ItemRow {
  id: number;
  lab_id: number;
  kind: EquipmentKind;
  code: string;
  status: 'active' | 'retired';
  current_revision_id: number;
  created_at: string;
  retired_at: string | null;
  retired_reason: string | null;
}

export interface RevisionRow {
  id: number;
  item_id: number;
  number: number;
  data_json: string;
  reason: string;
  created_at: string;
  created_by_name: string;
}

export interface CertificateRow {
  id: number;
  lab_id: number;
  item_id: number;
  revision_id: number;
  revision_number: number;
  original_name: string;
  stored_name: string;
  media_type: string;
  size_bytes: number;
  sha256: string;
  contains_script: boolean | number;
  uploaded_by_name: string;
  uploaded_at: string;
}

export function libraryRepository(db: Db) {
  const revisions = (trx: Db = db) =>
    trx('equipment_revisions as r')
      .join('users as u', 'u.id', 'r.created_by')
      .select('r.*', 'u.name as created_by_name');

  return {
    items: (
      labId: number,
      filter: { kind?: EquipmentKind; status: 'active' | 'retired' | 'all' },
    ): Promise<(ItemRow & { certificate_count: number })[]> => {
      const query = db('equipment_items as i')
        .where('i.lab_id', labId)
        .select('i.*')
        .select(db.raw('(select count(*) from certificates c where c.item_id = i.id) as certificate_count'))
        .orderBy(['i.kind', 'i.code']);
      if (filter.kind) query.andWhere('i.kind', filter.kind);
      if (filter.status !== 'all') query.andWhere('i.status', filter.status);
      return query;
    },
    item: (labId: number, itemId: number, trx: Db = db): Promise<ItemRow | undefined> =>
      trx('equipment_items').where({ id: itemId, lab_id: labId }).first(),
    itemByCode: (labId: number, code: string, trx: Db = db): Promise<ItemRow | undefined> =>
      trx('equipment_items').where({ lab_id: labId }).whereRaw('lower(code) = lower(?)', [code]).first(),
    revisionsOf: (itemId: number): Promise<RevisionRow[]> =>
      revisions().where('r.item_id', itemId).orderBy('r.number', 'desc'),
    revision: (revisionId: number, trx: Db = db): Promise<RevisionRow | undefined> =>
      revisions(trx).where('r.id', revisionId).first(),
    revisionsByIds: (ids: number[]): Promise<RevisionRow[]> =>
      ids.length ? revisions().whereIn('r.id', ids) : Promise.resolve([]),
    async insertItem(
      row: { labId: number; kind: EquipmentKind; code: string; createdAt: string; createdBy: number },
      trx: Db,
    ): Promise<number> {
      const [inserted] = await trx('equipment_items')
        .insert({
          lab_id: row.labId,
          kind: row.kind,
          code: row.code,
          status: 'active',
          created_at: row.createdAt,
          created_by: row.createdBy,
        })
        .returning('id');
      return insertedId(inserted);
    },
    /** Appends a revision and makes it the item's current one. */
    async appendRevision(
      itemId: number,
      row: { data: unknown; reason: string; createdAt: string; createdBy: number; code: string },
      trx: Db,
    ): Promise<number> {
      const last = await trx('equipment_revisions').where({ item_id: itemId }).max({ n: 'number' }).first();
      const number = Number(last?.n ?? 0) + 1;
      const [inserted] = await trx('equipment_revisions')
        .insert({
          item_id: itemId,
          number,
          data_json: JSON.stringify(row.data),
          reason: row.reason,
          created_at: row.createdAt,
          created_by: row.createdBy,
        })
        .returning('id');
      const revisionId = insertedId(inserted);
      await trx('equipment_items').where({ id: itemId }).update({ current_revision_id: revisionId, code: row.code });
      return revisionId;
    },
    retire: (itemId: number, row: { at: string; by: number; reason: string }, trx: Db = db) =>
      trx('equipment_items')
        .where({ id: itemId, status: 'active' })
        .update({ status: 'retired', retired_at: row.at, retired_by: row.by, retired_reason: row.reason }),
    certificatesOf: (itemId: number): Promise<CertificateRow[]> =>
      db('certificates as c')
        .join('users as u', 'u.id', 'c.uploaded_by')
        .join('equipment_revisions as r', 'r.id', 'c.revision_id')
        .where('c.item_id', itemId)
        .orderBy('c.id', 'desc')
        .select('c.*', 'u.name as uploaded_by_name', 'r.number as revision_number'),
    certificate: (labId: number, certificateId: number): Promise<CertificateRow | undefined> =>
      db('certificates as c')
        .join('users as u', 'u.id', 'c.uploaded_by')
        .join('equipment_revisions as r', 'r.id', 'c.revision_id')
        .where({ 'c.id': certificateId, 'c.lab_id': labId })
        .select('c.*', 'u.name as uploaded_by_name', 'r.number as revision_number')
        .first(),
    async insertCertificate(
      row: Omit<CertificateRow, 'id' | 'uploaded_by_name' | 'revision_number' | 'contains_script'> & {
        uploaded_by: number;
        contains_script?: boolean;
      },
    ): Promise<number> {
      const [inserted] = await db('certificates').insert(row).returning('id');
      return insertedId(inserted);
    },
  };
}
export type LibraryRepository = ReturnType<typeof libraryRepository>;
