import { useEffect, useState } from 'react';
import { rightsStatusSchema, type MotifDetail } from '@shared/contracts/motifs';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { SelectField } from '../../../components/ui/select-field';
import { StatusMessage } from '../../../components/ui/status-message';
import { TextField } from '../../../components/ui/text-field';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { rightsOptions, rightsWords } from '../../library/rights-words';
import { useUpdateMotif } from '../api/update-motif';

type Rights = MotifDetail['rights'];

function RightsSummary({ rights }: { rights: Rights }) {
  return (
    <dl className="flex flex-col gap-2">
      <div>
        <dt className="sr-only">Status</dt>
        <dd>
          <Badge tone={rightsWords[rights.status].tone}>{rightsWords[rights.status].label}</Badge>
        </dd>
      </div>
      <div>
        <dt className="text-sm text-ink-soft">Source</dt>
        <dd className="break-words text-ink">{rights.source || '–'}</dd>
      </div>
      <div>
        <dt className="text-sm text-ink-soft">Licence</dt>
        <dd className="break-words whitespace-pre-wrap text-ink">{rights.licence || '–'}</dd>
      </div>
      <div>
        <dt className="text-sm text-ink-soft">Credit</dt>
        <dd className="text-ink">{rights.attributionRequired ? 'The author must be credited where it is used' : 'No credit required'}</dd>
      </div>
    </dl>
  );
}

export function RightsPanel({ motif, canEdit }: { motif: MotifDetail; canEdit: boolean }) {
  const [draft, setDraft] = useState<Rights>(motif.rights);
  const [saved, setSaved] = useState(false);
  const update = useUpdateMotif({ mutationConfig: { onSuccess: () => setSaved(true) } });
  useEffect(() => setDraft(motif.rights), [motif.rights]);

  if (!canEdit) return <RightsSummary rights={motif.rights} />;
  const changed = JSON.stringify(draft) !== JSON.stringify(motif.rights);
  const edit = (change: Partial<Rights>) => {
    setSaved(false);
    setDraft((d) => ({ ...d, ...change }));
  };

  return (
    <form
      className="flex flex-col gap-4"
      onSubmit={(event) => {
        event.preventDefault();
        update.mutate({
          id: motif.id,
          changes: {
            rightsStatus: draft.status,
            rightsSource: draft.source,
            rightsLicence: draft.licence,
            attributionRequired: draft.attributionRequired,
          },
        });
      }}
    >
      <SelectField
        label="Status"
        name="rightsStatus"
        value={draft.status}
        onChange={(event) => edit({ status: rightsStatusSchema.catch(draft.status).parse(event.target.value) })}
        options={rightsOptions}
      />
      <TextField label="Source" name="rightsSource" optional maxLength={500} value={draft.source} onChange={(e) => edit({ source: e.target.value })} />
      <TextField label="Licence" name="rightsLicence" optional maxLength={2000} value={draft.licence} onChange={(e) => edit({ licence: e.target.value })} />
      <Checkbox
        label="The author must be credited where it is used"
        checked={draft.attributionRequired}
        onChange={(e) => edit({ attributionRequired: e.target.checked })}
      />
      <div className="flex items-center gap-2">
        <Button type="submit" size="sm" disabled={!changed} busy={update.isPending} busyLabel="Saving…">
          Save rights
        </Button>
        {saved && !changed && <span role="status" className="text-sm text-ink-soft">Rights saved.</span>}
      </div>
      {update.isError && <StatusMessage tone="problem">{errorMessageOf(update.error)}</StatusMessage>}
    </form>
  );
}
