import { useState } from 'react';
import type { BulkAction, BulkMotifsResponse } from '@shared/contracts/motifs';
import { Button } from '../../../components/ui/button';
import { StatusMessage } from '../../../components/ui/status-message';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useBulkEditMotifs } from '../api/bulk-edit-motifs';
import { toMotifFilter, type LibraryQuery } from '@shared/library/library-address';
import { selectedCount, type Selection } from '../selection';
import { BulkCollectionDialog, BulkRightsDialog, BulkTagsDialog } from './bulk-dialogs';

type BulkBarProps = {
  selection: Selection;
  total: number;
  query: LibraryQuery;
  onSelectAll: () => void;
  onClear: () => void;
};

type Open = 'tag' | 'untag' | 'collection' | 'rights' | null;

const motifs = (n: number) => (n === 1 ? '1 motif' : `${n.toLocaleString()} motifs`);

// What was done, in words: "matched" motifs were selected, "changed" ones actually differed.
export function describeBulkResult(action: BulkAction, result: BulkMotifsResponse): string {
  const same = result.matched - result.changed;
  const tail = same > 0 ? ` (${motifs(same)} already ${action.type === 'untag' ? 'lacked it' : 'had it'})` : '';
  switch (action.type) {
    case 'tag':
      return `Tagged ${motifs(result.changed)} with ${action.tags.map((t) => `“${t}”`).join(', ')}${tail}.`;
    case 'untag':
      return `Removed ${action.tags.map((t) => `“${t}”`).join(', ')} from ${motifs(result.changed)}${tail}.`;
    case 'add-to-collection':
      return `Added ${motifs(result.changed)} to the collection${same > 0 ? ` (${motifs(same)} were in it already)` : ''}.`;
    case 'remove-from-collection':
      return `Took ${motifs(result.changed)} out of the collection.`;
    case 'set-rights':
      return `Updated the rights of ${motifs(result.changed)}.`;
    case 'archive':
      return `Archived ${motifs(result.changed)}. They stay in products that use them; the Archived filter finds them.`;
    case 'unarchive':
      return `Brought back ${motifs(result.changed)} to the library.`;
  }
}

export function BulkBar({ selection, total, query, onSelectAll, onClear }: BulkBarProps) {
  const [open, setOpen] = useState<Open>(null);
  const [done, setDone] = useState<string | null>(null);
  const bulk = useBulkEditMotifs();
  const count = selectedCount(selection, total);

  const run = (action: BulkAction) => {
    setDone(null);
    const target = selection.all ? { filter: toMotifFilter(query) } : { ids: [...selection.ids] };
    return bulk.mutateAsync({ ...target, action }).then((result) => {
      setOpen(null);
      setDone(describeBulkResult(action, result));
      if (action.type === 'archive' || action.type === 'unarchive') onClear();
    });
  };

  const showingArchived = query.archived === 'only';
  return (
    <div className="sticky bottom-0 z-20 -mx-2 mt-4 flex flex-col gap-2 rounded-t-lg border border-b-0 border-tide/40 bg-paper px-4 py-3 shadow-lifted">
      {done && <StatusMessage tone="ok">{done}</StatusMessage>}
      {bulk.isError && !open && <StatusMessage tone="problem">{errorMessageOf(bulk.error)}</StatusMessage>}
      <div className="flex flex-wrap items-center gap-2">
        <p className="mr-2 font-semibold text-ink" aria-live="polite">
          {selection.all ? `All ${motifs(total)} of this search selected` : `${motifs(count)} selected`}
        </p>
        <Button size="sm" variant="secondary" onClick={() => setOpen('tag')}>
          Add tags…
        </Button>
        <Button size="sm" variant="secondary" onClick={() => setOpen('untag')}>
          Remove tags…
        </Button>
        <Button size="sm" variant="secondary" onClick={() => setOpen('collection')}>
          Add to collection…
        </Button>
        <Button size="sm" variant="secondary" onClick={() => setOpen('rights')}>
          Set rights…
        </Button>
        <Button
          size="sm"
          variant="secondary"
          busy={bulk.isPending && !open}
          busyLabel="Working…"
          onClick={() => void run({ type: showingArchived ? 'unarchive' : 'archive' }).catch(() => undefined)}
        >
          {showingArchived ? 'Bring back' : 'Archive'}
        </Button>
        <span className="ml-auto flex flex-wrap gap-2">
          {!selection.all && count < total && (
            <Button size="sm" variant="quiet" onClick={onSelectAll}>
              Select all {total.toLocaleString()}
            </Button>
          )}
          <Button size="sm" variant="quiet" onClick={onClear}>
            Clear selection
          </Button>
        </span>
      </div>
      <BulkTagsDialog mode={open === 'untag' ? 'untag' : 'tag'} open={open === 'tag' || open === 'untag'} count={count} bulk={bulk} onRun={run} onClose={() => setOpen(null)} />
      <BulkCollectionDialog open={open === 'collection'} count={count} bulk={bulk} onRun={run} onClose={() => setOpen(null)} />
      <BulkRightsDialog open={open === 'rights'} count={count} bulk={bulk} onRun={run} onClose={() => setOpen(null)} />
    </div>
  );
}
