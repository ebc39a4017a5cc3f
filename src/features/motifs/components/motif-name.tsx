import { useState } from 'react';
import type { MotifDetail } from '@shared/contracts/motifs';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { useUpdateMotif } from '../api/update-motif';

// Renaming in place; the name shown elsewhere (grids, products) follows after saving.
export function RenameMotif({ motif }: { motif: MotifDetail }) {
  const [editing, setEditing] = useState(false);
  const [name, setName] = useState(motif.name);
  const update = useUpdateMotif({ mutationConfig: { onSuccess: () => setEditing(false) } });
  if (!editing) {
    return (
      <Button
        size="sm"
        variant="secondary"
        onClick={() => {
          setName(motif.name);
          update.reset();
          setEditing(true);
        }}
      >
        Rename…
      </Button>
    );
  }
  const problem = update.error?.fields?.name ?? (update.isError ? update.error.message : undefined) ?? (name.trim() === '' ? 'A motif needs a name' : undefined);
  return (
    <form
      className="flex w-full flex-wrap items-end gap-2"
      onSubmit={(event) => {
        event.preventDefault();
        if (name.trim()) update.mutate({ id: motif.id, changes: { name: name.trim() } });
      }}
    >
      <div className="min-w-64 flex-1">
        <TextField label="New name" name="name" value={name} maxLength={200} autoFocus onChange={(e) => setName(e.target.value)} error={problem} />
      </div>
      <Button type="submit" size="md" busy={update.isPending} busyLabel="Saving…" disabled={name.trim() === ''}>
        Save name
      </Button>
      <Button variant="quiet" onClick={() => setEditing(false)}>
        Cancel
      </Button>
    </form>
  );
}
