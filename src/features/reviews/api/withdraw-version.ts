import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { preparationDetailSchema, type PreparationDetail } from '../../../../shared/contracts/preparations';
import type { withdrawRequestSchema } from '../../../../shared/contracts/reviews';
import { api } from '../../../lib/api-client';
import { reviewsKeys } from './reviews-keys';
import { versionPath, type OnReviewed, type VersionReference } from './review-version-input';

type WithdrawInput = VersionReference & { request: z.output<typeof withdrawRequestSchema> };

/** The analyst takes a submitted version back before QA decides; it leaves the review queue. */
export function withdrawVersion({ request, ...version }: WithdrawInput): Promise<PreparationDetail> {
  return api.post(`${versionPath(version)}/withdraw`, request, preparationDetailSchema);
}

export function useWithdrawVersion(onReviewed: OnReviewed) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: withdrawVersion,
    onSuccess: async (detail, { labId }) => {
      await Promise.all([queryClient.invalidateQueries({ queryKey: reviewsKeys.queue(labId) }), onReviewed(detail)]);
    },
  });
}
