import { describe, expect, it } from 'vitest';
import { addDays, daysBetween, daysInMonth, isCalendarDay, isoWeekday, monthStart, todayUtc } from './calendar-days';
import { readyByDate, readyByVerdict, readyFlagWords, type ReadyByInput } from './ready-by';

// Dates below were counted by hand on a paper calendar.
describe('calendar days', () => {
  it('counts back across a leap day: 56 days before 25 April 2028 is 29 February', () => {
    expect(addDays('2028-04-25', -56)).toBe('2028-02-29');
    expect(addDays('2028-02-28', 1)).toBe('2028-02-29');
    expect(addDays('2027-02-28', 1)).toBe('2027-03-01');
  });

  it('crosses month and year boundaries', () => {
    expect(addDays('2027-01-15', -21)).toBe('2026-12-25');
    expect(addDays('2026-10-31', 1)).toBe('2026-11-01');
    expect(daysBetween('2026-12-25', '2027-01-15')).toBe(21);
  });

  it('ignores clock changes: the last Sunday of March is still one day after Saturday', () => {
    expect(addDays('2026-03-28', 1)).toBe('2026-03-29');
    expect(daysBetween('2026-03-01', '2026-04-01')).toBe(31);
  });

  it('knows real dates from look-alikes', () => {
    expect(isCalendarDay('2028-02-29')).toBe(true);
    expect(isCalendarDay('2027-02-29')).toBe(false);
    expect(isCalendarDay('2026-13-01')).toBe(false);
    expect(isCalendarDay('2026-1-01')).toBe(false);
  });

  it('finds month starts, lengths and weekdays', () => {
    expect(monthStart('2028-02-17')).toBe('2028-02-01');
    expect(monthStart('2026-12-02', 1)).toBe('2027-01-01');
    expect(monthStart('2026-01-31', -1)).toBe('2025-12-01');
    expect(daysInMonth('2028-02-10')).toBe(29);
    expect(daysInMonth('2027-02-10')).toBe(28);
    // 2 December 2026 is a Wednesday (ISO index 2), 1 January 2028 a Saturday (5)
    expect(isoWeekday('2026-12-02')).toBe(2);
    expect(isoWeekday('2028-01-01')).toBe(5);
  });

  it('takes today in UTC, not in the local zone', () => {
    expect(todayUtc(new Date('2026-12-31T23:30:00-02:00'))).toBe('2027-01-01');
  });
});

describe('the ready-by date', () => {
  it('is launch minus the studio\'s weeks', () => {
    expect(readyByDate('2028-04-25', 8)).toBe('2028-02-29');
    expect(readyByDate('2027-04-26', 8)).toBe('2027-03-01');
    expect(readyByDate('2027-01-15', 3)).toBe('2026-12-25');
    expect(readyByDate('2027-01-15', 0)).toBe('2027-01-15');
  });
});

describe('flagging a product', () => {
  const base: ReadyByInput = { launchDate: '2028-04-25', readyWeeksBeforeLaunch: 8, today: '2028-01-01', stage: 'sampling' };

  it('is late on the ready-by day itself and after it', () => {
    expect(readyByVerdict({ ...base, today: '2028-02-29' })).toEqual({ readyBy: '2028-02-29', flag: 'late', daysUntilReadyBy: 0 });
    expect(readyByVerdict({ ...base, today: '2028-03-02' })).toMatchObject({ flag: 'late', daysUntilReadyBy: -2 });
    // still late after the launch has passed
    expect(readyByVerdict({ ...base, today: '2028-05-01' }).flag).toBe('late');
  });

  it('is at risk in the two weeks before the ready-by date, on track before that', () => {
    expect(readyByVerdict({ ...base, today: '2028-02-28' })).toMatchObject({ flag: 'at_risk', daysUntilReadyBy: 1 });
    expect(readyByVerdict({ ...base, today: '2028-02-15' })).toMatchObject({ flag: 'at_risk', daysUntilReadyBy: 14 });
    expect(readyByVerdict({ ...base, today: '2028-02-14' })).toMatchObject({ flag: 'on_track', daysUntilReadyBy: 15 });
  });

  it('never flags ready, listed or retired products', () => {
    const late = { ...base, today: '2028-03-10' };
    expect(readyByVerdict({ ...late, stage: 'ready' }).flag).toBe('ready');
    expect(readyByVerdict({ ...late, stage: 'listed' }).flag).toBe('ready');
    expect(readyByVerdict({ ...late, stage: 'retired' }).flag).toBe('retired');
    expect(readyByVerdict({ ...late, stage: 'idea' }).flag).toBe('late');
  });

  it('moves with the studio setting', () => {
    const today = '2028-03-10';
    expect(readyByVerdict({ ...base, today, readyWeeksBeforeLaunch: 8 }).flag).toBe('late');
    // 4 weeks: ready by 28 March, 18 days away
    expect(readyByVerdict({ ...base, today, readyWeeksBeforeLaunch: 4 })).toMatchObject({ readyBy: '2028-03-28', flag: 'on_track', daysUntilReadyBy: 18 });
  });

  it('has nothing to measure without a launch date', () => {
    expect(readyByVerdict({ ...base, launchDate: null })).toEqual({ readyBy: null, flag: 'no_launch_date', daysUntilReadyBy: null });
  });

  it('says the flag in words', () => {
    expect(readyFlagWords({ flag: 'late', daysUntilReadyBy: -3 })).toBe('Late: 3 days past its ready-by date');
    expect(readyFlagWords({ flag: 'late', daysUntilReadyBy: 0 })).toBe('Late: due ready today');
    expect(readyFlagWords({ flag: 'at_risk', daysUntilReadyBy: 1 })).toBe('At risk: 1 day to its ready-by date');
  });
});
