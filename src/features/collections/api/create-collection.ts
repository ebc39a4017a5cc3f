import { useMutation, useQueryClient } from '@tanstack/react-query';
import { collectionSummarySchema, type CreateCollectionRequest } from '@shared/contracts/collections';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { collectionKeys } from './collection-keys';

export function createCollection(data: CreateCollectionRequest) {
  return apiRequest('/collections', { method: 'POST', body: data, schema: collectionSummarySchema });
}

export function useCreateCollection({ mutationConfig }: { mutationConfig?: MutationConfig<typeof createCollection> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: createCollection,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: collectionKeys.all });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
