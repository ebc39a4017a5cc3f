import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { originalsKeys } from '../../originals/api/originals-keys';
import { tagKeys } from '../../library/api/tag-keys';
import { motifKeys } from './motif-keys';

// The server refuses (409 motif.in_use) while any product uses the motif.
export function deleteMotif({ id }: { id: string }) {
  return apiRequest(`/motifs/${encodeURIComponent(id)}`, { method: 'DELETE' });
}

export function useDeleteMotif({ mutationConfig }: { mutationConfig?: MutationConfig<typeof deleteMotif> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: deleteMotif,
    onSuccess: (...args) => {
      const [, { id }] = args;
      queryClient.removeQueries({ queryKey: motifKeys.detail(id) });
      const refreshed = Promise.all([
        queryClient.invalidateQueries({ queryKey: motifKeys.all }),
        queryClient.invalidateQueries({ queryKey: originalsKeys.all }),
        queryClient.invalidateQueries({ queryKey: tagKeys.all }),
      ]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
