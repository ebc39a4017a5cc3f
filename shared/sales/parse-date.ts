import type { SalesDateFormat } from '../contracts/sales';

export type ParsedDay = { ok: true; day: string } | { ok: false; reason: string };

const monthNames = ['jan', 'feb', 'mar', 'apr', 'may', 'jun', 'jul', 'aug', 'sep', 'oct', 'nov', 'dec'];

function monthFromName(word: string): number | null {
  const i = monthNames.indexOf(word.slice(0, 3).toLowerCase());
  // "Sept" and full names are fine; "Marchx" is not
  return i >= 0 && /^[a-z]+\.?$/i.test(word) && word.length <= 10 ? i + 1 : null;
}

function daysInMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

function isoDay(year: number, month: number, day: number): ParsedDay {
  if (year < 1900 || year > 2200) return { ok: false, reason: `the year ${year} is out of range` };
  if (month < 1 || month > 12) return { ok: false, reason: `there is no month ${month}` };
  if (day < 1 || day > daysInMonth(year, month)) return { ok: false, reason: `there is no day ${day} in ${year}-${String(month).padStart(2, '0')}` };
  return { ok: true, day: `${year}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}` };
}

// A time of day after the date (" 14:03", "T14:03:22Z", " 2:03 PM") is dropped: sales count by the
// day as the shop wrote it, without moving it between time zones.
const timeTail = /(?:[T ]\d{1,2}:\d{2}(?::\d{2}(?:\.\d+)?)?\s*(?:[AaPp][Mm])?\s*(?:Z|[+-]\d{2}:?\d{2}|[A-Z]{2,5})?)$/;

/**
 * The sale's day, as yyyy-mm-dd. Numeric dates are read in the mapping's order (ymd, dmy or mdy)
 * with '-', '/' or '.' between parts; dates with a month name ("14 Mar 2026", "Mar 14, 2026")
 * are unambiguous and read in any order. Two-digit years are refused rather than guessed.
 */
export function parseSaleDay(raw: string, format: SalesDateFormat): ParsedDay {
  const text = raw.trim().replace(timeTail, '').trim();
  if (text === '') return { ok: false, reason: 'the date is empty' };

  const named = /^(\d{1,2})(?:st|nd|rd|th)?[ -]([A-Za-z]+\.?)[ -,]+(\d{2,4})$/.exec(text) ?? null;
  if (named) return fromParts(named[3], monthFromName(named[2]), named[1], raw);
  const namedFirst = /^([A-Za-z]+\.?) (\d{1,2})(?:st|nd|rd|th)?,? (\d{2,4})$/.exec(text);
  if (namedFirst) return fromParts(namedFirst[3], monthFromName(namedFirst[1]), namedFirst[2], raw);

  const iso = /^(\d{4})([-/.])(\d{1,2})\2(\d{1,2})$/.exec(text);
  if (iso) return isoDay(Number(iso[1]), Number(iso[3]), Number(iso[4]));

  const numeric = /^(\d{1,2})([-/.])(\d{1,2})\2(\d{2,4})$/.exec(text);
  if (numeric) {
    if (numeric[4].length !== 4) return { ok: false, reason: `"${raw.trim()}" has a two-digit year; export dates with four-digit years` };
    if (format === 'ymd') return { ok: false, reason: `"${raw.trim()}" is not in year-month-day order as the mapping says` };
    const [day, month] = format === 'dmy' ? [numeric[1], numeric[3]] : [numeric[3], numeric[1]];
    return isoDay(Number(numeric[4]), Number(month), Number(day));
  }
  return { ok: false, reason: `"${raw.trim().slice(0, 40)}" is not a date` };
}

function fromParts(year: string, month: number | null, day: string, raw: string): ParsedDay {
  if (month === null) return { ok: false, reason: `"${raw.trim().slice(0, 40)}" has no month we know` };
  if (year.length !== 4) return { ok: false, reason: `"${raw.trim()}" has a two-digit year; export dates with four-digit years` };
  return isoDay(Number(year), month, Number(day));
}

/**
 * What a column's values say about their order: 'ymd' when every date starts with the year,
 * 'dmy' or 'mdy' when some date could only be read one way (a first part over 12 is a day), or
 * null when the values fit both (every part ≤ 12) — then the user chooses.
 */
export function dateOrderEvidence(values: readonly string[]): SalesDateFormat | null {
  let ymd = 0;
  let dayFirst = false;
  let monthFirst = false;
  let numeric = 0;
  for (const value of values) {
    const text = value.trim().replace(timeTail, '').trim();
    if (/^\d{4}[-/.]\d{1,2}[-/.]\d{1,2}$/.test(text)) ymd++;
    const m = /^(\d{1,2})[-/.](\d{1,2})[-/.]\d{4}$/.exec(text);
    if (!m) continue;
    numeric++;
    if (Number(m[1]) > 12) dayFirst = true;
    if (Number(m[2]) > 12) monthFirst = true;
  }
  if (numeric === 0) return ymd > 0 ? 'ymd' : null;
  if (dayFirst !== monthFirst) return dayFirst ? 'dmy' : 'mdy';
  return null;
}
