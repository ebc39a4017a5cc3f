import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { motifKeys } from '../../motifs/api/motif-keys';
import { originalsKeys } from './originals-keys';

export function deleteOriginal({ id }: { id: string }) {
  return apiRequest(`/originals/${encodeURIComponent(id)}`, { method: 'DELETE' });
}

export function useDeleteOriginal({ mutationConfig }: { mutationConfig?: MutationConfig<typeof deleteOriginal> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: deleteOriginal,
    onSuccess: (...args) => {
      const [, { id }] = args;
      queryClient.removeQueries({ queryKey: originalsKeys.detail(id) });
      // Its motifs leave the library with it.
      const refreshed = Promise.all([
        queryClient.invalidateQueries({ queryKey: originalsKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: motifKeys.all }),
      ]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
