import { useMutation, useQueryClient } from '@tanstack/react-query';
import { collectionMembersResponseSchema } from '@shared/contracts/collections';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { motifKeys } from '../../motifs/api/motif-keys';
import { collectionKeys } from './collection-keys';

export type CollectionMotifsChange = { collectionId: string; ids: string[]; change: 'add' | 'remove' };

export function updateCollectionMotifs({ collectionId, ids, change }: CollectionMotifsChange) {
  return apiRequest(`/collections/${encodeURIComponent(collectionId)}/motifs`, {
    method: change === 'add' ? 'POST' : 'DELETE',
    body: { ids },
    schema: collectionMembersResponseSchema,
  });
}

export function useUpdateCollectionMotifs({
  mutationConfig,
}: { mutationConfig?: MutationConfig<typeof updateCollectionMotifs> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: updateCollectionMotifs,
    onSuccess: (...args) => {
      const refreshed = Promise.all([
        queryClient.invalidateQueries({ queryKey: collectionKeys.all }),
        queryClient.invalidateQueries({ queryKey: motifKeys.all }),
      ]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
