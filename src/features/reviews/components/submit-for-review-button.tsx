import type { z } from 'zod';
import { submitRequestSchema } from '../../../../shared/contracts/reviews';
import type { OnReviewed, VersionReference } from '../api/review-version-input';
import { useReviewAction } from '../api/review-action';
import { CommentDialogButton } from './comment-dialog-button';

/** The analyst's "Submit for review", with an optional note to the reviewer. */
export function SubmitForReviewButton({ version, onReviewed }: { version: VersionReference; onReviewed: OnReviewed }) {
  const submit = useReviewAction<z.output<typeof submitRequestSchema>>('submit', onReviewed);
  return (
    <CommentDialogButton
      version={version}
      schema={submitRequestSchema}
      mutation={submit}
      label="Submit for review"
      title={`Submit version ${version.versionNumber} for review`}
      explanation="Quality assurance is told by e-mail. Until they decide, this version cannot be changed."
      commentField={{ label: 'Note to the reviewer (optional)', maxLength: 2000 }}
    />
  );
}
