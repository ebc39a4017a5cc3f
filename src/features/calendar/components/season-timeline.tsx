import type { CalendarCollection } from '@shared/contracts/calendar';
import { daysBetween, monthStart } from '@shared/calendar/calendar-days';
import { formatCalendarDay, formatShortMonth } from './calendar-words';

type Props = { from: string; months: number; today: string; collections: readonly CalendarCollection[] };

// Collections as bars across the months of their season window, with the ready-by date and the
// launch marked on the bar's line. Positions are shares of the span's days.
export function SeasonTimeline({ from, months, today, collections }: Props) {
  const end = monthStart(from, months);
  const span = daysBetween(from, end);
  const share = (day: string) => Math.min(100, Math.max(0, (daysBetween(from, day) / span) * 100));
  const monthStarts = Array.from({ length: months }, (_, i) => monthStart(from, i));
  const inSpan = (day: string | null) => day !== null && day >= from && day < end;

  return (
    <div className="overflow-x-auto">
      <div className="min-w-[48rem]">
        <div className="ml-48 border-b border-sand text-xs text-ink-soft" aria-hidden="true">
          <div className="relative h-7">
            {monthStarts.map((m) => (
              <div key={m} className="absolute inset-y-0 border-l border-sand/70 pl-1" style={{ left: `${share(m)}%` }}>
                {formatShortMonth(m)}
                {m.slice(5, 7) === '01' && ` ${m.slice(0, 4)}`}
              </div>
            ))}
          </div>
        </div>
        <ul className="flex flex-col">
          {collections.map((c) => {
            const start = c.seasonStart ?? c.launchDate ?? c.readyBy;
            const stop = c.seasonEnd ?? c.launchDate ?? start;
            const behind = [c.lateCount > 0 && `${c.lateCount} late`, c.atRiskCount > 0 && `${c.atRiskCount} at risk`].filter(Boolean).join(', ');
            return (
              <li key={c.id} className="flex items-center border-b border-sand/60 py-2">
                <div className="w-48 shrink-0 pr-3">
                  <span className="block font-semibold text-ink">{c.name}</span>
                  {behind && <span className="block text-xs font-semibold text-rust">{behind}</span>}
                  <span className="sr-only">
                    {c.seasonStart && c.seasonEnd ? `Season ${formatCalendarDay(c.seasonStart)} to ${formatCalendarDay(c.seasonEnd)}. ` : ''}
                    {c.launchDate ? `Launch ${formatCalendarDay(c.launchDate)}. ` : ''}
                    {c.readyBy ? `Ready by ${formatCalendarDay(c.readyBy)}.` : ''}
                  </span>
                </div>
                <div className="relative h-10 flex-1" aria-hidden="true">
                  {monthStarts.map((m) => (
                    <div key={m} className="absolute inset-y-0 border-l border-sand/50" style={{ left: `${share(m)}%` }} />
                  ))}
                  {inSpan(today) && <div className="absolute inset-y-0 border-l-2 border-dashed border-tide" style={{ left: `${share(today)}%` }} title="Today" />}
                  {start && stop && stop >= from && start < end && (
                    <div
                      className="absolute top-3 h-4 rounded bg-tide/25 ring-1 ring-tide/50"
                      style={{ left: `${share(start)}%`, width: `${Math.max(0.6, share(stop) - share(start))}%` }}
                      title={c.seasonStart && c.seasonEnd ? `Season ${formatCalendarDay(c.seasonStart)} – ${formatCalendarDay(c.seasonEnd)}` : undefined}
                    />
                  )}
                  {inSpan(c.readyBy) && (
                    <div className="absolute top-0 -translate-x-1/2 text-xs font-semibold whitespace-nowrap text-ink" style={{ left: `${share(c.readyBy!)}%` }} title={`Ready by ${formatCalendarDay(c.readyBy!)}`}>
                      ⚑ ready by
                    </div>
                  )}
                  {inSpan(c.launchDate) && (
                    <div className="absolute bottom-0 -translate-x-1/2 text-xs font-semibold whitespace-nowrap text-ink" style={{ left: `${share(c.launchDate!)}%` }} title={`Launch ${formatCalendarDay(c.launchDate!)}`}>
                      ◆ launch
                    </div>
                  )}
                </div>
              </li>
            );
          })}
        </ul>
      </div>
    </div>
  );
}
