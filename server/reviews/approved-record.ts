import { canonicalJson, sha256Hex } from '../lib/canonical-json';

/** What an approved version showed when it was signed; it never follows later versions or renames. */
export interface ApprovedAs {
  title: string;
  analyte: string;
  /** The plan document's own name for the preparation (its title when the plan has none). */
  preparationName: string;
  labName: string;
}

/** The columns of preparation_versions that hold ApprovedAs (all null on versions approved before they existed). */
export interface ApprovedAsColumns {
  approved_title: string | null;
  approved_analyte: string | null;
  approved_preparation_name: string | null;
  approved_lab_name: string | null;
}

export const toApprovedAsColumns = (a: ApprovedAs): ApprovedAsColumns => ({
  approved_title: a.title,
  approved_analyte: a.analyte,
  approved_preparation_name: a.preparationName,
  approved_lab_name: a.labName,
});

/** The frozen fields, or null for a version approved before they were stored. */
export function approvedAsOf(row: ApprovedAsColumns): ApprovedAs | null {
  if (row.approved_title == null) return null;
  return {
    title: row.approved_title,
    analyte: row.approved_analyte ?? '',
    preparationName: row.approved_preparation_name ?? '',
    labName: row.approved_lab_name ?? '',
  };
}

/**
 * SHA-256 of the approved record: canonical JSON of the snapshot's own SHA-256 and the frozen
 * fields, under a format tag. The snapshot hash stays what it was (old records verify as before);
 * this second hash is what the reviewer signs from now on, so the frozen fields cannot change
 * without breaking it.
 */
export function approvedRecordSha256(snapshotSha256: string, approvedAs: ApprovedAs): string {
  return sha256Hex(canonicalJson({ format: 'dilutrace-approved-record/2', snapshotSha256, approvedAs }));
}
