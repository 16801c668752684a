import type { VersionDetail } from '../../../../shared/contracts/preparations';
import { formatDateTime } from '../../../lib/format-date';

/** While a version is back with its analyst: who returned it, when, and the comments, above everything else. */
export function ReturnNotice({ version }: { version: VersionDetail }) {
  const lastReturn =
    version.status === 'returned' ? version.reviews.findLast((review) => review.action === 'returned') : undefined;
  if (!lastReturn) return null;
  return (
    <div role="status" className="rounded-md border-l-4 border-caution bg-caution-tint px-4 py-3 text-ink">
      <p className="font-bold text-caution">
        Returned by {lastReturn.actor}, <time dateTime={lastReturn.at}>{formatDateTime(lastReturn.at)}</time>
      </p>
      <p className="whitespace-pre-line">{lastReturn.comment}</p>
      <p className="mt-2 text-sm">Change the plan in the planner, then submit it for review again.</p>
    </div>
  );
}
