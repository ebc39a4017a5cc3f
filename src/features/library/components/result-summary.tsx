import type { ReactNode } from 'react';
import type { MotifFacets } from '@shared/contracts/motifs';
import type { LibraryQuery } from '@shared/library/library-address';
import { rightsWords } from '../rights-words';

type ResultSummaryProps = {
  query: LibraryQuery;
  total: number;
  loading: boolean;
  facets: MotifFacets | undefined;
  onChange: (change: Partial<LibraryQuery>) => void;
};

function Chip({ label, onRemove, children }: { label: string; onRemove: () => void; children: ReactNode }) {
  return (
    <li className="inline-flex items-center gap-1 rounded-full border border-sand bg-paper py-0.5 pr-0.5 pl-2.5 text-sm text-ink">
      {children}
      <button
        type="button"
        onClick={onRemove}
        aria-label={`Remove filter: ${label}`}
        className="inline-flex size-6 items-center justify-center rounded-full text-ink-soft hover:bg-sand/70 hover:text-ink"
      >
        <svg viewBox="0 0 16 16" className="size-3" aria-hidden="true" focusable="false">
          <path d="M4 4l8 8M12 4l-8 8" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
        </svg>
      </button>
    </li>
  );
}

// How many motifs answer, and each active filter as a chip that removes it.
export function ResultSummary({ query, total, loading, facets, onChange }: ResultSummaryProps) {
  const words = query.q.trim();
  const collectionName = facets?.collections.find((c) => c.id === query.collectionId)?.name ?? 'a collection';
  const originalName = facets?.originals.find((o) => o.id === query.originalId)?.name ?? 'one original';
  return (
    <div className="flex min-w-0 flex-wrap items-center gap-2">
      <p className="font-semibold text-ink" role="status" aria-live="polite" aria-atomic="true">
        {loading ? 'Searching…' : `${total.toLocaleString()} ${total === 1 ? 'motif' : 'motifs'}`}
        {!loading && words && <span className="font-normal text-ink-soft"> for “{words}”</span>}
      </p>
      <ul className="flex flex-wrap gap-1.5" aria-label="Active filters">
        {query.colour && (
          <Chip label={`colour ${query.colour}`} onRemove={() => onChange({ colour: null })}>
            <span className="size-3.5 rounded-full border border-ink/20" style={{ backgroundColor: query.colour }} aria-hidden="true" />
            <span className="font-mono">{query.colour}</span>
          </Chip>
        )}
        {query.tags.map((tag) => (
          <Chip key={tag} label={`tag ${tag}`} onRemove={() => onChange({ tags: query.tags.filter((t) => t !== tag) })}>
            <span className="break-all">Tag: {tag}</span>
          </Chip>
        ))}
        {query.collectionId && (
          <Chip label="collection" onRemove={() => onChange({ collectionId: null })}>
            <span className="break-all">In {collectionName}</span>
          </Chip>
        )}
        {query.originalId && (
          <Chip label="original" onRemove={() => onChange({ originalId: null })}>
            <span className="break-all">From {originalName}</span>
          </Chip>
        )}
        {query.rights.map((status) => (
          <Chip key={status} label={rightsWords[status].label} onRemove={() => onChange({ rights: query.rights.filter((r) => r !== status) })}>
            {rightsWords[status].label}
          </Chip>
        ))}
        {query.usage !== 'any' && (
          <Chip label="usage" onRemove={() => onChange({ usage: 'any' })}>
            {query.usage === 'used' ? 'Used in products' : 'Not used yet'}
          </Chip>
        )}
        {query.hiddenInOriginal !== null && (
          <Chip label="hidden in the original" onRemove={() => onChange({ hiddenInOriginal: null })}>
            {query.hiddenInOriginal ? 'Hidden in the original' : 'Shown in the original'}
          </Chip>
        )}
        {query.archived !== 'exclude' && (
          <Chip label="archived" onRemove={() => onChange({ archived: 'exclude' })}>
            {query.archived === 'only' ? 'Only archived' : 'With archived'}
          </Chip>
        )}
      </ul>
    </div>
  );
}
