import { queryOptions, useQuery } from '@tanstack/react-query';
import { collectionsListSchema } from '@shared/contracts/collections';
import { apiRequest } from '../../../lib/api-client';
import { collectionKeys } from './collection-keys';

export function getCollections({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/collections', { schema: collectionsListSchema, signal });
}

export const collectionsQueryOptions = () =>
  queryOptions({ queryKey: collectionKeys.lists(), queryFn: ({ signal }) => getCollections({ signal }) });

export function useCollections() {
  return useQuery(collectionsQueryOptions());
}
