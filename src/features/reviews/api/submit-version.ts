import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { preparationDetailSchema, type PreparationDetail } from '../../../../shared/contracts/preparations';
import type { submitRequestSchema } from '../../../../shared/contracts/reviews';
import { api } from '../../../lib/api-client';
import { reviewsKeys } from './reviews-keys';
import { versionPath, type OnReviewed, type VersionReference } from './review-version-input';

type SubmitInput = VersionReference & { request: z.output<typeof submitRequestSchema> };

/** The analyst sends a computed draft or returned version to QA (the reviewers get an e-mail). */
export function submitVersion({ request, ...version }: SubmitInput): Promise<PreparationDetail> {
  return api.post(`${versionPath(version)}/submit`, request, preparationDetailSchema);
}

export function useSubmitVersion(onReviewed: OnReviewed) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: submitVersion,
    onSuccess: async (detail, { labId }) => {
      await Promise.all([queryClient.invalidateQueries({ queryKey: reviewsKeys.queue(labId) }), onReviewed(detail)]);
    },
  });
}
