// Calendar days as ISO strings ("2028-02-29"), counted in whole UTC days so a time zone or a
// clock change can never move a date by one.

export type CalendarDay = string;

const DAY_MS = 86_400_000;
const dayPattern = /^(\d{4})-(\d{2})-(\d{2})$/;

export function isCalendarDay(value: string): value is CalendarDay {
  const m = dayPattern.exec(value);
  if (!m) return false;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const date = new Date(Date.UTC(y, mo - 1, d));
  return date.getUTCFullYear() === y && date.getUTCMonth() === mo - 1 && date.getUTCDate() === d;
}

/** Whole days since 1970-01-01. */
export function dayNumber(day: CalendarDay): number {
  if (!isCalendarDay(day)) throw new RangeError(`Not a calendar day: ${day}`);
  const [y, mo, d] = day.split('-').map(Number);
  return Date.UTC(y, mo - 1, d) / DAY_MS;
}

export function fromDayNumber(n: number): CalendarDay {
  return new Date(n * DAY_MS).toISOString().slice(0, 10);
}

export function addDays(day: CalendarDay, days: number): CalendarDay {
  return fromDayNumber(dayNumber(day) + days);
}

export function daysBetween(from: CalendarDay, to: CalendarDay): number {
  return dayNumber(to) - dayNumber(from);
}

/** Today's date in UTC, the server's and the tests' one notion of "today". */
export function todayUtc(now: Date = new Date()): CalendarDay {
  return now.toISOString().slice(0, 10);
}

/** The first day of the month `day` falls in, moved by `months` (negative for earlier). */
export function monthStart(day: CalendarDay, months = 0): CalendarDay {
  const [y, mo] = day.split('-').map(Number);
  return new Date(Date.UTC(y, mo - 1 + months, 1)).toISOString().slice(0, 10);
}

export function daysInMonth(day: CalendarDay): number {
  return daysBetween(monthStart(day), monthStart(day, 1));
}

/** 0 = Monday … 6 = Sunday (ISO 8601 weekday order). */
export function isoWeekday(day: CalendarDay): number {
  // 1970-01-01 was a Thursday (ISO weekday index 3)
  return (((dayNumber(day) + 3) % 7) + 7) % 7;
}
