import { Link } from 'react-router-dom';
import { Card } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { useCalendarFlags } from '../api/get-calendar-flags';
import { formatCalendarDay } from './calendar-words';
import { FlagBadge } from './flag-badge';

// The home page's short list: products that are late or at risk for their collection's launch.
export function NeedsAttentionCard() {
  const flags = useCalendarFlags();
  const description = flags.data
    ? `Products not ready ${flags.data.readyWeeksBeforeLaunch} weeks before their collection launches.`
    : 'Products not ready in time for their collection’s launch.';
  return (
    <Card title="Needs attention" description={description} actions={<Link to="/calendar" className="font-semibold text-tide-deep underline-offset-2 hover:underline">Season calendar</Link>}>
      {flags.isPending ? (
        <LoadingState label="Checking ready-by dates…" />
      ) : flags.isError ? (
        <ErrorState error={flags.error} title="Ready-by dates could not be checked" onRetry={() => void flags.refetch()} retrying={flags.isRefetching} />
      ) : flags.data.flags.length === 0 ? (
        <p className="text-ink-soft">Nothing is late or at risk. Every product with a launch date is on track.</p>
      ) : (
        <ul className="flex flex-col divide-y divide-sand">
          {flags.data.flags.map((f) => (
            <li key={f.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <div className="min-w-0">
                <Link to={`/products/${f.id}`} className="font-semibold text-tide-deep underline-offset-2 hover:underline">
                  {f.name}
                </Link>
                <p className="text-sm text-ink-soft">
                  {f.collectionName}: ready by {formatCalendarDay(f.readyBy)}, launch {formatCalendarDay(f.launchDate)}
                </p>
              </div>
              <FlagBadge product={f} />
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
