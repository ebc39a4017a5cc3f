import { useCallback, useEffect } from 'react';
import { useSearchParams } from 'react-router-dom';
import { addDays, isCalendarDay, monthStart, todayUtc } from '@shared/calendar/calendar-days';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { LoadingState } from '../../../components/ui/spinner';
import { useCalendar } from '../api/get-calendar';
import { CalendarToolbar, type CalendarView } from '../components/calendar-toolbar';
import { formatMonth } from '../components/calendar-words';
import { CollectionProducts } from '../components/collection-products';
import { MonthGrid } from '../components/month-grid';
import { SeasonTimeline } from '../components/season-timeline';

const TIMELINE_MONTHS = 12;

// ?view=month|timeline&month=2027-03 keeps the place on reload and in links.
function useCalendarPlace() {
  const [params, setParams] = useSearchParams();
  const view: CalendarView = params.get('view') === 'timeline' ? 'timeline' : 'month';
  const asked = `${params.get('month') ?? ''}-01`;
  const month = isCalendarDay(asked) ? asked : monthStart(todayUtc());
  const go = useCallback(
    (next: { view?: CalendarView; month?: string }) =>
      setParams((p) => {
        const out = new URLSearchParams(p);
        if (next.view) out.set('view', next.view);
        if (next.month) out.set('month', next.month.slice(0, 7));
        return out;
      }, { replace: true }),
    [setParams],
  );
  return { view, month, go };
}

export function CalendarPage() {
  const { view, month, go } = useCalendarPlace();
  const span = view === 'month' ? 1 : TIMELINE_MONTHS;
  const from = month;
  const to = addDays(monthStart(month, span), -1);
  const calendar = useCalendar(from, to);

  // PageUp/PageDown step a month, V switches the view (not while typing in a field).
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const typing = e.target instanceof Element && e.target.closest('input, textarea, select, [contenteditable="true"]');
      if (e.altKey || e.ctrlKey || e.metaKey || typing) return;
      if (e.key === 'PageUp' || e.key === 'PageDown') {
        e.preventDefault();
        go({ month: monthStart(month, e.key === 'PageUp' ? -1 : 1) });
      } else if (e.key === 'v' || e.key === 'V') {
        go({ view: view === 'month' ? 'timeline' : 'month' });
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [go, month, view]);

  const title = view === 'month' ? formatMonth(month) : `${formatMonth(month)} – ${formatMonth(monthStart(month, span - 1))}`;
  const header = (
    <PageHeader
      title="Season calendar"
      description="Collections by season, their launch and ready-by dates, and the products that are late. Page Up and Page Down move a month; V switches between month and timeline."
    />
  );

  if (calendar.isPending) {
    return (
      <>
        {header}
        <LoadingState label="Loading the calendar…" />
      </>
    );
  }
  if (calendar.isError) {
    return (
      <>
        {header}
        <ErrorState error={calendar.error} title="The calendar could not be loaded" onRetry={() => void calendar.refetch()} retrying={calendar.isRefetching} />
      </>
    );
  }

  const data = calendar.data;
  return (
    <>
      {header}
      <CalendarToolbar view={view} title={title} onView={(v) => go({ view: v })} onStep={(n) => go({ month: monthStart(month, n) })} onToday={() => go({ month: monthStart(data.today) })} />
      <p className="mb-4 text-sm text-ink-soft">
        Products should be ready {data.readyWeeksBeforeLaunch} weeks before their collection launches (a studio setting); they are at risk in the {data.atRiskDays} days before that date.
      </p>
      <div aria-busy={calendar.isPlaceholderData || undefined} className={calendar.isPlaceholderData ? 'opacity-70' : undefined}>
        {view === 'month' ? (
          <MonthGrid month={month} today={data.today} collections={data.collections} />
        ) : data.collections.length > 0 ? (
          <SeasonTimeline from={month} months={span} today={data.today} collections={data.collections} />
        ) : null}
      </div>
      <section aria-labelledby="calendar-collections" className="mt-8">
        <h2 id="calendar-collections" className="mb-3 text-lg font-semibold">
          Collections in this {view === 'month' ? 'month' : 'span'}
        </h2>
        {data.collections.length === 0 ? (
          <EmptyState title="No collection has dates here">
            Give a collection a season window and a launch date, and put products in it, to see them on the calendar.
          </EmptyState>
        ) : (
          <div className="flex flex-col gap-4">
            {data.collections.map((c) => (
              <CollectionProducts key={c.id} collection={c} />
            ))}
          </div>
        )}
        {data.undated.length > 0 && (
          <p className="mt-4 text-sm text-ink-soft">
            Without dates (not on the calendar): {data.undated.map((c) => c.name).join(', ')}.
          </p>
        )}
      </section>
    </>
  );
}
