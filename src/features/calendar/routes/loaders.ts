import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { addDays, isCalendarDay, monthStart, todayUtc } from '@shared/calendar/calendar-days';
import { calendarQueryOptions } from '../api/get-calendar';

// Starts the month or timeline the address asks for (see CalendarPage) while the page's code loads.
export const calendarLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  const params = new URL(request.url).searchParams;
  const asked = `${params.get('month') ?? ''}-01`;
  const month = isCalendarDay(asked) ? asked : monthStart(todayUtc());
  const span = params.get('view') === 'timeline' ? 12 : 1;
  await queryClient.prefetchQuery(calendarQueryOptions(month, addDays(monthStart(month, span), -1)));
  return null;
};
