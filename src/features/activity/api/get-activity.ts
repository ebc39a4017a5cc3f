import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { activityPageSchema } from '@shared/contracts/activity';
import { apiRequest } from '../../../lib/api-client';
import { activityKeys, type ActivityFilters } from './activity-keys';

export function getActivity({ filters, before, signal }: { filters: ActivityFilters; before?: string | null; signal?: AbortSignal }) {
  const params = new URLSearchParams();
  if (filters.actor) params.set('actor', filters.actor);
  if (filters.kind) params.set('kind', filters.kind);
  if (before) params.set('before', before);
  const query = params.toString();
  return apiRequest(`/activity${query ? `?${query}` : ''}`, { schema: activityPageSchema, signal });
}

// Pages go back in time: each asks for what came before the last one's oldest event.
export const activityQueryOptions = (filters: ActivityFilters) =>
  infiniteQueryOptions({
    queryKey: activityKeys.list(filters),
    queryFn: ({ pageParam, signal }) => getActivity({ filters, before: pageParam, signal }),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextBefore,
  });

export function useActivity(filters: ActivityFilters) {
  return useInfiniteQuery(activityQueryOptions(filters));
}
