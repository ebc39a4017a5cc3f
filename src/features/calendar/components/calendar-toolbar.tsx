import { Button } from '../../../components/ui/button';
import { classNames } from '../../../components/ui/class-names';

export type CalendarView = 'month' | 'timeline';

const views: { value: CalendarView; label: string }[] = [
  { value: 'month', label: 'Month' },
  { value: 'timeline', label: 'Timeline' },
];

type Props = {
  view: CalendarView;
  title: string;
  onView: (v: CalendarView) => void;
  onStep: (months: number) => void;
  onToday: () => void;
};

export function CalendarToolbar({ view, title, onView, onStep, onToday }: Props) {
  const step = view === 'month' ? 'month' : 'months';
  return (
    <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
      <div className="flex items-center gap-2">
        <Button variant="secondary" size="sm" onClick={() => onStep(-1)} aria-keyshortcuts="PageUp" aria-label={`Previous ${step === 'month' ? 'month' : 'month of the timeline'}`}>
          <span aria-hidden="true">←</span> Previous
        </Button>
        <Button variant="secondary" size="sm" onClick={onToday}>
          This month
        </Button>
        <Button variant="secondary" size="sm" onClick={() => onStep(1)} aria-keyshortcuts="PageDown" aria-label={`Next ${step === 'month' ? 'month' : 'month of the timeline'}`}>
          Next <span aria-hidden="true">→</span>
        </Button>
        <h2 className="ml-2 text-xl font-semibold text-ink" aria-live="polite">
          {title}
        </h2>
      </div>
      <div role="group" aria-label="Show the calendar as" className="inline-flex rounded-md border border-sand bg-paper p-0.5">
        {views.map((v) => (
          <button
            key={v.value}
            type="button"
            aria-pressed={view === v.value}
            aria-keyshortcuts="V"
            onClick={() => onView(v.value)}
            className={classNames('min-h-9 rounded px-3 text-sm font-semibold', view === v.value ? 'bg-tide text-paper' : 'text-ink hover:bg-sand/60')}
          >
            {v.label}
          </button>
        ))}
      </div>
    </div>
  );
}
