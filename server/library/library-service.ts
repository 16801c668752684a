import { minimumWeightG } from '../../shared/uncertainty/minimum-weight';
import {
  equipmentDataSchemas,
  type Certificate,
  type EquipmentDetail,
  type EquipmentItem,
  type EquipmentKind,
  type Revision,
} from '../../shared/contracts/library';
import type { AuditRepository } from '../audit/audit-repository';
import type { SessionUser } from '../auth/authorize';
import type { Db } from '../db/connection';
import { conflict, notFound } from '../lib/errors';
import { fieldsRefused, toFieldIssues } from '../lib/validate';
import { calibrationState, expiryState, flagWords, isMaterial } from './item-status';
import type { CertificateRow, ItemRow, LibraryRepository, RevisionRow } from './library-repository';
import { canonicalJson } from '../lib/canonical-json';
import type { Transact } from '../db/transaction';

export const toRevision = (row: RevisionRow): Revision => ({
  id: row.id,
  number: row.number,
  data: JSON.parse(row.data_json) as Record<string, unknown>,
  reason: row.reason,
  createdBy: row.created_by_name,
  createdAt: row.created_at,
});

export const toCertificate = (row: CertificateRow): Certificate => ({
  id: row.id,
  revisionId: row.revision_id,
  revisionNumber: row.revision_number,
  originalName: row.original_name,
  mediaType: row.media_type,
  sizeBytes: row.size_bytes,
  sha256: row.sha256,
  containsScript: Boolean(row.contains_script),
  uploadedBy: row.uploaded_by_name,
  uploadedAt: row.uploaded_at,
});

/** Validates one item's data for its kind; the error names each field. */
export function parseItemData(kind: EquipmentKind, data: unknown) {
  const result = equipmentDataSchemas[kind].safeParse(data);
  if (!result.success) {
    const issues = toFieldIssues(result.error, 'data');
    throw fieldsRefused(issues);
  }
  return result.data as { code: string } & Record<string, unknown>;
}

