import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { reviewQueueItemSchema, type ReviewQueueItem } from '../../../../shared/contracts/reviews';
import { api } from '../../../lib/api-client';
import { reviewsKeys } from './reviews-keys';

const reviewQueueSchema = z.array(reviewQueueItemSchema);

/** Submitted versions waiting for QA, oldest submission first. */
export function getReviewQueue(labId: number): Promise<ReviewQueueItem[]> {
  return api.get(`/api/labs/${labId}/review-queue`, reviewQueueSchema);
}

export const reviewQueueQueryOptions = (labId: number) =>
  queryOptions({
    queryKey: reviewsKeys.queue(labId),
    queryFn: () => getReviewQueue(labId),
  });

export function useReviewQueue(labId: number): ReviewQueueItem[] {
  return useSuspenseQuery(reviewQueueQueryOptions(labId)).data;
}
