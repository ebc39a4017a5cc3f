import { queryOptions, useQuery } from '@tanstack/react-query';
import { productReviewSchema } from '@shared/contracts/reviews';
import { apiRequest } from '../../../lib/api-client';
import { reviewsKeys } from './reviews-keys';

export function getReview({ productId, signal }: { productId: string; signal?: AbortSignal }) {
  return apiRequest(`/products/${encodeURIComponent(productId)}/review`, { schema: productReviewSchema, signal });
}

export const reviewQueryOptions = (productId: string) =>
  queryOptions({ queryKey: reviewsKeys.review(productId), queryFn: ({ signal }) => getReview({ productId, signal }) });

export function useReview(productId: string) {
  return useQuery(reviewQueryOptions(productId));
}
