import { useState } from 'react';
import type { Sample } from '@shared/contracts/samples';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { StatusMessage } from '../../../components/ui/status-message';
import { formatDay } from '../../../lib/format';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useDeleteSample } from '../api/delete-sample';
import { formatCalendarDay, sampleCostText, verdictWords } from '../sample-words';
import { SampleForm } from './sample-form';
import { SamplePhotoGrid } from './sample-photo-grid';
import { SamplePhotoUpload } from './sample-photo-upload';
import { SampleVerdictControls } from './sample-verdict-controls';

type Props = {
  sample: Sample;
  /** The latest order decides the product's way to ready; only it takes a verdict. */
  latest: boolean;
  showLatest: boolean;
  canRecord: boolean;
  photoLimitBytes: number;
};

function Fact({ term, value }: { term: string; value: string | null }) {
  return (
    <div>
      <dt className="text-sm text-ink-soft">{term}</dt>
      <dd className="text-ink">{value ?? '—'}</dd>
    </div>
  );
}

export function SampleCard({ sample, latest, showLatest, canRecord, photoLimitBytes }: Props) {
  const [editing, setEditing] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const remove = useDeleteSample({ mutationConfig: { onSuccess: () => setConfirmDelete(false) } });
  const words = verdictWords[sample.verdict];
  const title = `Ordered ${formatCalendarDay(sample.orderedOn)}${sample.printer ? ` from ${sample.printer}` : ''}`;

  return (
    <article className="flex flex-col gap-4 rounded-lg border border-sand bg-paper p-4" aria-label={title}>
      <header className="flex flex-wrap items-start justify-between gap-2">
        <div className="flex flex-wrap items-center gap-2">
          <h3 className="font-semibold text-ink">{title}</h3>
          <Badge tone={words.tone}>{words.label}</Badge>
          {latest && showLatest && <Badge tone="tide">Latest order</Badge>}
        </div>
        {canRecord && !editing && (
          <div className="flex gap-1">
            <Button size="sm" variant="quiet" onClick={() => setEditing(true)}>
              Edit
            </Button>
            <Button size="sm" variant="quiet" onClick={() => setConfirmDelete(true)}>
              Delete…
            </Button>
          </div>
        )}
      </header>

      {editing ? (
        <SampleForm productId={sample.productId} sample={sample} onDone={() => setEditing(false)} onCancel={() => setEditing(false)} />
      ) : (
        <dl className="grid gap-3 sm:grid-cols-4">
          <Fact term="Cost" value={sampleCostText(sample)} />
          <Fact term="Expected" value={sample.expectedOn ? formatCalendarDay(sample.expectedOn) : null} />
          <Fact term="Received" value={sample.receivedOn ? formatCalendarDay(sample.receivedOn) : 'Not yet'} />
          <Fact term="Recorded by" value={sample.createdBy?.name ?? null} />
          {sample.notes && (
            <div className="sm:col-span-4">
              <dt className="text-sm text-ink-soft">Notes</dt>
              <dd className="whitespace-pre-wrap text-ink">{sample.notes}</dd>
            </div>
          )}
        </dl>
      )}

      {sample.verdict !== 'pending' && (
        <StatusMessage tone={sample.verdict === 'approved' ? 'ok' : 'warning'} title={`${words.label}${sample.verdictBy ? ` · ${sample.verdictBy.name}` : ''}${sample.verdictAt ? `, ${formatDay(sample.verdictAt)}` : ''}`}>
          {sample.verdictNotes ? <p className="whitespace-pre-wrap">{sample.verdictNotes}</p> : null}
        </StatusMessage>
      )}

      {canRecord && latest && <SampleVerdictControls sample={sample} />}

      <section className="flex flex-col gap-3" aria-label="Photos">
        <h4 className="font-semibold text-ink">Photos</h4>
        <SamplePhotoGrid photos={sample.photos} productId={sample.productId} canRecord={canRecord} />
        {canRecord && <SamplePhotoUpload sampleId={sample.id} productId={sample.productId} limitBytes={photoLimitBytes} />}
      </section>

      <Dialog
        open={confirmDelete}
        onClose={() => setConfirmDelete(false)}
        title="Delete this sample order?"
        description={`Its ${sample.photos.length === 1 ? 'photo' : `${sample.photos.length} photos`} and verdict go with it. This cannot be undone.`}
        actions={
          <>
            <Button variant="secondary" data-autofocus onClick={() => setConfirmDelete(false)}>
              Keep it
            </Button>
            <Button variant="danger" busy={remove.isPending} busyLabel="Deleting…" onClick={() => remove.mutate({ id: sample.id, productId: sample.productId })}>
              Delete sample
            </Button>
          </>
        }
      >
        {remove.isError && <StatusMessage tone="problem">{errorMessageOf(remove.error)}</StatusMessage>}
      </Dialog>
    </article>
  );
}
