import { submitRequestSchema } from '../../../../shared/contracts/reviews';
import type { OnReviewed, VersionReference } from '../api/review-version-input';
import { useSubmitVersion } from '../api/submit-version';
import { CommentDialogButton } from './comment-dialog-button';

/** The analyst's "Submit for review", with an optional note to the reviewer. */
export function SubmitForReviewButton({ version, onReviewed }: { version: VersionReference; onReviewed: OnReviewed }) {
  const submit = useSubmitVersion(onReviewed);
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
