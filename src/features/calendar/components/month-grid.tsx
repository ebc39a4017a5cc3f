import type { CalendarCollection } from '@shared/contracts/calendar';
import { addDays, daysInMonth, isoWeekday } from '@shared/calendar/calendar-days';
import { classNames } from '../../../components/ui/class-names';
import { formatCalendarDay, formatMonth } from './calendar-words';

type DayEvent = { key: string; label: string; kind: 'launch' | 'ready-by' | 'season' };

const weekdays = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];
const eventMarks: Record<DayEvent['kind'], string> = { launch: '◆', 'ready-by': '⚑', season: '│' };

function eventsByDay(collections: readonly CalendarCollection[]): Map<string, DayEvent[]> {
  const byDay = new Map<string, DayEvent[]>();
  const add = (day: string | null, e: DayEvent) => day && byDay.set(day, [...(byDay.get(day) ?? []), e]);
  for (const c of collections) {
    const behind = c.lateCount > 0 ? ` (${c.lateCount} late)` : c.atRiskCount > 0 ? ` (${c.atRiskCount} at risk)` : '';
    add(c.readyBy, { key: `${c.id}-ready`, label: `Ready by: ${c.name}${behind}`, kind: 'ready-by' });
    add(c.launchDate, { key: `${c.id}-launch`, label: `Launch: ${c.name}`, kind: 'launch' });
    add(c.seasonStart, { key: `${c.id}-start`, label: `Season starts: ${c.name}`, kind: 'season' });
    add(c.seasonEnd, { key: `${c.id}-end`, label: `Season ends: ${c.name}`, kind: 'season' });
  }
  return byDay;
}

// A month as weeks from Monday; each day lists what happens on it in words.
export function MonthGrid({ month, today, collections }: { month: string; today: string; collections: readonly CalendarCollection[] }) {
  const events = eventsByDay(collections);
  const lead = isoWeekday(month);
  const length = daysInMonth(month);
  const cells: (string | null)[] = [...Array.from({ length: lead }, () => null), ...Array.from({ length }, (_, i) => addDays(month, i))];
  while (cells.length % 7 !== 0) cells.push(null);
  const weeks = Array.from({ length: cells.length / 7 }, (_, w) => cells.slice(w * 7, w * 7 + 7));

  return (
    <table className="w-full table-fixed border-collapse text-sm">
      <caption className="sr-only">{formatMonth(month)}: launches, ready-by dates and season starts and ends</caption>
      <thead>
        <tr>
          {weekdays.map((d) => (
            <th key={d} scope="col" className="border-b border-sand py-2 text-left font-semibold text-ink-soft">
              {d}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {weeks.map((week, w) => (
          <tr key={w}>
            {week.map((day, i) => {
              const list = day ? (events.get(day) ?? []) : [];
              return (
                <td
                  key={day ?? `blank-${w}-${i}`}
                  className={classNames('h-24 border border-sand/70 p-1 align-top', day === today && 'bg-tide/10', !day && 'bg-shell/60')}
                >
                  {day && (
                    <>
                      <span className={classNames('block text-xs', day === today ? 'font-bold text-tide-deep' : 'text-ink-soft')}>
                        <span aria-hidden="true">{Number(day.slice(8))}</span>
                        <span className="sr-only">{formatCalendarDay(day)}</span>
                        {day === today && <span className="ml-1">today</span>}
                      </span>
                      {list.length > 0 && (
                        <ul className="mt-1 flex flex-col gap-0.5">
                          {list.map((e) => (
                            <li
                              key={e.key}
                              className={classNames(
                                'rounded px-1 leading-snug break-words',
                                e.kind === 'launch' && 'bg-kelp/15 font-semibold text-ink',
                                e.kind === 'ready-by' && 'bg-ochre/15 font-semibold text-ink',
                                e.kind === 'season' && 'text-ink-soft',
                              )}
                            >
                              <span aria-hidden="true">{eventMarks[e.kind]} </span>
                              {e.label}
                            </li>
                          ))}
                        </ul>
                      )}
                    </>
                  )}
                </td>
              );
            })}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
