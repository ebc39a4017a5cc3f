import { useState } from 'react';
import type { SamplePhoto } from '@shared/contracts/samples';
import { StatusMessage } from '../../../components/ui/status-message';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useDeleteSamplePhoto } from '../api/delete-sample-photo';
import { SamplePhotoViewer } from './sample-photo-viewer';

type Props = { photos: readonly SamplePhoto[]; productId: string; canRecord: boolean };

export function SamplePhotoGrid({ photos, productId, canRecord }: Props) {
  const [open, setOpen] = useState<number | null>(null);
  const remove = useDeleteSamplePhoto({
    mutationConfig: { onSuccess: () => setOpen((i) => (i === null || photos.length <= 1 ? null : Math.min(i, photos.length - 2))) },
  });

  if (photos.length === 0) return <p className="text-sm text-ink-soft">No photos of this sample yet.</p>;

  return (
    <>
      <ul className="grid grid-cols-[repeat(auto-fill,minmax(7rem,1fr))] gap-2" aria-label="Photos of this sample">
        {photos.map((photo, i) => (
          <li key={photo.id}>
            <button
              type="button"
              onClick={() => setOpen(i)}
              className="block aspect-square w-full overflow-hidden rounded-md border border-sand bg-shell hover:border-tide focus-visible:outline-2 focus-visible:outline-tide"
              aria-label={`Open photo ${i + 1}: ${photo.fileName}`}
            >
              <img src={photo.thumbUrl} alt="" loading="lazy" className="size-full object-cover" />
            </button>
          </li>
        ))}
      </ul>
      {remove.isError && <StatusMessage tone="problem">{errorMessageOf(remove.error)}</StatusMessage>}
      {open !== null && photos[open] && (
        <SamplePhotoViewer
          photos={photos}
          index={open}
          onIndex={setOpen}
          onClose={() => setOpen(null)}
          deleting={remove.isPending}
          onDelete={canRecord ? (photo) => remove.mutate({ id: photo.id, productId }) : undefined}
        />
      )}
    </>
  );
}
