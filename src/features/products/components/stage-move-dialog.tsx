import { useEffect, useId, useRef, useState, type FormEvent } from 'react';
import type { ProductStage } from '@shared/contracts/stages';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { controlClasses } from '../../../components/ui/field-parts';
import { StatusMessage } from '../../../components/ui/status-message';
import { isApiRequestError } from '../../../lib/api-client';
import { useMoveProductStage } from '../api/move-product-stage';
import { stageLabels } from './stage-labels';

export type StageMoveTarget = { product: { id: string; name: string; stage: ProductStage }; to: ProductStage };

type Props = {
  target: StageMoveTarget | null;
  onClose: () => void;
  canOverride: boolean;
  onMoved?: (target: StageMoveTarget) => void;
};

// Asks for an optional note before a move. When the sample gate refuses, says why and, for an
// owner, offers to move anyway: that needs a note, and the history records it as an override.
export function StageMoveDialog({ target, onClose, canOverride, onMoved }: Props) {
  const noteId = useId();
  const [note, setNote] = useState('');
  const [overriding, setOverriding] = useState(false);
  const move = useMoveProductStage();
  const { reset } = move;
  const shown = useRef(target);
  shown.current = target;

  useEffect(() => {
    setNote('');
    setOverriding(false);
    reset();
  }, [target, reset]);

  if (!target) return <Dialog open={false} onClose={onClose} title="" />;
  const error = move.error;
  const gated = isApiRequestError(error) && error.code === 'stage.needs_approved_sample';
  const offerOverride = gated && canOverride;
  const noteMissing = overriding && note.trim() === '';

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (noteMissing) return;
    const moved = target;
    // closes only if it still shows this move: a card dropped meanwhile opens another that must stay
    move.mutate({ id: moved.product.id, to: moved.to, note: note.trim(), override: overriding }, { onSuccess: () => { onMoved?.(moved); if (shown.current === moved) onClose(); } });
  };

  return (
    <Dialog
      open
      onClose={onClose}
      title={`Move “${target.product.name}” to ${stageLabels[target.to]}`}
      description={`From ${stageLabels[target.product.stage]}. The move is kept in the product’s stage history.`}
    >
      <form onSubmit={submit} className="flex flex-col gap-4" aria-label="Stage move">
        <div className="flex flex-col gap-1.5">
          <label htmlFor={noteId} className="font-semibold">
            Note {overriding ? <span className="font-normal text-ink-soft">(required: why may it skip the sample check?)</span> : <span className="font-normal text-ink-soft">(optional)</span>}
          </label>
          <textarea id={noteId} data-autofocus value={note} onChange={(e) => setNote(e.target.value)} rows={3} maxLength={2000} className={`${controlClasses} border-sand`} aria-invalid={noteMissing || undefined} />
        </div>
        {error && !overriding && (
          <StatusMessage tone="problem" title={gated ? 'The sample check stopped this move' : 'The product was not moved'}>
            {error.message}
            {gated && !canOverride && ' Only an owner may move it without an approved sample.'}
          </StatusMessage>
        )}
        {error && overriding && isApiRequestError(error) && error.code !== 'stage.needs_approved_sample' && (
          <StatusMessage tone="problem" title="The product was not moved">{error.message}</StatusMessage>
        )}
        {overriding && <StatusMessage tone="warning">This moves the product without an approved sample. Your note and the override are recorded in its history.</StatusMessage>}
        <div className="flex flex-wrap justify-end gap-2">
          <Button variant="secondary" onClick={onClose}>Cancel</Button>
          {offerOverride && !overriding && (
            <Button variant="danger" onClick={() => setOverriding(true)}>Move anyway as owner…</Button>
          )}
          <Button type="submit" busy={move.isPending} disabled={noteMissing || (gated && !overriding)}>
            {overriding ? 'Move without a sample' : `Move to ${stageLabels[target.to]}`}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
