import { Link } from 'react-router-dom';
import type { CalendarCollection } from '@shared/contracts/calendar';
import { productStages } from '@shared/contracts/products';
import { stageLabels } from '../../products/components/stage-labels';
import { formatCalendarDay } from './calendar-words';
import { FlagBadge } from './flag-badge';

// One collection's dates in words, then its products grouped by stage, each with its flag.
export function CollectionProducts({ collection }: { collection: CalendarCollection }) {
  const stages = productStages.filter((s) => collection.products.some((p) => p.stage === s));
  const headingId = `collection-${collection.id}`;
  return (
    <section aria-labelledby={headingId} className="rounded-lg border border-sand bg-paper p-4">
      <h3 id={headingId} className="text-lg font-semibold text-ink">
        {collection.name}
      </h3>
      <p className="text-sm text-ink-soft">
        {collection.seasonStart && collection.seasonEnd
          ? `Season ${formatCalendarDay(collection.seasonStart)} – ${formatCalendarDay(collection.seasonEnd)}. `
          : 'No season window. '}
        {collection.launchDate ? `Launch ${formatCalendarDay(collection.launchDate)}. ` : 'No launch date yet. '}
        {collection.readyBy && `Ready by ${formatCalendarDay(collection.readyBy)}.`}
      </p>
      {(collection.lateCount > 0 || collection.atRiskCount > 0) && (
        <p className="mt-1 text-sm font-semibold text-ink">
          {[collection.lateCount > 0 && `${collection.lateCount} late`, collection.atRiskCount > 0 && `${collection.atRiskCount} at risk`].filter(Boolean).join(', ')}
        </p>
      )}
      {stages.length === 0 ? (
        <p className="mt-3 text-sm text-ink-soft">No products in this collection yet. Choose the collection on a product’s page.</p>
      ) : (
        <dl className="mt-3 grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
          {stages.map((stage) => (
            <div key={stage}>
              <dt className="text-sm font-semibold text-ink-soft">{stageLabels[stage]}</dt>
              {collection.products
                .filter((p) => p.stage === stage)
                .map((p) => (
                  <dd key={p.id} className="mt-1 flex flex-wrap items-center gap-2">
                    <Link to={`/products/${p.id}`} className="font-semibold text-tide-deep underline-offset-2 hover:underline">
                      {p.name}
                    </Link>
                    {p.flag !== 'ready' && p.flag !== 'retired' && <FlagBadge product={p} />}
                  </dd>
                ))}
            </div>
          ))}
        </dl>
      )}
    </section>
  );
}
