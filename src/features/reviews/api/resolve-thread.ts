import { useMutation, useQueryClient } from '@tanstack/react-query';
import { commentThreadSchema } from '@shared/contracts/reviews';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { reviewsKeys } from './reviews-keys';

// Resolves a thread, or reopens it (resolved: false).
export function resolveThread({ threadId, resolved }: { productId: string; threadId: string; resolved: boolean }) {
  return apiRequest(`/threads/${encodeURIComponent(threadId)}/${resolved ? 'resolve' : 'reopen'}`, { method: 'POST', schema: commentThreadSchema });
}

export function useResolveThread({ mutationConfig }: { mutationConfig?: MutationConfig<typeof resolveThread> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: resolveThread,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: reviewsKeys.threads(args[1].productId) });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
