import type { QueryClient } from '@tanstack/react-query';
import { membersQueryOptions } from '../api/get-members';
import { studioQueryOptions } from '../api/get-studio';

// Loaders start the page's data in parallel with its code; the page reads the same
// queryOptions and shows its own loading and error states, so a failure here is not fatal.
export const membersLoader = (queryClient: QueryClient) => async () => {
  await queryClient.prefetchQuery(membersQueryOptions());
  return null;
};

export const settingsLoader = (queryClient: QueryClient) => async () => {
  await queryClient.prefetchQuery(studioQueryOptions());
  return null;
};
