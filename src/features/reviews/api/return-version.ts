import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { preparationDetailSchema, type PreparationDetail } from '../../../../shared/contracts/preparations';
import type { returnRequestSchema } from '../../../../shared/contracts/reviews';
import { api } from '../../../lib/api-client';
import { reviewsKeys } from './reviews-keys';
import { versionPath, type OnReviewed, type VersionReference } from './review-version-input';

type ReturnInput = VersionReference & { request: z.output<typeof returnRequestSchema> };

/** QA sends a submitted version back to its analyst with comments on what to change. */
export function returnVersion({ request, ...version }: ReturnInput): Promise<PreparationDetail> {
  return api.post(`${versionPath(version)}/return`, request, preparationDetailSchema);
}

export function useReturnVersion(onReviewed: OnReviewed) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: returnVersion,
    onSuccess: async (detail, { labId }) => {
      await Promise.all([queryClient.invalidateQueries({ queryKey: reviewsKeys.queue(labId) }), onReviewed(detail)]);
    },
  });
}
