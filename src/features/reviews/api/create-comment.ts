import { useMutation, useQueryClient } from '@tanstack/react-query';
import { commentSchema } from '@shared/contracts/reviews';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { reviewsKeys } from './reviews-keys';

export function createComment({ threadId, body }: { productId: string; threadId: string; body: string }) {
  return apiRequest(`/threads/${encodeURIComponent(threadId)}/comments`, { method: 'POST', body: { body }, schema: commentSchema });
}

export function useCreateComment({ mutationConfig }: { mutationConfig?: MutationConfig<typeof createComment> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: createComment,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: reviewsKeys.threads(args[1].productId) });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
