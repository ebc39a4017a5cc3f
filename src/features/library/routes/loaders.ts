import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { motifPageQueryOptions } from '../api/get-motif-page';
import { readLibraryQuery } from '@shared/library/library-address';

// The first page of results for the address's query, fetched alongside the page's code.
export const libraryLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const query = readLibraryQuery(new URL(request.url).searchParams);
    await queryClient.prefetchQuery(motifPageQueryOptions(query, 0));
    return null;
  };
