import { useMutation, useQueryClient } from '@tanstack/react-query';
import { bulkMotifsResponseSchema, type BulkMotifsRequest } from '@shared/contracts/motifs';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { collectionKeys } from '../../collections/api/collection-keys';
import { motifKeys } from '../../motifs/api/motif-keys';
import { tagKeys } from './tag-keys';

export function bulkEditMotifs(request: BulkMotifsRequest) {
  return apiRequest('/motifs/bulk', { method: 'POST', body: request, schema: bulkMotifsResponseSchema });
}

export function useBulkEditMotifs({ mutationConfig }: { mutationConfig?: MutationConfig<typeof bulkEditMotifs> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: bulkEditMotifs,
    onSuccess: (...args) => {
      const refreshed = Promise.all([
        queryClient.invalidateQueries({ queryKey: motifKeys.all }),
        queryClient.invalidateQueries({ queryKey: tagKeys.all }),
        queryClient.invalidateQueries({ queryKey: collectionKeys.all }),
      ]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
