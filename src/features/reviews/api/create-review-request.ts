import { useMutation, useQueryClient } from '@tanstack/react-query';
import { productReviewSchema, type CreateReviewRequest } from '@shared/contracts/reviews';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { reviewsKeys } from './reviews-keys';

export function createReviewRequest({ productId, ...body }: CreateReviewRequest & { productId: string }) {
  return apiRequest(`/products/${encodeURIComponent(productId)}/review-requests`, { method: 'POST', body, schema: productReviewSchema });
}

export function useCreateReviewRequest({ mutationConfig }: { mutationConfig?: MutationConfig<typeof createReviewRequest> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: createReviewRequest,
    onSuccess: (...args) => {
      queryClient.setQueryData(reviewsKeys.review(args[1].productId), args[0]);
      onSuccess?.(...args);
    },
  });
}
