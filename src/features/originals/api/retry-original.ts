import { useMutation, useQueryClient } from '@tanstack/react-query';
import { originalDetailSchema } from '@shared/contracts/originals';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { originalsKeys } from './originals-keys';

export function retryOriginal({ id }: { id: string }) {
  return apiRequest(`/originals/${encodeURIComponent(id)}/retry`, { method: 'POST', schema: originalDetailSchema });
}

export function useRetryOriginal({ mutationConfig }: { mutationConfig?: MutationConfig<typeof retryOriginal> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: retryOriginal,
    onSuccess: (...args) => {
      const [original] = args;
      // The answer is the queued original: show it at once, so polling starts again.
      queryClient.setQueryData(originalsKeys.detail(original.id), original);
      const refreshed = queryClient.invalidateQueries({ queryKey: originalsKeys.all });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
