import type { z } from 'zod';
import { returnRequestSchema } from '../../../../shared/contracts/reviews';
import type { OnReviewed, VersionReference } from '../api/review-version-input';
import { useReviewAction } from '../api/review-action';
import { CommentDialogButton } from './comment-dialog-button';

/** QA's "Return with comments": the version goes back to its analyst, who sees the comments on the record. */
export function ReturnButton({ version, onReviewed }: { version: VersionReference; onReviewed: OnReviewed }) {
  const returnVersion = useReviewAction<z.output<typeof returnRequestSchema>>('return', onReviewed);
  return (
    <CommentDialogButton
      version={version}
      schema={returnRequestSchema}
      mutation={returnVersion}
      variant="secondary"
      label="Return with comments"
      title={`Return version ${version.versionNumber} to the analyst`}
      explanation="The analyst is told by e-mail and can change the plan and submit it again."
      commentField={{ label: 'Comments for the analyst', rows: 5, maxLength: 4000 }}
    />
  );
}
