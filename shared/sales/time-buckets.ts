import type { SalesGranularity } from '../contracts/sales';

const DAY_MS = 86_400_000;
const toMs = (day: string) => Date.parse(`${day}T00:00:00Z`);
const toDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);

export const daysBetween = (from: string, to: string) => Math.round((toMs(to) - toMs(from)) / DAY_MS);
export const addDays = (day: string, n: number) => toDay(toMs(day) + n * DAY_MS);

/** Days for up to about two months, ISO weeks up to about a year and a half, months beyond. */
export function granularityFor(from: string, to: string): SalesGranularity {
  const span = daysBetween(from, to) + 1;
  if (span <= 62) return 'day';
  if (span <= 550) return 'week';
  return 'month';
}

/** The first day of the bucket holding `day`: itself, its week's Monday, or the 1st of its month. */
export function bucketStart(day: string, granularity: SalesGranularity): string {
  if (granularity === 'day') return day;
  if (granularity === 'month') return `${day.slice(0, 7)}-01`;
  const weekday = (new Date(toMs(day)).getUTCDay() + 6) % 7;
  return addDays(day, -weekday);
}

function nextBucket(start: string, granularity: SalesGranularity): string {
  if (granularity === 'day') return addDays(start, 1);
  if (granularity === 'week') return addDays(start, 7);
  const d = new Date(toMs(start));
  return toDay(Date.UTC(d.getUTCFullYear(), d.getUTCMonth() + 1, 1));
}

export type DayTotal = { day: string; units: number; revenueMinor: number };
export type SeriesPoint = { start: string; units: number; revenueMinor: number };

/** Every bucket from `from` to `to`, empty ones as zeros, so a chart's gaps are real gaps in sales. */
export function salesSeries(days: readonly DayTotal[], from: string, to: string, granularity: SalesGranularity): SeriesPoint[] {
  const points = new Map<string, SeriesPoint>();
  for (let start = bucketStart(from, granularity); start <= to; start = nextBucket(start, granularity)) {
    points.set(start, { start, units: 0, revenueMinor: 0 });
  }
  for (const d of days) {
    const point = points.get(bucketStart(d.day, granularity));
    if (!point) continue;
    point.units += d.units;
    point.revenueMinor += d.revenueMinor;
  }
  return [...points.values()];
}
