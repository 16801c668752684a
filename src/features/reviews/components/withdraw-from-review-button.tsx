import type { z } from 'zod';
import { withdrawRequestSchema } from '../../../../shared/contracts/reviews';
import type { OnReviewed, VersionReference } from '../api/review-version-input';
import { useReviewAction } from '../api/review-action';
import { CommentDialogButton } from './comment-dialog-button';

/** The analyst's "Withdraw from review": the submitted version comes back before QA decides. */
export function WithdrawFromReviewButton({
  version,
  onReviewed,
}: {
  version: VersionReference;
  onReviewed: OnReviewed;
}) {
  const withdraw = useReviewAction<z.output<typeof withdrawRequestSchema>>('withdraw', onReviewed);
  return (
    <CommentDialogButton
      version={version}
      schema={withdrawRequestSchema}
      mutation={withdraw}
      variant="secondary"
      label="Withdraw from review"
      title={`Withdraw version ${version.versionNumber} from review`}
      explanation="It leaves the review queue and comes back to you to correct: as prepared if you recorded bench readings, otherwise as a draft. Submit it again when it is ready."
      commentField={{ label: 'Reason (optional)', maxLength: 2000 }}
    />
  );
}
