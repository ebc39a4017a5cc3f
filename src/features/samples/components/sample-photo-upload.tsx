import { useId, useRef, useState, type DragEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { classNames } from '../../../components/ui/class-names';
import { ProgressBar } from '../../../components/ui/progress-bar';
import { StatusMessage } from '../../../components/ui/status-message';
import { errorMessageOf } from '../../../lib/use-form-errors';
import type { UploadProgress } from '../../../lib/upload-request';
import { useUploadSamplePhoto } from '../api/upload-sample-photo';
import { formatBytes } from '../sample-words';

type Props = { sampleId: string; productId: string; limitBytes: number };

const accept = '.jpg,.jpeg,.png,.webp,.heic,.heif,image/jpeg,image/png,image/webp,image/heic,image/heif';
const isAbort = (error: unknown) => error instanceof DOMException && error.name === 'AbortError';
const hasFiles = (event: DragEvent) => Array.from(event.dataTransfer?.types ?? []).includes('Files');

// The browser's check spares a long upload that would be refused; the server decides from the bytes.
function problemOf(file: File, limitBytes: number): string | null {
  if (file.size === 0) return `${file.name} is empty.`;
  if (file.size > limitBytes) return `${file.name} is ${formatBytes(file.size)}; photos may be up to ${formatBytes(limitBytes)}. Export a smaller JPEG.`;
  if (file.type && !file.type.startsWith('image/')) return `${file.name} is not a photo. Upload a JPEG, PNG or WebP image.`;
  return null;
}

// Drop photos here or choose them; they go up one at a time with a byte count.
export function SamplePhotoUpload({ sampleId, productId, limitBytes }: Props) {
  const inputRef = useRef<HTMLInputElement>(null);
  const abortRef = useRef<AbortController | null>(null);
  const [dragging, setDragging] = useState(false);
  const [current, setCurrent] = useState<{ file: File; progress: UploadProgress } | null>(null);
  const [problems, setProblems] = useState<string[]>([]);
  const hintId = useId();
  const upload = useUploadSamplePhoto();

  const send = async (files: File[]) => {
    const found: string[] = [];
    for (const file of files) {
      const problem = problemOf(file, limitBytes);
      if (problem) {
        found.push(problem);
        continue;
      }
      const controller = new AbortController();
      abortRef.current = controller;
      setCurrent({ file, progress: { loaded: 0, total: file.size } });
      try {
        await upload.mutateAsync({ sampleId, productId, file, signal: controller.signal, onProgress: (progress) => setCurrent({ file, progress }) });
      } catch (error) {
        if (isAbort(error)) break;
        found.push(`${file.name}: ${errorMessageOf(error)}`);
      }
    }
    setCurrent(null);
    setProblems(found);
  };

  const take = (list: FileList | null | undefined) => {
    const files = Array.from(list ?? []);
    if (files.length && !current) void send(files);
  };

  const onDragOver = (event: DragEvent<HTMLDivElement>) => {
    if (!hasFiles(event)) return;
    event.preventDefault();
    setDragging(true);
  };

  const percent = current && current.progress.total > 0 ? (current.progress.loaded / current.progress.total) * 100 : null;
  const sent = current && current.progress.loaded >= current.progress.total;

  return (
    <div className="flex flex-col gap-3">
      <div
        data-testid="sample-photo-drop"
        onDragEnter={onDragOver}
        onDragOver={onDragOver}
        onDragLeave={(e) => {
          if (!e.currentTarget.contains(e.relatedTarget as Node | null)) setDragging(false);
        }}
        onDrop={(e) => {
          e.preventDefault();
          setDragging(false);
          take(e.dataTransfer?.files);
        }}
        className={classNames('flex flex-wrap items-center gap-3 rounded-lg border-2 border-dashed px-4 py-3', dragging ? 'border-tide bg-tide/8' : 'border-sand')}
      >
        <p id={hintId} className="text-sm text-ink-soft">
          {dragging ? 'Let go to add these photos' : `Drop photos of the sample here: JPEG, PNG or WebP, up to ${formatBytes(limitBytes)} each. They are kept whole.`}
        </p>
        <input
          ref={inputRef}
          type="file"
          multiple
          accept={accept}
          className="sr-only"
          tabIndex={-1}
          aria-hidden="true"
          onChange={(event) => {
            take(event.target.files);
            event.target.value = '';
          }}
        />
        <Button size="sm" variant="secondary" disabled={!!current} aria-describedby={hintId} onClick={() => inputRef.current?.click()}>
          Add photos…
        </Button>
      </div>
      {current && (
        <div className="flex flex-col gap-2">
          <ProgressBar
            label={sent ? `Sent ${current.file.name}; making the smaller copies…` : `Uploading ${current.file.name}`}
            percent={sent ? null : percent}
            detail={`${formatBytes(current.progress.loaded)} of ${formatBytes(current.progress.total)}`}
          />
          <Button size="sm" variant="quiet" className="self-start" onClick={() => abortRef.current?.abort()}>
            Cancel upload
          </Button>
        </div>
      )}
      {problems.length > 0 && (
        <StatusMessage tone="problem" title={problems.length === 1 ? 'A photo was not added' : `${problems.length} photos were not added`}>
          <ul className="list-disc pl-5">
            {problems.map((p) => (
              <li key={p}>{p}</li>
            ))}
          </ul>
        </StatusMessage>
      )}
    </div>
  );
}
