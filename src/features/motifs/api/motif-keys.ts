import type { LibraryQuery } from '@shared/library/library-address';

// Everything under 'motifs' belongs to the current studio. Library pages sit under the list of
// their query, so changing one motif can refresh every grid with one invalidation of `lists()`.
export const motifKeys = {
  all: ['motifs'] as const,
  lists: () => [...motifKeys.all, 'list'] as const,
  list: (query: LibraryQuery) => [...motifKeys.lists(), query] as const,
  page: (query: LibraryQuery, pageIndex: number) => [...motifKeys.list(query), pageIndex] as const,
  details: () => [...motifKeys.all, 'detail'] as const,
  detail: (id: string) => [...motifKeys.details(), id] as const,
  versions: (id: string) => [...motifKeys.detail(id), 'versions'] as const,
  looksLike: (id: string) => [...motifKeys.detail(id), 'looks-like'] as const,
};
