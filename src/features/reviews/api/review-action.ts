import { useMutation, useQueryClient } from '@tanstack/react-query';
import { preparationDetailSchema, type PreparationDetail } from '../../../../shared/contracts/preparations';
import { api } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';
import { preparationKeys } from '../../../lib/api/preparation';
import { reviewsKeys } from './reviews-keys';
import { versionPath, type OnReviewed, type VersionReference } from './review-version-input';

/** The review actions on a version: the analyst submits or withdraws it, QA approves or returns it. */
type ReviewAction = 'submit' | 'withdraw' | 'approve' | 'return';

/** Sends one review action with its request (a comment, or QA's statement and password). */
function sendReviewAction<Request>(
  action: ReviewAction,
  { request, ...version }: VersionReference & { request: Request },
): Promise<PreparationDetail> {
  return api.post(`${versionPath(version)}/${action}`, request, preparationDetailSchema);
}

/**
 * A review action as a mutation. On success the review queue and the page showing the version re-read. On a
 * conflict (someone else acted first: the analyst withdrew while QA was signing, another QA member approved) the
 * version and the queue re-read too, so the page stops offering an action the server now refuses.
 */
export function useReviewAction<Request>(action: ReviewAction, onReviewed: OnReviewed) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: VersionReference & { request: Request }) => sendReviewAction(action, input),
    onSuccess: async (detail, { labId }) => {
      await Promise.all([queryClient.invalidateQueries({ queryKey: reviewsKeys.queue(labId) }), onReviewed(detail)]);
    },
    onError: async (error, { labId, preparationId }) => {
      if (!(error instanceof ApiError) || error.status !== 409) return;
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: reviewsKeys.queue(labId) }),
        queryClient.invalidateQueries({ queryKey: preparationKeys.detail(labId, preparationId) }),
      ]);
    },
  });
}
