import { useMutation, useQueryClient } from '@tanstack/react-query';
import { productReviewSchema, type CreateDecisionRequest } from '@shared/contracts/reviews';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { reviewsKeys } from './reviews-keys';

export function createDecision({ productId, ...body }: CreateDecisionRequest & { productId: string }) {
  return apiRequest(`/products/${encodeURIComponent(productId)}/decisions`, { method: 'POST', body, schema: productReviewSchema });
}

export function useCreateDecision({ mutationConfig }: { mutationConfig?: MutationConfig<typeof createDecision> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: createDecision,
    onSuccess: (...args) => {
      // the answer is the whole review state: no refetch needed
      queryClient.setQueryData(reviewsKeys.review(args[1].productId), args[0]);
      onSuccess?.(...args);
    },
  });
}
