import { useMutation, useQueryClient } from '@tanstack/react-query';
import { commentThreadSchema, type CreateThreadRequest } from '@shared/contracts/reviews';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { reviewsKeys } from './reviews-keys';

export function createThread({ productId, ...body }: CreateThreadRequest & { productId: string }) {
  return apiRequest(`/products/${encodeURIComponent(productId)}/threads`, { method: 'POST', body, schema: commentThreadSchema });
}

export function useCreateThread({ mutationConfig }: { mutationConfig?: MutationConfig<typeof createThread> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: createThread,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: reviewsKeys.threads(args[1].productId) });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
