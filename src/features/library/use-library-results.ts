import { useQueries, useQueryClient } from '@tanstack/react-query';
import { useCallback, useMemo } from 'react';
import type { LibraryMotif, MotifListResponse } from '@shared/contracts/motifs';
import { motifPageQueryOptions } from './api/get-motif-page';
import { motifKeys } from '../motifs/api/motif-keys';
import { MOTIF_PAGE_SIZE, type LibraryQuery } from '@shared/library/library-address';

export type VisibleRange = { first: number; last: number };

// The pages a range of grid positions needs, always with the first page (it carries the
// total and the facets).
export function pagesFor(range: VisibleRange | null, pageSize = MOTIF_PAGE_SIZE): number[] {
  const pages = new Set([0]);
  if (range && range.last >= range.first) {
    for (let p = Math.floor(range.first / pageSize); p <= Math.floor(range.last / pageSize); p++) pages.add(p);
  }
  return [...pages].sort((a, b) => a - b);
}

export function useLibraryResults(query: LibraryQuery, range: VisibleRange | null) {
  const queryClient = useQueryClient();
  const pageIndices = pagesFor(range);
  const results = useQueries({
    queries: pageIndices.map((index) => motifPageQueryOptions(query, index)),
  });
  const first = results[0];
  const firstPage: MotifListResponse | undefined = first.data;
  const loadedKey = results.map((r) => (r.data ? r.dataUpdatedAt : 0)).join(',');

  // Any position, from whatever page is cached (also pages scrolled past earlier).
  const motifAt = useCallback(
    (index: number): LibraryMotif | undefined => {
      const pageIndex = Math.floor(index / MOTIF_PAGE_SIZE);
      const page =
        pageIndex === 0 ? firstPage : queryClient.getQueryData<MotifListResponse>(motifKeys.page(query, pageIndex));
      return page?.motifs[index % MOTIF_PAGE_SIZE];
    },
    // loadedKey is listed on purpose: a page arriving makes new positions readable.
    [queryClient, query, firstPage, loadedKey],
  );

  // Ids in grid order for Shift-click ranges and lassos, over every page loaded so far.
  const loadedIds = useCallback((): string[] => {
    const total = firstPage?.total ?? 0;
    const ids: string[] = [];
    for (let p = 0; p * MOTIF_PAGE_SIZE < total; p++) {
      const page = p === 0 ? firstPage : queryClient.getQueryData<MotifListResponse>(motifKeys.page(query, p));
      if (!page) continue;
      page.motifs.forEach((motif, i) => {
        ids[p * MOTIF_PAGE_SIZE + i] = motif.id;
      });
    }
    return ids.filter(Boolean);
  }, [firstPage, queryClient, query]);

  return useMemo(
    () => ({
      total: firstPage?.total ?? 0,
      facets: firstPage?.facets,
      isPending: first.isPending,
      isError: first.isError,
      error: first.error,
      isShowingPrevious: first.isPlaceholderData,
      refetch: first.refetch,
      motifAt,
      loadedIds,
    }),
    [firstPage, first.isPending, first.isError, first.error, first.isPlaceholderData, first.refetch, motifAt, loadedIds],
  );
}
