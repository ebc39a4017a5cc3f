import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs, ShouldRevalidateFunctionArgs } from 'react-router-dom';
import { motifPageQueryOptions } from '../api/get-motif-page';
import { readLibraryQuery } from '../library-query';

// The first page of results for the address's query, fetched alongside the page's code.
export const libraryLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const query = readLibraryQuery(new URL(request.url).searchParams);
    await queryClient.prefetchQuery(motifPageQueryOptions(query, 0));
    return null;
  };

// Typing a search or ticking a filter changes only the address's query; the page fetches
// those results itself (keeping the previous ones on screen), so the loader need not run.
export const libraryShouldRevalidate = ({ currentUrl, nextUrl, defaultShouldRevalidate }: ShouldRevalidateFunctionArgs) =>
  currentUrl.pathname === nextUrl.pathname ? false : defaultShouldRevalidate;
