import { Link } from 'react-router-dom';
import type { ActivityEvent } from '@shared/contracts/activity';
import { Badge } from '../../../components/ui/badge';
import { activityKindLabels, activityLink } from '../activity-words';

const timeFormat = new Intl.DateTimeFormat(undefined, { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

export function ActivityList({ events }: { events: readonly ActivityEvent[] }) {
  return (
    <ol className="flex flex-col divide-y divide-sand">
      {events.map((event) => {
        const link = activityLink(event);
        return (
          <li key={event.id} className="flex flex-col gap-1 py-3 sm:flex-row sm:items-baseline sm:gap-4">
            <time dateTime={event.createdAt} className="shrink-0 text-sm text-ink-soft sm:w-52">{timeFormat.format(new Date(event.createdAt))}</time>
            <p className="min-w-0 flex-1 break-words text-ink">
              <span className="font-semibold">{event.actor?.name ?? 'Someone'}</span>{' '}
              {link ? <Link to={link} className="text-tide-deep underline-offset-2 hover:underline">{event.summary}</Link> : event.summary}
            </p>
            <Badge className="self-start">{activityKindLabels[event.kind]}</Badge>
          </li>
        );
      })}
    </ol>
  );
}
