import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { MotifDetail } from '@shared/contracts/motifs';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select-field';
import { StatusMessage } from '../../../components/ui/status-message';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useCollections } from '../../collections/api/get-collections';
import { useUpdateCollectionMotifs } from '../../collections/api/update-collection-motifs';
import { emptyLibraryQuery, writeLibraryQuery } from '@shared/library/library-address';

export function MotifCollections({ motif, canEdit }: { motif: MotifDetail; canEdit: boolean }) {
  const collections = useCollections();
  const change = useUpdateCollectionMotifs();
  const [chosen, setChosen] = useState('');
  const open = (collections.data?.collections ?? []).filter((c) => !motif.collections.some((m) => m.id === c.id));

  return (
    <div className="flex flex-col gap-3">
      {motif.collections.length === 0 ? (
        <p className="text-ink-soft">Not in any collection.</p>
      ) : (
        <ul className="flex flex-wrap gap-2">
          {motif.collections.map((collection) => (
            <li key={collection.id} className="inline-flex items-center gap-1 rounded-full border border-sand bg-shell py-0.5 pr-1 pl-3">
              <Link
                to={`/library?${writeLibraryQuery({ ...emptyLibraryQuery, collectionId: collection.id }).toString()}`}
                className="break-words text-tide-deep underline"
              >
                {collection.name}
              </Link>
              {canEdit && (
                <Button
                  size="sm"
                  variant="quiet"
                  className="min-h-7 px-2"
                  aria-label={`Take out of ${collection.name}`}
                  onClick={() => change.mutate({ collectionId: collection.id, ids: [motif.id], change: 'remove' })}
                >
                  ×
                </Button>
              )}
            </li>
          ))}
        </ul>
      )}
      {canEdit && open.length > 0 && (
        <div className="flex flex-wrap items-center gap-2">
          <Select
            aria-label="Collection to add it to"
            value={chosen}
            onChange={(event) => setChosen(event.target.value)}
            options={[{ value: '', label: 'Add to a collection…' }, ...open.map((c) => ({ value: c.id, label: c.name }))]}
            className="border-sand py-1.5"
          />
          <Button
            size="sm"
            variant="secondary"
            disabled={!chosen}
            busy={change.isPending}
            busyLabel="Adding…"
            onClick={() => change.mutate({ collectionId: chosen, ids: [motif.id], change: 'add' }, { onSuccess: () => setChosen('') })}
          >
            Add
          </Button>
        </div>
      )}
      {change.isError && <StatusMessage tone="problem">{errorMessageOf(change.error)}</StatusMessage>}
    </div>
  );
}
