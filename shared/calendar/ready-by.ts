import { addDays, daysBetween, type CalendarDay } from './calendar-days';

export type CalendarStage = 'idea' | 'drafting' | 'proofing' | 'sampling' | 'ready' | 'listed' | 'retired';

// 8 weeks before launch: common practice for a small shop's seasonal range (from memory).
export const DEFAULT_READY_WEEKS_BEFORE_LAUNCH = 8;
// Two weeks' warning before the ready-by date: our own rule of thumb, long enough to order a sample.
export const AT_RISK_DAYS = 14;

/**
 * - late: not ready yet and today is on or after the ready-by date
 * - at_risk: not ready yet and the ready-by date is at most AT_RISK_DAYS away
 * - on_track: not ready yet, with more time than that
 * - ready: ready or listed; retired: out of the range; no_launch_date: nothing to measure against
 */
export type ReadyFlag = 'late' | 'at_risk' | 'on_track' | 'ready' | 'retired' | 'no_launch_date';

export type ReadyByInput = {
  launchDate: CalendarDay | null;
  readyWeeksBeforeLaunch: number;
  today: CalendarDay;
  stage: CalendarStage;
};

export type ReadyByVerdict = {
  readyBy: CalendarDay | null;
  flag: ReadyFlag;
  // negative once the ready-by date has passed; null without a launch date
  daysUntilReadyBy: number | null;
};

export function readyByDate(launchDate: CalendarDay, readyWeeksBeforeLaunch: number): CalendarDay {
  return addDays(launchDate, -7 * readyWeeksBeforeLaunch);
}

export const isReadyStage = (stage: CalendarStage) => stage === 'ready' || stage === 'listed';

export function readyByVerdict({ launchDate, readyWeeksBeforeLaunch, today, stage }: ReadyByInput): ReadyByVerdict {
  if (!launchDate) return { readyBy: null, flag: stage === 'retired' ? 'retired' : isReadyStage(stage) ? 'ready' : 'no_launch_date', daysUntilReadyBy: null };
  const readyBy = readyByDate(launchDate, readyWeeksBeforeLaunch);
  const daysUntilReadyBy = daysBetween(today, readyBy);
  const flag: ReadyFlag =
    stage === 'retired' ? 'retired'
    : isReadyStage(stage) ? 'ready'
    : daysUntilReadyBy <= 0 ? 'late'
    : daysUntilReadyBy <= AT_RISK_DAYS ? 'at_risk'
    : 'on_track';
  return { readyBy, flag, daysUntilReadyBy };
}

export const needsAttention = (flag: ReadyFlag) => flag === 'late' || flag === 'at_risk';

/** Words for a flag, so a screen never relies on colour alone. */
export function readyFlagWords(verdict: Pick<ReadyByVerdict, 'flag' | 'daysUntilReadyBy'>): string {
  const d = verdict.daysUntilReadyBy;
  switch (verdict.flag) {
    case 'late':
      return d === 0 ? 'Late: due ready today' : `Late: ${-(d ?? 0)} ${Math.abs(d ?? 0) === 1 ? 'day' : 'days'} past its ready-by date`;
    case 'at_risk':
      return `At risk: ${d} ${d === 1 ? 'day' : 'days'} to its ready-by date`;
    case 'on_track':
      return 'On track';
    case 'ready':
      return 'Ready';
    case 'retired':
      return 'Retired';
    case 'no_launch_date':
      return 'No launch date';
  }
}