export function libraryService(deps: {
  transact: Transact;
  library: LibraryRepository;
  audit: AuditRepository;
  now: () => Date;
}) {
  const { transact, library, audit, now } = deps;
  const today = () => now().toISOString().slice(0, 10);

  function summarise(item: ItemRow, current: RevisionRow, certificateCount: number): EquipmentItem {
    const revision = toRevision(current);
    const data = revision.data as {
      calibrationDueOn?: string | null;
      expiresOn?: string;
      repeatabilityG?: number;
      readabilityG?: number;
    };
    const calibration = isMaterial(item.kind) ? 'not-tracked' : calibrationState(data.calibrationDueOn, today());
    const expiry = isMaterial(item.kind) ? expiryState(data.expiresOn, today()) : 'not-applicable';
    return {
      id: item.id,
      kind: item.kind,
      code: item.code,
      status: item.status,
      retiredReason: item.retired_reason,
      current: revision,
      calibration,
      expiry,
      minimumWeightG: item.kind === 'balance' ? minimumWeightG(data.repeatabilityG ?? 0, data.readabilityG ?? 0) : null,
      certificateCount,
      flags: flagWords({
        retiredReason: item.retired_reason,
        calibration,
        dueOn: data.calibrationDueOn,
        expiry,
        expiresOn: data.expiresOn,
      }),
    };
  }

  async function detail(labId: number, itemId: number): Promise<EquipmentDetail> {
    const item = await library.item(labId, itemId);
    if (!item) throw notFound('The item');
    const revisions = await library.revisionsOf(itemId);
    const certificates = await library.certificatesOf(itemId);
    const current = revisions.find((r) => r.id === item.current_revision_id) as RevisionRow;
    return {
      ...summarise(item, current, certificates.length),
      revisions: revisions.map(toRevision),
      certificates: certificates.map(toCertificate),
    };
  }

  async function assertCodeFree(labId: number, code: string, itemId: number | null, trx: Db) {
    const clash = await library.itemByCode(labId, code, trx);
    if (clash && clash.id !== itemId)
      throw conflict('code_taken', `The ID ${code} is already used by another item in this lab's library.`);
  }

  return {
    detail,

    async list(
      labId: number,
      filter: { kind?: EquipmentKind; status: 'active' | 'retired' | 'all' },
    ): Promise<EquipmentItem[]> {
      const items = await library.items(labId, filter);
      const revisions = new Map(
        (await library.revisionsByIds(items.map((i) => i.current_revision_id))).map((r) => [r.id, r]),
      );
      return items.map((item) =>
        summarise(item, revisions.get(item.current_revision_id) as RevisionRow, Number(item.certificate_count)),
      );
    },

    async revision(labId: number, itemId: number, number: number): Promise<Revision> {
      const item = await library.item(labId, itemId);
      if (!item) throw notFound('The item');
      const found = (await library.revisionsOf(itemId)).find((r) => r.number === number);
      if (!found) throw notFound(`Revision ${number} of ${item.code}`);
      return toRevision(found);
    },

    /** Creates an item with its first revision. `trx` lets a CSV import put many in one transaction. */
    async create(
      labId: number,
      actor: SessionUser,
      input: { kind: EquipmentKind; data: unknown; reason?: string },
      trx?: Db,
    ): Promise<number> {
      const data = parseItemData(input.kind, input.data);
      const at = now().toISOString();
      const run = async (t: Db) => {
        await assertCodeFree(labId, data.code, null, t);
        const itemId = await library.insertItem(
          { labId, kind: input.kind, code: data.code, createdAt: at, createdBy: actor.id },
          t,
        );
        await library.appendRevision(
          itemId,
          { data, reason: input.reason || 'First entry', createdAt: at, createdBy: actor.id, code: data.code },
          t,
        );
        await audit.record(
          {
            labId,
            actorUserId: actor.id,
            action: 'library.created',
            entityType: 'equipment',
            entityId: itemId,
            summary: `${actor.name} added ${input.kind} ${data.code}`,
            after: data,
          },
          t,
        );
        return itemId;
      };
      return trx ? run(trx) : transact(run);
    },

    /** Adds a revision; earlier revisions, and every budget that points at them, stay as they were. */
    async revise(
      labId: number,
      actor: SessionUser,
      itemId: number,
      input: { data: unknown; reason: string },
      trx?: Db,
    ): Promise<'revised' | 'unchanged'> {
      const run = async (t: Db) => {
        const item = await library.item(labId, itemId, t);
        if (!item) throw notFound('The item');
        if (item.status === 'retired')
          throw conflict('retired', `${item.code} is retired; its record can be read but not changed.`);
        const data = parseItemData(item.kind, input.data);
        const current = await library.revision(item.current_revision_id, t);
        const before = JSON.parse((current as RevisionRow).data_json);
        if (canonicalJson(before) === canonicalJson(data)) return 'unchanged' as const;
        await assertCodeFree(labId, data.code, itemId, t);
        await library.appendRevision(
          itemId,
          { data, reason: input.reason, createdAt: now().toISOString(), createdBy: actor.id, code: data.code },
          t,
        );
        await audit.record(
          {
            labId,
            actorUserId: actor.id,
            action: 'library.revised',
            entityType: 'equipment',
            entityId: itemId,
            summary: `${actor.name} revised ${data.code}: ${input.reason}`,
            before,
            after: data,
          },
          t,
        );
        return 'revised' as const;
      };
      return trx ? run(trx) : transact(run);
    },

    async retire(labId: number, actor: SessionUser, itemId: number, reason: string): Promise<EquipmentDetail> {
      await transact(async (trx) => {
        const item = await library.item(labId, itemId, trx);
        if (!item) throw notFound('The item');
        if (item.status === 'retired') throw conflict('retired', `${item.code} is already retired.`);
        await library.retire(itemId, { at: now().toISOString(), by: actor.id, reason }, trx);
        await audit.record(
          {
            labId,
            actorUserId: actor.id,
            action: 'library.retired',
            entityType: 'equipment',
            entityId: itemId,
            summary: `${actor.name} retired ${item.code}: ${reason}`,
          },
          trx,
        );
      });
      return detail(labId, itemId);
    },
  };
}
export type LibraryService = ReturnType<typeof libraryService>;
