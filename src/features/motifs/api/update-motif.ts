import { useMutation, useQueryClient } from '@tanstack/react-query';
import { motifDetailSchema, type UpdateMotifRequest } from '@shared/contracts/motifs';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { tagKeys } from '../../library/api/tag-keys';
import { motifKeys } from './motif-keys';

export function updateMotif({ id, changes }: { id: string; changes: UpdateMotifRequest }) {
  return apiRequest(`/motifs/${encodeURIComponent(id)}`, { method: 'PATCH', body: changes, schema: motifDetailSchema });
}

export function useUpdateMotif({ mutationConfig }: { mutationConfig?: MutationConfig<typeof updateMotif> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: updateMotif,
    onSuccess: (...args) => {
      const [motif] = args;
      queryClient.setQueryData(motifKeys.detail(motif.id), motif);
      const refreshed = Promise.all([
        queryClient.invalidateQueries({ queryKey: motifKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: tagKeys.all }),
      ]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
