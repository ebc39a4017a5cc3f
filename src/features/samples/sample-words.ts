import type { Sample, SampleVerdictValue } from '@shared/contracts/samples';
import { formatCost } from '@shared/samples/money';
import type { BadgeTone } from '../../components/ui/badge';

export const verdictWords: Record<SampleVerdictValue, { label: string; tone: BadgeTone }> = {
  pending: { label: 'Awaiting verdict', tone: 'neutral' },
  approved: { label: 'Approved', tone: 'kelp' },
  changes_needed: { label: 'Changes needed', tone: 'rust' },
};

// Calendar days carry no time zone: format them as the same day everywhere.
const dayFormat = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });

export function formatCalendarDay(isoDay: string): string {
  const date = new Date(`${isoDay}T00:00:00Z`);
  return Number.isNaN(date.getTime()) ? isoDay : dayFormat.format(date);
}

export function sampleCostText(sample: Pick<Sample, 'costMinor' | 'currency'>): string | null {
  if (sample.costMinor === null || !sample.currency) return null;
  try {
    return formatCost(sample.costMinor, sample.currency);
  } catch {
    return `${sample.costMinor} ${sample.currency} (minor units)`;
  }
}

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} KB`;
  const mb = bytes / 1024 / 1024;
  return `${Number.isInteger(mb) ? mb : mb.toFixed(1)} MB`;
}

// Today as a calendar day in the person's own time zone, for the form's default.
export function todayIso(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}
