import { queryOptions, useQuery } from '@tanstack/react-query';
import { threadsListSchema } from '@shared/contracts/reviews';
import { apiRequest } from '../../../lib/api-client';
import { reviewsKeys } from './reviews-keys';

export function getThreads({ productId, signal }: { productId: string; signal?: AbortSignal }) {
  return apiRequest(`/products/${encodeURIComponent(productId)}/threads`, { schema: threadsListSchema, signal });
}

export const threadsQueryOptions = (productId: string) =>
  queryOptions({ queryKey: reviewsKeys.threads(productId), queryFn: ({ signal }) => getThreads({ productId, signal }) });

export function useThreads(productId: string) {
  return useQuery(threadsQueryOptions(productId));
}
