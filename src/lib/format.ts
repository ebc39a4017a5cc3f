const dayFormat = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', year: 'numeric' });

const calendarDayFormat = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const bareDate = /^\d{4}-\d{2}-\d{2}$/;

// A bare calendar date ("2027-03-01", a launch or an order date) names that day wherever the
// reader is; a full timestamp is shown as the reader's local day.
export function formatDay(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return bareDate.test(iso) ? calendarDayFormat.format(date) : dayFormat.format(date);
}

export function firstName(fullName: string): string {
  return fullName.trim().split(/\s+/)[0] || fullName;
}

export function initialsOf(fullName: string): string {
  const parts = fullName.trim().split(/\s+/).filter(Boolean);
  const letters = parts.length > 1 ? [parts[0], parts[parts.length - 1]] : parts;
  return letters.map((part) => Array.from(part)[0]?.toUpperCase() ?? '').join('') || '?';
}
