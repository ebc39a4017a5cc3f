import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { originalQueryOptions } from '../api/get-original';
import { originalsQueryOptions } from '../api/get-originals';

// Loaders start the page's data in parallel with its code; the page shows its own loading and
// error states from the same queryOptions, so a failure here is not fatal.
export const originalsLoader = (queryClient: QueryClient) => async () => {
  await queryClient.prefetchQuery(originalsQueryOptions());
  return null;
};

export const originalLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    if (params.originalId) await queryClient.prefetchQuery(originalQueryOptions(params.originalId));
    return null;
  };
