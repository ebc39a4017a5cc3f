import { queryOptions, useQuery } from '@tanstack/react-query';
import { tagsResponseSchema } from '@shared/contracts/collections';
import { apiRequest } from '../../../lib/api-client';
import { tagKeys } from './tag-keys';

export function getTags({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/tags', { schema: tagsResponseSchema, signal });
}

export const tagsQueryOptions = () => queryOptions({ queryKey: tagKeys.list(), queryFn: ({ signal }) => getTags({ signal }) });

export function useTags() {
  return useQuery(tagsQueryOptions());
}
