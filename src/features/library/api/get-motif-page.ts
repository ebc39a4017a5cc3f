import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { motifListResponseSchema } from '@shared/contracts/motifs';
import { apiRequest } from '../../../lib/api-client';
import { motifKeys } from '../../motifs/api/motif-keys';
import { motifPageSearch, type LibraryQuery } from '@shared/library/library-address';

export function getMotifPage({ query, pageIndex, signal }: { query: LibraryQuery; pageIndex: number; signal?: AbortSignal }) {
  return apiRequest(`/motifs?${motifPageSearch(query, pageIndex)}`, { schema: motifListResponseSchema, signal });
}

export const motifPageQueryOptions = (query: LibraryQuery, pageIndex: number) =>
  queryOptions({
    queryKey: motifKeys.page(query, pageIndex),
    queryFn: ({ signal }) => getMotifPage({ query, pageIndex, signal }),
    // While a new search loads, the previous results stay on screen (dimmed) instead of a blank grid.
    placeholderData: pageIndex === 0 ? keepPreviousData : undefined,
  });
