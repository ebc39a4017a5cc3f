import { useId, useRef, useState, type DragEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { classNames } from '../../../components/ui/class-names';
import { checkOriginalFile, formatBytes, originalFileAccept, type FileProblem } from '../file-check';

type DropZoneProps = {
  onFile: (file: File) => void;
  limitBytes?: number;
  disabled?: boolean;
};

const hasFiles = (event: DragEvent) => Array.from(event.dataTransfer?.types ?? []).includes('Files');

// Drag a file here, or use the button (keyboard and screen readers); both go through the same check.
export function DropZone({ onFile, limitBytes, disabled = false }: DropZoneProps) {
  const inputRef = useRef<HTMLInputElement>(null);
  const [dragging, setDragging] = useState(false);
  const [problem, setProblem] = useState<FileProblem | null>(null);
  const hintId = useId();
  const problemId = useId();

  const take = (files: FileList | null | undefined) => {
    const file = files?.[0];
    if (!file) return;
    const found = checkOriginalFile(file, limitBytes);
    setProblem(found);
    if (found) return;
    onFile(file);
  };

  const onDragOver = (event: DragEvent<HTMLDivElement>) => {
    if (disabled || !hasFiles(event)) return;
    event.preventDefault();
    if (event.dataTransfer) event.dataTransfer.dropEffect = 'copy';
    setDragging(true);
  };

  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setDragging(false);
    if (disabled) return;
    take(event.dataTransfer?.files);
  };

  return (
    <div
      data-testid="drop-zone"
      onDragEnter={onDragOver}
      onDragOver={onDragOver}
      onDragLeave={(event) => {
        if (!event.currentTarget.contains(event.relatedTarget as Node | null)) setDragging(false);
      }}
      onDrop={onDrop}
      className={classNames(
        'flex flex-col items-center gap-3 rounded-lg border-2 border-dashed px-6 py-8 text-center transition-colors',
        dragging ? 'border-tide bg-tide/8' : 'border-sand bg-shell/60',
        problem && !dragging && 'border-rust/60',
        disabled && 'opacity-60',
      )}
    >
      <svg viewBox="0 0 48 48" className="size-10 text-tide" aria-hidden="true" focusable="false">
        <path d="M24 31V11m0 0-8 8m8-8 8 8" fill="none" stroke="currentColor" strokeWidth="3" strokeLinecap="round" strokeLinejoin="round" />
        <path d="M9 29v6a4 4 0 0 0 4 4h22a4 4 0 0 0 4-4v-6" fill="none" stroke="currentColor" strokeWidth="3" strokeLinecap="round" />
      </svg>
      <p className="text-lg font-semibold text-ink">{dragging ? 'Let go to add this file' : 'Drop an original here'}</p>
      <p id={hintId} className="max-w-md text-ink-soft">
        A layered PSD, a flat PNG, JPEG or WebP image, or an SVG drawing
        {limitBytes ? `, up to ${formatBytes(limitBytes)}` : ''}. The file is kept exactly as it is.
      </p>
      <input
        ref={inputRef}
        type="file"
        accept={originalFileAccept}
        className="sr-only"
        tabIndex={-1}
        aria-hidden="true"
        onChange={(event) => {
          take(event.target.files);
          event.target.value = '';
        }}
      />
      <Button
        variant="secondary"
        disabled={disabled}
        aria-describedby={classNames(hintId, problem && problemId) || undefined}
        onClick={() => inputRef.current?.click()}
      >
        Choose a file…
      </Button>
      {problem && (
        <p id={problemId} role="alert" className="max-w-md text-sm font-semibold text-rust">
          {problem.message}
        </p>
      )}
    </div>
  );
}
