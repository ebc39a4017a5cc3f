import { queryOptions, useQuery } from '@tanstack/react-query';
import { calendarFlagsResponseSchema } from '@shared/contracts/calendar';
import { apiRequest } from '../../../lib/api-client';
import { calendarKeys } from './calendar-keys';

export function getCalendarFlags({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/calendar/flags', { schema: calendarFlagsResponseSchema, signal });
}

export const calendarFlagsQueryOptions = () =>
  queryOptions({
    queryKey: calendarKeys.flags(),
    queryFn: ({ signal }) => getCalendarFlags({ signal }),
    // a product moved to ready on its page must drop off the home page's list at once
    staleTime: 0,
  });

export function useCalendarFlags() {
  return useQuery(calendarFlagsQueryOptions());
}
