import { useCallback, useEffect, useRef, useState } from 'react';
import { can } from '@shared/auth/permissions';
import { motifSortSchema, type MotifSort } from '@shared/contracts/motifs';
import { Button, ButtonLink } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { Select } from '../../../components/ui/select-field';
import { LoadingState } from '../../../components/ui/spinner';
import { useSession } from '../../auth/components/session';
import { BulkBar } from '../components/bulk-bar';
import { LibraryFilters } from '../components/library-filters';
import { MotifGrid } from '../components/motif-grid';
import { ResultSummary } from '../components/result-summary';
import { SearchBox } from '../components/search-box';
import { emptyLibraryQuery, isFiltered, writeLibraryQuery } from '@shared/library/library-address';
import { applyClick, emptySelection, hasSelection, lassoSelect, selectAllOfFilter, type ClickKind, type Selection } from '../selection';
import { useLibraryQuery } from '../use-library-query';
import { useLibraryResults, type VisibleRange } from '../use-library-results';

const sortLabels = (searching: boolean): Record<MotifSort, string> => ({
  best: searching ? 'Best match' : 'Newest first',
  newest: 'Newest first',
  name: 'Name, A to Z',
  most_used: 'Most used',
});

export function LibraryPage() {
  const me = useSession();
  const canEdit = can(me.role, 'motifs.edit');
  const { query, setQuery } = useLibraryQuery();
  const [range, setRange] = useState<VisibleRange | null>(null);
  const results = useLibraryResults(query, range);
  const [selection, setSelection] = useState<Selection>(emptySelection);
  const [filtersOpen, setFiltersOpen] = useState(false);
  const lassoBase = useRef<Selection>(emptySelection);

  // A selection belongs to the results it was made in.
  const queryKey = writeLibraryQuery({ ...query, sort: 'best' }).toString();
  useEffect(() => setSelection(emptySelection), [queryKey]);

  const onVisibleRange = useCallback((next: VisibleRange) => setRange((r) => (r && r.first === next.first && r.last === next.last ? r : next)), []);
  const { loadedIds } = results;
  const onSelect = useCallback((id: string, kind: ClickKind) => setSelection((s) => applyClick(s, loadedIds(), id, kind)), [loadedIds]);
  const onSearch = useCallback((q: string) => setQuery({ q }), [setQuery]);
  const onPickColour = useCallback((colour: string) => setQuery({ colour }), [setQuery]);

  const searching = Boolean(query.q.trim() || query.colour);
  const filtered = isFiltered(query);
  const activeFilters = [...writeLibraryQuery({ ...query, q: '', sort: 'best' }).keys()].length;
  const selecting = hasSelection(selection);

  return (
    <>
      <PageHeader
        title="Library"
        description="Every motif cut from your originals: find it, see where it is used, and whether you may use it."
        actions={canEdit && <ButtonLink to="/originals" variant="secondary">Add an original</ButtonLink>}
      />
      <div className="flex flex-col gap-6 lg:flex-row lg:items-start">
        <aside aria-label="Filters" className="lg:sticky lg:top-4 lg:w-72 lg:shrink-0">
          <Button
            variant="secondary"
            className="w-full lg:hidden"
            aria-expanded={filtersOpen}
            aria-controls="library-filters"
            onClick={() => setFiltersOpen((o) => !o)}
          >
            {filtersOpen ? 'Hide filters' : `Show filters${activeFilters ? ` (${activeFilters} on)` : ''}`}
          </Button>
          <div
            id="library-filters"
            className={`${filtersOpen ? 'mt-4 block' : 'hidden'} rounded-lg border border-sand bg-paper p-5 shadow-paper lg:mt-0 lg:block lg:max-h-[calc(100vh-2rem)] lg:overflow-y-auto`}
          >
            <LibraryFilters query={query} facets={results.facets} onChange={setQuery} />
          </div>
        </aside>
        <div className="flex min-w-0 flex-1 flex-col gap-4">
          <SearchBox value={query.q} onSearch={onSearch} />
          <div className="flex flex-wrap items-center justify-between gap-3">
            {!results.isError && (
              <ResultSummary query={query} total={results.total} loading={results.isPending || results.isShowingPrevious} facets={results.facets} onChange={setQuery} />
            )}
            <label className="flex items-center gap-2 text-sm font-semibold text-ink">
              Order
              <Select
                value={query.sort}
                onChange={(event) => setQuery({ sort: motifSortSchema.catch('best').parse(event.target.value) })}
                options={Object.entries(sortLabels(searching))
                  .filter(([value]) => searching || value !== 'newest')
                  .map(([value, label]) => ({ value, label }))}
                className="border-sand py-1.5"
              />
            </label>
          </div>
          {results.isPending ? (
            <LoadingState label="Loading motifs…" />
          ) : results.isError ? (
            <ErrorState error={results.error} title="The library could not be loaded" onRetry={() => void results.refetch()} />
          ) : results.total === 0 ? (
            <EmptyState
              title={filtered ? 'No motif matches' : 'The library is empty'}
              action={
                filtered ? (
                  <Button variant="secondary" size="sm" onClick={() => setQuery({ ...emptyLibraryQuery, sort: query.sort })}>
                    Clear the search and filters
                  </Button>
                ) : (
                  canEdit && <ButtonLink to="/originals" size="sm">Upload an original</ButtonLink>
                )
              }
            >
              {filtered
                ? 'Try fewer words, another spelling, or fewer filters. Archived motifs are left out unless the Archived filter asks for them.'
                : 'Motifs appear here once an original is imported.'}
            </EmptyState>
          ) : (
            <>
              {canEdit && !selecting && (
                <p className="text-sm text-ink-soft">
                  To select: Ctrl- or ⌘-click, Shift-click for a range, drag a box around motifs, or press Space on a focused motif.
                </p>
              )}
              <MotifGrid
                label={`Motifs, ${results.total}`}
                total={results.total}
                motifAt={results.motifAt}
                onVisibleRange={onVisibleRange}
                selectable={canEdit}
                selection={selection}
                selecting={selecting}
                onSelect={onSelect}
                onLassoStart={() => {
                  lassoBase.current = selection;
                }}
                onLasso={(inside, additive) => setSelection(lassoSelect(lassoBase.current, loadedIds(), inside, additive))}
                onSelectAll={() => setSelection(selectAllOfFilter())}
                onClearSelection={() => setSelection(emptySelection)}
                onPickColour={onPickColour}
                dimmed={results.isShowingPrevious}
              />
            </>
          )}
          {canEdit && selecting && (
            <BulkBar
              selection={selection}
              total={results.total}
              query={query}
              onSelectAll={() => setSelection(selectAllOfFilter())}
              onClear={() => setSelection(emptySelection)}
            />
          )}
        </div>
      </div>
    </>
  );
}
