import { useEffect, useRef, useState, type KeyboardEvent } from 'react';
import type { SamplePhoto } from '@shared/contracts/samples';
import { Button, buttonClasses } from '../../../components/ui/button';
import { formatBytes } from '../sample-words';

type Props = {
  photos: readonly SamplePhoto[];
  index: number;
  onIndex: (index: number) => void;
  onClose: () => void;
  onDelete?: (photo: SamplePhoto) => void;
  deleting?: boolean;
};

// A larger view of one photo in a modal dialog: arrow keys step through, Escape closes, and focus
// returns to the thumbnail that opened it.
export function SamplePhotoViewer({ photos, index, onIndex, onClose, onDelete, deleting }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  const [confirming, setConfirming] = useState(false);
  const photo = photos[index];
  useEffect(() => setConfirming(false), [index]);

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    if (!dialog.open) {
      if (typeof dialog.showModal === 'function') dialog.showModal();
      else dialog.setAttribute('open', '');
    }
    dialog.querySelector<HTMLElement>('[data-autofocus]')?.focus();
    return () => {
      if (dialog.open) dialog.close();
      opener?.focus();
    };
  }, []);

  if (!photo) return null;
  const step = (by: number) => onIndex((index + by + photos.length) % photos.length);

  const onKeyDown = (event: KeyboardEvent<HTMLDialogElement>) => {
    if (event.key === 'Escape') {
      event.preventDefault();
      onClose();
    } else if (event.key === 'ArrowRight' && photos.length > 1) step(1);
    else if (event.key === 'ArrowLeft' && photos.length > 1) step(-1);
  };

  return (
    <dialog
      ref={ref}
      aria-label={`Photo ${index + 1} of ${photos.length}: ${photo.fileName}`}
      onKeyDown={onKeyDown}
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      className="m-auto max-h-[calc(100vh-2rem)] w-[min(72rem,calc(100vw-2rem))] rounded-lg border border-sand bg-paper p-0 text-ink shadow-lifted"
    >
      <div className="flex flex-col gap-3 p-4">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <p className="min-w-0 break-words font-semibold">
            {photo.fileName}
            <span className="ml-2 font-normal text-ink-soft">
              {photo.width} × {photo.height} px · {formatBytes(photo.byteSize)}
            </span>
          </p>
          <Button data-autofocus size="sm" variant="secondary" onClick={onClose}>
            Close
          </Button>
        </div>
        <img src={photo.displayUrl} alt={`Sample photo ${index + 1}: ${photo.fileName}`} className="max-h-[70vh] w-full rounded-md bg-shell object-contain" />
        <div className="flex flex-wrap items-center gap-2">
          {photos.length > 1 && (
            <>
              <Button size="sm" variant="secondary" onClick={() => step(-1)}>
                Previous
              </Button>
              <Button size="sm" variant="secondary" onClick={() => step(1)}>
                Next
              </Button>
              <span className="text-sm text-ink-soft" aria-live="polite">
                {index + 1} of {photos.length}
              </span>
            </>
          )}
          <a href={photo.originalUrl} download className={buttonClasses('quiet', 'sm', 'ml-auto')}>
            Download the original
          </a>
          {onDelete && !confirming && (
            <Button size="sm" variant="secondary" onClick={() => setConfirming(true)}>
              Remove photo…
            </Button>
          )}
          {onDelete && confirming && (
            <span role="group" aria-label="Confirm removal" className="flex items-center gap-2">
              <span className="text-sm text-ink">Remove this photo and its stored original?</span>
              <Button size="sm" variant="danger" autoFocus busy={deleting} busyLabel="Removing…" onClick={() => onDelete(photo)}>
                Remove
              </Button>
              <Button size="sm" variant="secondary" onClick={() => setConfirming(false)}>
                Keep it
              </Button>
            </span>
          )}
        </div>
      </div>
    </dialog>
  );
}
