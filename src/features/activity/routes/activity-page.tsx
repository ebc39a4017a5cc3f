import { useSearchParams } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { LoadingState } from '../../../components/ui/spinner';
import { useMembers } from '../../studio/api/get-members';
import type { ActivityFilters as Filters } from '../api/activity-keys';
import { useActivity } from '../api/get-activity';
import { ActivityFilters, filtersFromSearch } from '../components/activity-filters';
import { ActivityList } from '../components/activity-list';

// What happened in the studio, newest first; the filters live in the address so a view can be shared.
export function ActivityPage() {
  const [params, setParams] = useSearchParams();
  const filters = filtersFromSearch(params);
  const feed = useActivity(filters);
  const members = useMembers();
  const people = (members.data?.members ?? []).map((m) => ({ id: m.userId, name: m.name }));
  const events = feed.data?.pages.flatMap((p) => p.events) ?? [];

  const change = (next: Filters) => {
    const search = new URLSearchParams();
    if (next.actor) search.set('actor', next.actor);
    if (next.kind) search.set('kind', next.kind);
    setParams(search, { replace: true });
  };

  return (
    <>
      <PageHeader title="Activity" description="Imports, new products, stage moves, samples, reviews and comments, newest first." />
      <Card>
        <ActivityFilters filters={filters} people={people} onChange={change} />
        <div className="mt-5" aria-live="polite">
          {feed.isPending ? <LoadingState label="Loading the activity…" /> : feed.isError ? (
            <ErrorState error={feed.error} onRetry={() => void feed.refetch()} />
          ) : events.length === 0 ? (
            <EmptyState title={filters.actor || filters.kind ? 'Nothing matches these filters' : 'Nothing has happened yet'}>
              {filters.actor || filters.kind ? 'Choose “Everyone” or “Everything” to see more.' : 'Imports, products and reviews will be listed here as the studio works.'}
            </EmptyState>
          ) : (
            <>
              <ActivityList events={events} />
              {feed.hasNextPage && (
                <Button variant="secondary" className="mt-4" busy={feed.isFetchingNextPage} busyLabel="Loading…" onClick={() => void feed.fetchNextPage()}>
                  Load more
                </Button>
              )}
              {feed.isFetchNextPageError && <p role="alert" className="mt-2 text-sm font-semibold text-rust">Older events could not be loaded. Try again.</p>}
            </>
          )}
        </div>
      </Card>
    </>
  );
}
