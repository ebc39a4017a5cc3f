import type { CalendarProduct } from '@shared/contracts/calendar';
import { readyFlagWords } from '@shared/calendar/ready-by';
import type { BadgeTone } from '../../../components/ui/badge';

// Calendar days are shown as the same day everywhere: formatted in UTC, never the browser's zone.
const dayFormat = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const shortDayFormat = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', timeZone: 'UTC' });
const monthFormat = new Intl.DateTimeFormat(undefined, { month: 'long', year: 'numeric', timeZone: 'UTC' });
const shortMonthFormat = new Intl.DateTimeFormat(undefined, { month: 'short', timeZone: 'UTC' });

const at = (day: string) => new Date(`${day}T00:00:00Z`);
export const formatCalendarDay = (day: string) => dayFormat.format(at(day));
export const formatShortDay = (day: string) => shortDayFormat.format(at(day));
export const formatMonth = (day: string) => monthFormat.format(at(day));
export const formatShortMonth = (day: string) => shortMonthFormat.format(at(day));

export const flagTones: Record<CalendarProduct['flag'], BadgeTone> = {
  late: 'rust',
  at_risk: 'ochre',
  on_track: 'tide',
  ready: 'kelp',
  retired: 'neutral',
  no_launch_date: 'neutral',
};

export const flagWords = (p: Pick<CalendarProduct, 'flag' | 'daysUntilReadyBy'>) => readyFlagWords(p);
