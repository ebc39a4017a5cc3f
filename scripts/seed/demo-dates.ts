// The demo's calendar, worked out from today so the studio always looks current whenever the
// seed runs: Coastal Spring launches in about seven weeks, so its ready-by date (launch minus the
// studio's 8 weeks) has just passed and the mug still in sampling is flagged; Lantern Walk is the
// coming autumn, far enough off that its drafts are not late yet.

export const DAY_MS = 86_400_000;

export type DemoCalendar = {
  today: Date;
  coastalSpring: { seasonStart: string; seasonEnd: string; launchDate: string };
  lanternWalk: { seasonStart: string; seasonEnd: string; launchDate: string };
};

/** Midnight UTC of the day `d` falls on. */
export function startOfDayUtc(d: Date): Date {
  return new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate()));
}

export function addDays(d: Date, days: number): Date {
  return new Date(d.getTime() + days * DAY_MS);
}

export function isoDate(d: Date): string {
  return d.toISOString().slice(0, 10);
}

/** The first Monday on or after `d` (launches fall on a Monday in the demo). */
export function mondayOnOrAfter(d: Date): Date {
  const dow = d.getUTCDay(); // 0 Sunday … 6 Saturday
  return addDays(d, (8 - dow) % 7);
}

export function demoCalendar(now: Date = new Date()): DemoCalendar {
  const today = startOfDayUtc(now);
  // 7 weeks (+0–6 days to a Monday) ahead: ready-by = launch − 8 weeks falls 1–7 days ago.
  const springLaunch = mondayOnOrAfter(addDays(today, 49));
  // The first September at least 20 weeks away, so the autumn drafts are on time.
  let autumnYear = today.getUTCFullYear();
  while (Date.UTC(autumnYear, 8, 1) < addDays(today, 140).getTime()) autumnYear += 1;
  const autumnLaunch = mondayOnOrAfter(new Date(Date.UTC(autumnYear, 8, 1)));
  return {
    today,
    coastalSpring: { seasonStart: isoDate(springLaunch), seasonEnd: isoDate(addDays(springLaunch, 12 * 7)), launchDate: isoDate(springLaunch) },
    lanternWalk: { seasonStart: isoDate(new Date(Date.UTC(autumnYear, 8, 1))), seasonEnd: isoDate(new Date(Date.UTC(autumnYear, 10, 30))), launchDate: isoDate(autumnLaunch) },
  };
}

/** A moment `days` before today at a working hour, so timelines read like a studio's week. */
export function daysAgo(cal: DemoCalendar, days: number, hour = 10, minute = 0): Date {
  const d = addDays(cal.today, -days);
  d.setUTCHours(hour, minute, 0, 0);
  return d;
}
