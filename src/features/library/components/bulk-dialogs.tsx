import { useState } from 'react';
import type { BulkAction, RightsStatusDto } from '@shared/contracts/motifs';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { RadioGroup } from '../../../components/ui/radio-group';
import { SelectField } from '../../../components/ui/select-field';
import { StatusMessage } from '../../../components/ui/status-message';
import { TextField } from '../../../components/ui/text-field';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useCollections } from '../../collections/api/get-collections';
import { useCreateCollection } from '../../collections/api/create-collection';
import type { useBulkEditMotifs } from '../api/bulk-edit-motifs';
import { useTags } from '../api/get-tags';
import { rightsOptions } from '../rights-words';
import { TagInput } from './tag-input';

type BulkDialogProps = {
  open: boolean;
  count: number;
  bulk: ReturnType<typeof useBulkEditMotifs>;
  onRun: (action: BulkAction) => Promise<void>;
  onClose: () => void;
};

const motifs = (n: number) => (n === 1 ? '1 motif' : `${n.toLocaleString()} motifs`);

function Problem({ bulk, extra }: { bulk: BulkDialogProps['bulk']; extra?: unknown }) {
  const error = extra ?? (bulk.isError ? bulk.error : null);
  return error ? <StatusMessage tone="problem">{errorMessageOf(error)}</StatusMessage> : null;
}

export function BulkTagsDialog({ mode, open, count, bulk, onRun, onClose }: BulkDialogProps & { mode: 'tag' | 'untag' }) {
  const [tags, setTags] = useState<string[]>([]);
  const allTags = useTags();
  const close = () => {
    setTags([]);
    bulk.reset();
    onClose();
  };
  const suggestions = (allTags.data?.tags ?? []).map((t) => ({ tag: t.tag, count: t.count }));
  return (
    <Dialog
      open={open}
      onClose={close}
      title={mode === 'tag' ? `Add tags to ${motifs(count)}` : `Remove tags from ${motifs(count)}`}
      actions={
        <>
          <Button variant="secondary" onClick={close}>
            Cancel
          </Button>
          <Button
            disabled={tags.length === 0}
            busy={bulk.isPending}
            busyLabel="Saving…"
            onClick={() => void onRun({ type: mode, tags }).then(() => setTags([]), () => undefined)}
          >
            {mode === 'tag' ? 'Add tags' : 'Remove tags'}
          </Button>
        </>
      }
    >
      <TagInput
        label="Tags"
        hint={mode === 'tag' ? 'Press Enter or a comma after each tag.' : 'Motifs without a tag stay as they are.'}
        tags={tags}
        onChange={setTags}
        suggestions={suggestions}
        allowNew={mode === 'tag'}
      />
      <Problem bulk={bulk} />
    </Dialog>
  );
}

export function BulkCollectionDialog({ open, count, bulk, onRun, onClose }: BulkDialogProps) {
  const collections = useCollections();
  const create = useCreateCollection();
  const [chosen, setChosen] = useState('');
  const [newName, setNewName] = useState('');
  const close = () => {
    setChosen('');
    setNewName('');
    bulk.reset();
    create.reset();
    onClose();
  };
  const list = collections.data?.collections ?? [];
  const makingNew = chosen === 'new' || list.length === 0;
  const submit = async () => {
    const collectionId = makingNew ? (await create.mutateAsync({ name: newName })).id : chosen;
    await onRun({ type: 'add-to-collection', collectionId });
    setChosen('');
    setNewName('');
  };
  return (
    <Dialog
      open={open}
      onClose={close}
      title={`Add ${motifs(count)} to a collection`}
      description="Collections group motifs and products for a season or a launch."
      actions={
        <>
          <Button variant="secondary" onClick={close}>
            Cancel
          </Button>
          <Button
            disabled={makingNew ? newName.trim() === '' : chosen === ''}
            busy={bulk.isPending || create.isPending}
            busyLabel="Saving…"
            onClick={() => void submit().catch(() => undefined)}
          >
            Add to collection
          </Button>
        </>
      }
    >
      {list.length > 0 && (
        <SelectField
          label="Collection"
          name="collection"
          value={chosen}
          onChange={(event) => setChosen(event.target.value)}
          options={[
            { value: '', label: 'Choose a collection' },
            ...list.map((c) => ({ value: c.id, label: `${c.name} (${c.motifCount})` })),
            { value: 'new', label: 'A new collection…' },
          ]}
        />
      )}
      {makingNew && (
        <TextField
          label="Name of the new collection"
          name="newCollection"
          value={newName}
          maxLength={120}
          placeholder="Coastal Spring"
          onChange={(event) => setNewName(event.target.value)}
          error={create.error?.fields?.name}
        />
      )}
      <Problem bulk={bulk} extra={create.isError && !create.error.fields?.name ? create.error : undefined} />
    </Dialog>
  );
}

type Attribution = 'keep' | 'required' | 'not_required';

export function BulkRightsDialog({ open, count, bulk, onRun, onClose }: BulkDialogProps) {
  const [status, setStatus] = useState<RightsStatusDto | ''>('');
  const [source, setSource] = useState('');
  const [licence, setLicence] = useState('');
  const [attribution, setAttribution] = useState<Attribution>('keep');
  const close = () => {
    setStatus('');
    setSource('');
    setLicence('');
    setAttribution('keep');
    bulk.reset();
    onClose();
  };
  // Only what was filled in changes; empty fields leave each motif's own value alone.
  const rights = {
    ...(status ? { status } : {}),
    ...(source.trim() ? { source: source.trim() } : {}),
    ...(licence.trim() ? { licence: licence.trim() } : {}),
    ...(attribution !== 'keep' ? { attributionRequired: attribution === 'required' } : {}),
  };
  const nothing = Object.keys(rights).length === 0;
  return (
    <Dialog
      open={open}
      onClose={close}
      title={`Set the rights of ${motifs(count)}`}
      description="Fields left empty stay as they are on each motif."
      actions={
        <>
          <Button variant="secondary" onClick={close}>
            Cancel
          </Button>
          <Button disabled={nothing} busy={bulk.isPending} busyLabel="Saving…" onClick={() => void onRun({ type: 'set-rights', rights }).then(close, () => undefined)}>
            Set rights
          </Button>
        </>
      }
    >
      <SelectField
        label="Rights status"
        name="status"
        value={status}
        onChange={(event) => setStatus(event.target.value as RightsStatusDto | '')}
        options={[{ value: '', label: 'Leave as it is' }, ...rightsOptions]}
      />
      <TextField label="Source" name="source" optional value={source} maxLength={500} onChange={(e) => setSource(e.target.value)} />
      <TextField label="Licence" name="licence" optional value={licence} maxLength={2000} onChange={(e) => setLicence(e.target.value)} />
      <RadioGroup
        legend="Credit the author when used"
        name="attribution"
        value={attribution}
        onChange={setAttribution}
        inline
        options={[
          { value: 'keep', label: 'Leave as it is' },
          { value: 'required', label: 'Required' },
          { value: 'not_required', label: 'Not required' },
        ]}
      />
      <Problem bulk={bulk} />
    </Dialog>
  );
}
