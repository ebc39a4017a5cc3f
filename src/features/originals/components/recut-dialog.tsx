import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import type { OriginalSummary } from '@shared/contracts/originals';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { RadioGroup } from '../../../components/ui/radio-group';
import { StatusMessage } from '../../../components/ui/status-message';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useRecutOriginal } from '../api/recut-original';
import { cutWords } from '../import-words';

const cutOptions = (['groups', 'layers'] as const).map((value) => ({ value, ...cutWords[value] }));

export function RecutDialog({ original, open, onClose }: { original: OriginalSummary; open: boolean; onClose: () => void }) {
  const navigate = useNavigate();
  const [cut, setCut] = useState<OriginalSummary['cut']>(original.cut === 'groups' ? 'layers' : 'groups');
  const recut = useRecutOriginal({
    mutationConfig: { onSuccess: ({ id }) => navigate(`/originals/${id}`) },
  });
  const close = () => {
    recut.reset();
    onClose();
  };
  return (
    <Dialog
      open={open}
      onClose={close}
      title={`Cut ${original.name} again`}
      description="The stored file is imported once more and matched against this import: unchanged motifs stay as they are, changed ones get a new version."
      actions={
        <>
          <Button variant="secondary" onClick={close}>
            Cancel
          </Button>
          <Button data-autofocus busy={recut.isPending} busyLabel="Starting…" onClick={() => recut.mutate({ id: original.id, cut })}>
            Cut again
          </Button>
        </>
      }
    >
      <RadioGroup legend="How to cut it" name="recut" value={cut} options={cutOptions} onChange={setCut} />
      <p className="text-sm text-ink-soft">Now: {cutWords[original.cut].label.toLowerCase()}.</p>
      {recut.isError && <StatusMessage tone="problem">{errorMessageOf(recut.error)}</StatusMessage>}
    </Dialog>
  );
}
