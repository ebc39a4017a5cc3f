import { useMutation, useQueryClient } from '@tanstack/react-query';
import { motifDetailSchema } from '@shared/contracts/motifs';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { motifKeys } from './motif-keys';

// Copies an earlier version as the newest; older versions stay readable.
export function restoreMotifVersion({ id, version }: { id: string; version: number }) {
  return apiRequest(`/motifs/${encodeURIComponent(id)}/versions/${version}/restore`, { method: 'POST', schema: motifDetailSchema });
}

export function useRestoreMotifVersion({
  mutationConfig,
}: { mutationConfig?: MutationConfig<typeof restoreMotifVersion> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: restoreMotifVersion,
    onSuccess: (...args) => {
      const [motif] = args;
      queryClient.setQueryData(motifKeys.detail(motif.id), motif);
      const refreshed = Promise.all([
        queryClient.invalidateQueries({ queryKey: motifKeys.all }),
      ]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
