import { useRef, useState, type DragEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { classNames } from '../../../components/ui/class-names';
import { ProgressBar } from '../../../components/ui/progress-bar';
import { StatusMessage } from '../../../components/ui/status-message';
import { formatBytes } from '../../originals/file-check';
import { useDeleteGuideImage, useUploadGuideImage } from '../api/guide-image';

const LIMIT_BYTES = 25 * 1024 * 1024;
const accepted = ['image/png', 'image/jpeg', 'image/webp'];

// The printer's own template drawing, laid over the editor's canvas to check against; never printed.
export function GuideImageField({ templateId, guideImageUrl }: { templateId: string; guideImageUrl: string | null }) {
  const input = useRef<HTMLInputElement>(null);
  const [progress, setProgress] = useState<{ loaded: number; total: number } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [dragging, setDragging] = useState(false);
  const upload = useUploadGuideImage({ mutationConfig: { onSettled: () => setProgress(null) } });
  const remove = useDeleteGuideImage();

  const take = (file: File | undefined) => {
    if (!file) return;
    if (!accepted.includes(file.type)) return setProblem(`“${file.name}” is not a PNG, JPEG or WebP image. Export the printer's guide as PNG first.`);
    if (file.size > LIMIT_BYTES) return setProblem(`“${file.name}” is ${formatBytes(file.size)}; a guide image may be at most ${formatBytes(LIMIT_BYTES)}.`);
    setProblem(null);
    upload.mutate({ id: templateId, file, onProgress: setProgress });
  };
  const onDragOver = (e: DragEvent) => {
    if (!Array.from(e.dataTransfer.types).includes('Files')) return;
    e.preventDefault();
    setDragging(true);
  };

  return (
    <section className="flex flex-col gap-3 rounded-lg border border-sand bg-paper p-5" aria-labelledby="guide-image-heading">
      <h2 id="guide-image-heading" className="text-lg font-semibold text-ink">Printer's guide image</h2>
      <p className="text-ink-soft">
        Many printers publish a drawing of their template. Add it here to see it over the diagram and, in the editor, over your layout. It is never printed.
      </p>
      <div
        onDragEnter={onDragOver}
        onDragOver={onDragOver}
        onDragLeave={() => setDragging(false)}
        onDrop={(e) => {
          e.preventDefault();
          setDragging(false);
          take(e.dataTransfer.files[0]);
        }}
        className={classNames('flex flex-wrap items-center gap-4 rounded-md border-2 border-dashed p-4', dragging ? 'border-tide bg-tide/8' : 'border-sand')}
      >
        {guideImageUrl ? (
          <img src={guideImageUrl} alt="The printer's guide image" className="h-24 w-auto rounded border border-sand bg-shell object-contain" />
        ) : (
          <p className="text-ink-soft">{dragging ? 'Let go to add this image' : 'Drop a PNG, JPEG or WebP here'}</p>
        )}
        <div className="flex flex-wrap gap-2">
          <Button type="button" variant="secondary" size="sm" onClick={() => input.current?.click()} busy={upload.isPending}>
            {guideImageUrl ? 'Replace the guide' : 'Choose an image'}
          </Button>
          {guideImageUrl && (
            <Button type="button" variant="quiet" size="sm" busy={remove.isPending} onClick={() => remove.mutate({ id: templateId })}>
              Remove the guide
            </Button>
          )}
        </div>
        <input
          ref={input}
          type="file"
          accept={accepted.join(',')}
          className="sr-only"
          tabIndex={-1}
          aria-hidden="true"
          onChange={(e) => {
            take(e.target.files?.[0]);
            e.target.value = '';
          }}
        />
      </div>
      {progress && <ProgressBar label="Uploading the guide" percent={(progress.loaded / Math.max(progress.total, 1)) * 100} detail={`${formatBytes(progress.loaded)} of ${formatBytes(progress.total)}`} />}
      {(problem || upload.isError || remove.isError) && <StatusMessage tone="problem">{problem ?? upload.error?.message ?? remove.error?.message}</StatusMessage>}
    </section>
  );
}
