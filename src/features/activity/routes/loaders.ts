import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { membersQueryOptions } from '../../studio/api/get-members';
import { activityQueryOptions } from '../api/get-activity';
import { filtersFromSearch } from '../components/activity-filters';

// The first page of the feed (with the filters in the address) and the people to filter by.
export const activityLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  const filters = filtersFromSearch(new URL(request.url).searchParams);
  await Promise.all([queryClient.prefetchInfiniteQuery(activityQueryOptions(filters)), queryClient.prefetchQuery(membersQueryOptions())]);
  return null;
};
