import { useEffect, useRef, useState, type KeyboardEvent, type MouseEvent } from 'react';
import type { PreviewView } from '@shared/contracts/exports';
import type { CommentThread } from '@shared/contracts/reviews';
import { nudgePreviewPoint, pinOnView, previewPointFromClick, type PreviewPoint } from '@shared/reviews/pins';
import { Button } from '../../../components/ui/button';
import { classNames } from '../../../components/ui/class-names';
import { LoadingState } from '../../../components/ui/spinner';

export type DraftPin = { point: PreviewPoint; placed: boolean };

type PreviewPinBoardProps = {
  productId: string;
  revision: number;
  view: PreviewView;
  threads: readonly CommentThread[];
  numbers: ReadonlyMap<string, number>;
  selectedId: string | null;
  onSelect: (threadId: string) => void;
  draft: DraftPin | null;
  onDraft: (draft: DraftPin | null) => void;
  canComment: boolean;
};

const viewWords: Record<PreviewView, string> = { front: 'front', back: 'back', 'handle-left': 'handle on the left', 'handle-right': 'handle on the right', flat: 'flat' };
const step = 0.02;

// The product's preview with numbered pins. A click drops a pin; keyboard users start one with
// the button, move it with the arrow keys (Shift for bigger steps) and press Enter.
export function PreviewPinBoard({ productId, revision, view, threads, numbers, selectedId, onSelect, draft, onDraft, canComment }: PreviewPinBoardProps) {
  const imageRef = useRef<HTMLImageElement>(null);
  const draftRef = useRef<HTMLButtonElement>(null);
  const src = `/api/products/${encodeURIComponent(productId)}/previews/${view}.png?revision=${revision}`;
  // kept per image address, so a new view or revision starts as loading without an effect
  const [loaded, setLoaded] = useState<{ src: string; status: 'ready' | 'failed' } | null>(null);
  const image = loaded?.src === src ? loaded.status : 'loading';
  useEffect(() => {
    if (draft && !draft.placed) draftRef.current?.focus();
  }, [draft]);

  const onImageClick = (event: MouseEvent<HTMLDivElement>) => {
    if (!canComment || image !== 'ready' || event.target !== imageRef.current) return;
    const point = previewPointFromClick(event.clientX, event.clientY, imageRef.current.getBoundingClientRect());
    if (point) onDraft({ point, placed: true });
  };
  const onDraftKey = (event: KeyboardEvent<HTMLButtonElement>) => {
    if (!draft) return;
    const size = event.shiftKey ? step * 5 : step;
    const moves: Record<string, [number, number]> = { ArrowLeft: [-size, 0], ArrowRight: [size, 0], ArrowUp: [0, -size], ArrowDown: [0, size] };
    const move = moves[event.key];
    if (move) {
      event.preventDefault();
      onDraft({ point: nudgePreviewPoint(draft.point, move[0], move[1]), placed: false });
    } else if (event.key === 'Enter') {
      event.preventDefault();
      onDraft({ ...draft, placed: true });
    } else if (event.key === 'Escape') onDraft(null);
  };

  return (
    <div className="flex flex-col gap-3">
      <div className={classNames('relative mx-auto w-full max-w-xl overflow-hidden rounded-md border border-sand bg-shell', canComment && image === 'ready' && 'cursor-crosshair')} onClick={onImageClick}>
        {image === 'loading' && <LoadingState label="Rendering the preview…" className="absolute inset-0 m-auto h-fit w-fit" />}
        {image === 'failed' && <p role="alert" className="p-6 text-ink-soft">The preview could not be drawn. Comments still work: use “General comment”.</p>}
        <img
          ref={imageRef}
          src={src}
          alt={`Preview of the product, ${viewWords[view]} view${canComment ? '; click to pin a comment' : ''}`}
          onLoad={() => setLoaded({ src, status: 'ready' })}
          onError={() => setLoaded({ src, status: 'failed' })}
          className={classNames('block w-full select-none', image !== 'ready' && 'invisible min-h-64')}
          draggable={false}
        />
        {image === 'ready' && threads.map((thread) => {
          const pin = pinOnView(thread.anchor, view);
          if (!pin) return null;
          const selected = thread.id === selectedId;
          return (
            <button
              key={thread.id}
              type="button"
              aria-pressed={selected}
              aria-label={`Comment ${numbers.get(thread.id)}${thread.resolved ? ' (resolved)' : ''}: ${thread.comments[0]?.body.slice(0, 60) ?? ''}`}
              onClick={() => onSelect(thread.id)}
              style={{ left: `${pin.leftPercent}%`, top: `${pin.topPercent}%` }}
              className={classNames(
                'absolute flex size-7 -translate-x-1/2 -translate-y-1/2 items-center justify-center rounded-full border-2 text-sm font-bold shadow-paper',
                selected ? 'z-10 scale-125 border-ink bg-ochre text-ink' : thread.resolved ? 'border-paper bg-sand text-ink-soft' : 'border-paper bg-tide text-paper',
              )}
            >
              {numbers.get(thread.id)}
            </button>
          );
        })}
        {draft && image === 'ready' && (
          <button
            ref={draftRef}
            type="button"
            onKeyDown={onDraftKey}
            aria-label={`New pin at ${Math.round(draft.point.x * 100)} % across, ${Math.round(draft.point.y * 100)} % down. Arrow keys move it, Enter places it, Escape cancels.`}
            style={{ left: `${draft.point.x * 100}%`, top: `${draft.point.y * 100}%` }}
            className="absolute z-20 flex size-8 -translate-x-1/2 -translate-y-1/2 items-center justify-center rounded-full border-2 border-dashed border-ink bg-ochre/80 text-lg font-bold text-ink"
          >
            +
          </button>
        )}
      </div>
      {canComment && (
        <div className="flex flex-wrap gap-2">
          <Button size="sm" variant="secondary" disabled={image !== 'ready'} onClick={() => onDraft({ point: { x: 0.5, y: 0.5 }, placed: false })}>
            Pin with the keyboard
          </Button>
        </div>
      )}
    </div>
  );
}
