import type { Db } from '../db/connection';
import { sha256Hex } from '../lib/canonical-json';
import { approvedAsOf, approvedRecordSha256, type ApprovedAsColumns } from '../reviews/approved-record';
import { auditEventHash, GENESIS_HASH, type ChainedEvent } from './audit-chain';

/** One row that does not hold what its hashes say: where it is and what differs. */
export interface RecordBreak {
  table: 'audit_events' | 'preparation_versions';
  id: number;
  problem: string;
}

const PAGE = 1000;

/** Walks the audit trail in id order and checks each event's hash and its link to the one before. */
async function checkAuditChain(db: Db): Promise<{ events: number; breaks: RecordBreak[] }> {
  const breaks: RecordBreak[] = [];
  let previous: { id: number; hash: string } | null = null;
  let events = 0;
  for (let afterId = 0; ;) {
    const rows: (ChainedEvent & { id: number; previous_hash: string | null; event_hash: string | null })[] = await db(
      'audit_events',
    )
      .where('id', '>', afterId)
      .orderBy('id')
      .limit(PAGE);
    if (rows.length === 0) break;
    for (const row of rows) {
      const id = Number(row.id);
      const expectedPrevious = previous?.hash ?? GENESIS_HASH;
      if (row.previous_hash !== expectedPrevious) {
        breaks.push({
          table: 'audit_events',
          id,
          problem: previous
            ? `previous_hash does not match the hash of event ${previous.id} before it (stored ${row.previous_hash ?? 'none'}, expected ${expectedPrevious}): an event was removed, inserted or reordered here`
            : `previous_hash of the first event is not the chain's start (stored ${row.previous_hash ?? 'none'}): events before it were removed`,
        });
      }
      const computed = auditEventHash(row, row.previous_hash ?? GENESIS_HASH);
      if (row.event_hash !== computed) {
        breaks.push({
          table: 'audit_events',
          id,
          problem: `event_hash differs from the hash of its content (stored ${row.event_hash ?? 'none'}, computed ${computed}): the event was altered`,
        });
      }
      previous = { id, hash: row.event_hash ?? computed };
      events += 1;
    }
    afterId = Number(rows[rows.length - 1].id);
  }
  return { events, breaks };
}

/** Checks every approved version: its snapshot against its stored and signed hashes, and its frozen fields against the record hash. */
async function checkApprovedVersions(db: Db): Promise<{ versions: number; breaks: RecordBreak[] }> {
  const breaks: RecordBreak[] = [];
  const rows: (ApprovedAsColumns & {
    id: number;
    snapshot_json: string | null;
    snapshot_sha256: string | null;
    record_sha256: string | null;
  })[] = await db('preparation_versions')
    .where({ status: 'approved' })
    .select(
      'id',
      'snapshot_json',
      'snapshot_sha256',
      'record_sha256',
      'approved_title',
      'approved_analyte',
      'approved_preparation_name',
      'approved_lab_name',
    )
    .orderBy('id');
  const approvals: { version_id: number; snapshot_sha256: string | null; record_sha256: string | null }[] = await db(
    'version_reviews',
  )
    .where({ action: 'approved' })
    .select('version_id', 'snapshot_sha256', 'record_sha256');
  const signed = new Map(approvals.map((a) => [Number(a.version_id), a]));
  for (const row of rows) {
    const id = Number(row.id);
    const problem = (text: string) => breaks.push({ table: 'preparation_versions', id, problem: text });
    const approval = signed.get(id);
    if (!row.snapshot_json) {
      problem('the approved version has no snapshot');
      continue;
    }
    const computed = sha256Hex(row.snapshot_json);
    if (computed !== row.snapshot_sha256)
      problem(
        `snapshot_json does not hash to snapshot_sha256 (stored ${row.snapshot_sha256 ?? 'none'}, computed ${computed}): the snapshot was altered`,
      );
    if (!approval) problem('there is no approval review for this approved version');
    else if (approval.snapshot_sha256 !== computed)
      problem(
        `the snapshot hash signed at approval differs (signed ${approval.snapshot_sha256 ?? 'none'}, computed ${computed})`,
      );
    const approvedAs = approvedAsOf(row);
    if (approvedAs || row.record_sha256 || approval?.record_sha256) {
      const record = approvedAs ? approvedRecordSha256(computed, approvedAs) : 'none (the frozen title is missing)';
      if (record !== row.record_sha256)
        problem(
          `the frozen title, analyte, preparation name or lab name do not hash to record_sha256 (stored ${row.record_sha256 ?? 'none'}, computed ${record})`,
        );
      if (approval && record !== approval.record_sha256)
        problem(
          `the record hash signed at approval differs (signed ${approval.record_sha256 ?? 'none'}, computed ${record})`,
        );
    }
  }
  return { versions: rows.length, breaks };
}

/** Everything `npm run verify` checks: the audit chain and every approved record. */
export async function verifyRecords(db: Db): Promise<{ events: number; versions: number; breaks: RecordBreak[] }> {
  const chain = await checkAuditChain(db);
  const approved = await checkApprovedVersions(db);
  return { events: chain.events, versions: approved.versions, breaks: [...chain.breaks, ...approved.breaks] };
}
