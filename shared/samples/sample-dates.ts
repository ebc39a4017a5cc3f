// Calendar dates of a sample order, as ISO 8601 `YYYY-MM-DD` strings (no time zone: a day).

export type SampleDates = { orderedOn: string; expectedOn: string | null; receivedOn: string | null };
export type DateProblem = { code: 'sample.received_before_ordered' | 'sample.expected_before_ordered'; field: 'receivedOn' | 'expectedOn'; message: string };

export function isCalendarDate(text: string): boolean {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  if (!match) return false;
  const [y, m, d] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const date = new Date(Date.UTC(y, m - 1, d));
  return date.getUTCFullYear() === y && date.getUTCMonth() === m - 1 && date.getUTCDate() === d && y >= 2000 && y <= 2100;
}

// ISO dates compare as strings.
export function checkSampleDates(dates: SampleDates): DateProblem | null {
  if (dates.receivedOn && dates.receivedOn < dates.orderedOn) {
    return { code: 'sample.received_before_ordered', field: 'receivedOn', message: `The sample cannot arrive (${dates.receivedOn}) before it was ordered (${dates.orderedOn}).` };
  }
  if (dates.expectedOn && dates.expectedOn < dates.orderedOn) {
    return { code: 'sample.expected_before_ordered', field: 'expectedOn', message: `The expected date (${dates.expectedOn}) is before the order date (${dates.orderedOn}).` };
  }
  return null;
}
