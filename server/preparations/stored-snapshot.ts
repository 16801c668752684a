import { z } from 'zod';
import { snapshotSchema, type Snapshot } from '../../shared/contracts/snapshot';
import { canonicalJson } from '../lib/canonical-json';

/**
 * The text stored in `preparation_versions.snapshot_json`: canonical JSON of the encoded snapshot (non-finite
 * numbers as "Infinity", "-Infinity" or "NaN"). Its SHA-256 is the snapshot hash, and it is never rewritten.
 */
export function storedSnapshotJson(snapshot: Snapshot): string {
  return canonicalJson(snapshotSchema.encode(snapshot));
}

/**
 * Reads a stored snapshot into the engine's types: the one place the server parses one. Snapshots stored
 * before the encoding (ν = ∞ written as null) read as they were meant.
 * @throws Error when the stored text is not a snapshot (a damaged row, never a user's mistake)
 */
export function readStoredSnapshot(json: string): Snapshot {
  const parsed = snapshotSchema.safeParse(JSON.parse(json));
  if (!parsed.success)
    throw new Error(`A stored snapshot does not have the snapshot format:\n${z.prettifyError(parsed.error)}`);
  return parsed.data;
}
