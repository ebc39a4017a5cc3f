import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { sampleKeys } from './sample-keys';

export function deleteSamplePhoto({ id }: { id: string; productId: string }) {
  return apiRequest(`/sample-photos/${encodeURIComponent(id)}`, { method: 'DELETE' });
}

export function useDeleteSamplePhoto({ mutationConfig }: { mutationConfig?: MutationConfig<typeof deleteSamplePhoto> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: deleteSamplePhoto,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: sampleKeys.forProduct(args[1].productId) });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
