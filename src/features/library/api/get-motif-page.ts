import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { motifListResponseSchema } from '@shared/contracts/motifs';
import { apiRequest } from '../../../lib/api-client';
import { motifKeys } from '../../motifs/api/motif-keys';
import { motifListSearch, type LibraryQuery } from '../library-query';

// A page of the library grid. The grid asks for the pages its visible rows need, so scrolling
// (or dragging the scrollbar) to the middle of 10,000 motifs fetches that page alone.
export const MOTIF_PAGE_SIZE = 120;

export function getMotifPage({ query, pageIndex, signal }: { query: LibraryQuery; pageIndex: number; signal?: AbortSignal }) {
  const search = motifListSearch(query, pageIndex * MOTIF_PAGE_SIZE, MOTIF_PAGE_SIZE);
  return apiRequest(`/motifs?${search}`, { schema: motifListResponseSchema, signal });
}

export const motifPageQueryOptions = (query: LibraryQuery, pageIndex: number) =>
  queryOptions({
    queryKey: motifKeys.page(query, pageIndex),
    queryFn: ({ signal }) => getMotifPage({ query, pageIndex, signal }),
    // While a new search loads, the previous results stay on screen (dimmed) instead of a blank grid.
    placeholderData: pageIndex === 0 ? keepPreviousData : undefined,
  });
