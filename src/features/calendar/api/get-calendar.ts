import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { calendarResponseSchema } from '@shared/contracts/calendar';
import { apiRequest } from '../../../lib/api-client';
import { calendarKeys } from './calendar-keys';

export function getCalendar({ from, to, signal }: { from: string; to: string; signal?: AbortSignal }) {
  const query = new URLSearchParams({ from, to });
  return apiRequest(`/calendar?${query}`, { schema: calendarResponseSchema, signal });
}

export const calendarQueryOptions = (from: string, to: string) =>
  queryOptions({
    queryKey: calendarKeys.span(from, to),
    queryFn: ({ signal }) => getCalendar({ from, to, signal }),
    // stages move on other pages; a visit here always asks again (showing the last answer meanwhile)
    staleTime: 0,
  });

export function useCalendar(from: string, to: string) {
  // the last month stays on screen while the next one loads
  return useQuery({ ...calendarQueryOptions(from, to), placeholderData: keepPreviousData });
}
