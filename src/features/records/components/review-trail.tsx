import type { Review } from '../../../../shared/contracts/reviews';
import { formatDateTime } from '../../../lib/format-date';

const ACTION_WORDS: Record<Review['action'], { verb: string; mark: string; commentLabel: string }> = {
  submitted: { verb: 'Submitted for review', mark: 'border-accent', commentLabel: 'Note to the reviewer' },
  returned: { verb: 'Returned with comments', mark: 'border-caution', commentLabel: 'Comments' },
  approved: { verb: 'Approved and signed', mark: 'border-ok', commentLabel: 'Approval statement' },
  withdrawn: { verb: 'Withdrawn from review', mark: 'border-line-strong', commentLabel: 'Reason' },
};

/** Submissions, withdrawals, returns with their comments and the signed approval of one version, oldest first. */
export function ReviewTrail({ reviews }: { reviews: Review[] }) {
  return (
    <section aria-labelledby="trail-heading">
      <h2 id="trail-heading" className="mb-3 text-xl font-bold">
        Review trail
      </h2>
      {reviews.length === 0 ? (
        <p className="text-muted">Nobody has submitted this version for review yet.</p>
      ) : (
        <ol className="flex flex-col gap-3">
          {reviews.map((review) => {
            const words = ACTION_WORDS[review.action];
            return (
              <li
                key={review.id}
                className={`rounded-md border border-l-4 border-line bg-surface px-4 py-3 ${words.mark}`}
              >
                <p>
                  <span className="font-bold">{words.verb}</span> by {review.actor},{' '}
                  <time dateTime={review.at}>{formatDateTime(review.at)}</time>
                </p>
                {review.comment ? (
                  <div className="mt-1">
                    <p className="text-sm font-semibold text-muted">{words.commentLabel}</p>
                    <p className="whitespace-pre-line">{review.comment}</p>
                  </div>
                ) : null}
              </li>
            );
          })}
        </ol>
      )}
    </section>
  );
}
