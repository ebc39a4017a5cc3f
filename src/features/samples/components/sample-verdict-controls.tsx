import { useId, useState } from 'react';
import type { Sample } from '@shared/contracts/samples';
import { Button } from '../../../components/ui/button';
import { borderFor, controlClasses } from '../../../components/ui/field-parts';
import { StatusMessage } from '../../../components/ui/status-message';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useRecordSampleVerdict } from '../api/record-sample-verdict';

// Approve at once, or say what needs to change (notes are required for that).
export function SampleVerdictControls({ sample }: { sample: Sample }) {
  const [asking, setAsking] = useState(false);
  const [notes, setNotes] = useState('');
  const [missingNotes, setMissingNotes] = useState(false);
  const notesId = useId();
  const errorId = useId();
  const verdict = useRecordSampleVerdict({ mutationConfig: { onSuccess: () => { setAsking(false); setNotes(''); } } });

  const sendChanges = () => {
    if (!notes.trim()) {
      setMissingNotes(true);
      document.getElementById(notesId)?.focus();
      return;
    }
    verdict.mutate({ id: sample.id, productId: sample.productId, verdict: { verdict: 'changes_needed', notes } });
  };

  return (
    <div className="flex flex-col gap-3">
      {!asking && (
        <div className="flex flex-wrap gap-2">
          {sample.verdict !== 'approved' && (
            <Button size="sm" busy={verdict.isPending} busyLabel="Saving…" onClick={() => verdict.mutate({ id: sample.id, productId: sample.productId, verdict: { verdict: 'approved', notes: '' } })}>
              Approve sample
            </Button>
          )}
          <Button size="sm" variant="secondary" disabled={verdict.isPending} onClick={() => setAsking(true)}>
            {sample.verdict === 'changes_needed' ? 'Change the notes…' : 'Changes needed…'}
          </Button>
        </div>
      )}
      {asking && (
        <div className="flex flex-col gap-2">
          <label htmlFor={notesId} className="font-semibold text-ink">
            What needs to change?
          </label>
          <textarea
            id={notesId}
            rows={3}
            maxLength={4000}
            autoFocus
            value={notes}
            placeholder="The wave band is cut off at the handle; colours print darker than the proof"
            onChange={(event) => {
              setNotes(event.target.value);
              if (event.target.value.trim()) setMissingNotes(false);
            }}
            aria-invalid={missingNotes || undefined}
            aria-describedby={missingNotes ? errorId : undefined}
            className={`${controlClasses} ${borderFor(missingNotes ? 'x' : undefined)}`}
          />
          {missingNotes && (
            <p id={errorId} className="text-sm font-semibold text-rust">
              Say what needs to change, so the next sample can get it right.
            </p>
          )}
          <div className="flex flex-wrap gap-2">
            <Button size="sm" variant="danger" busy={verdict.isPending} busyLabel="Saving…" onClick={sendChanges}>
              Record changes needed
            </Button>
            <Button size="sm" variant="secondary" disabled={verdict.isPending} onClick={() => setAsking(false)}>
              Cancel
            </Button>
          </div>
        </div>
      )}
      {verdict.isError && <StatusMessage tone="problem">{errorMessageOf(verdict.error)}</StatusMessage>}
    </div>
  );
}
