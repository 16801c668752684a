import type { VersionFacts } from '../../shared/domain/version-lifecycle';
import type { ReviewRow, VersionRow } from './preparations-repository';

/** Who submitted the version last (reviews oldest first), or null when it never was. */
export const lastSubmitterId = (reviews: readonly ReviewRow[]): number | null =>
  reviews.findLast((review) => review.action === 'submitted')?.actor_user_id ?? null;

/** Masses weighed at the bench were recorded on the version. */
export const readingsRecorded = (version: Pick<VersionRow, 'readings_json'>) => version.readings_json !== null;

/** The facts the version lifecycle decides on, read from the stored rows. */
export function versionFacts(
  version: VersionRow,
  reviews: readonly ReviewRow[],
  preparation: { ownerId: number; latestNumber: number },
): VersionFacts {
  return {
    status: version.status,
    ownerId: preparation.ownerId,
    submitterId: lastSubmitterId(reviews),
    computed: version.snapshot_json !== null,
    latest: version.number === preparation.latestNumber,
    readingsRecorded: readingsRecorded(version),
  };
}
