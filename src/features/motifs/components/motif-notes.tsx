import { useEffect, useId, useState } from 'react';
import type { MotifDetail } from '@shared/contracts/motifs';
import { Button } from '../../../components/ui/button';
import { controlClasses } from '../../../components/ui/field-parts';
import { StatusMessage } from '../../../components/ui/status-message';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useUpdateMotif } from '../api/update-motif';

export function MotifNotes({ motif, canEdit }: { motif: MotifDetail; canEdit: boolean }) {
  const id = useId();
  const [notes, setNotes] = useState(motif.notes);
  const [saved, setSaved] = useState(false);
  const update = useUpdateMotif({ mutationConfig: { onSuccess: () => setSaved(true) } });
  useEffect(() => setNotes(motif.notes), [motif.notes]);

  if (!canEdit) {
    return motif.notes ? <p className="whitespace-pre-wrap text-ink">{motif.notes}</p> : <p className="text-ink-soft">No notes.</p>;
  }
  const changed = notes !== motif.notes;
  return (
    <div className="flex flex-col gap-2">
      <label htmlFor={id} className="sr-only">
        Notes
      </label>
      <textarea
        id={id}
        value={notes}
        maxLength={5000}
        rows={4}
        placeholder="Where it came from, what it suits, what to watch out for"
        onChange={(event) => {
          setSaved(false);
          setNotes(event.target.value);
        }}
        className={`${controlClasses} border-sand`}
      />
      <div className="flex items-center gap-2">
        <Button size="sm" disabled={!changed} busy={update.isPending} busyLabel="Saving…" onClick={() => update.mutate({ id: motif.id, changes: { notes } })}>
          Save notes
        </Button>
        {saved && !changed && <span role="status" className="text-sm text-ink-soft">Notes saved.</span>}
      </div>
      {update.isError && <StatusMessage tone="problem">{errorMessageOf(update.error)}</StatusMessage>}
    </div>
  );
}
