import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { preparationDetailSchema, type PreparationDetail } from '../../../../shared/contracts/preparations';
import type { approveRequestSchema } from '../../../../shared/contracts/reviews';
import { api } from '../../../lib/api-client';
import { reviewsKeys } from './reviews-keys';
import { versionPath, type OnReviewed, type VersionReference } from './review-version-input';

type ApproveInput = VersionReference & { request: z.output<typeof approveRequestSchema> };

/** QA approves a submitted version, signing with their password and a statement of what they approve. */
export function approveVersion({ request, ...version }: ApproveInput): Promise<PreparationDetail> {
  return api.post(`${versionPath(version)}/approve`, request, preparationDetailSchema);
}

export function useApproveVersion(onReviewed: OnReviewed) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: approveVersion,
    onSuccess: async (detail, { labId }) => {
      await Promise.all([queryClient.invalidateQueries({ queryKey: reviewsKeys.queue(labId) }), onReviewed(detail)]);
    },
  });
}
