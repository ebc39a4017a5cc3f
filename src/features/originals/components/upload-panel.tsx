import { useRef, useState } from 'react';
import type { OriginalSummary } from '@shared/contracts/originals';
import { Button } from '../../../components/ui/button';
import { ProgressBar } from '../../../components/ui/progress-bar';
import { RadioGroup } from '../../../components/ui/radio-group';
import { SelectField } from '../../../components/ui/select-field';
import { StatusMessage } from '../../../components/ui/status-message';
import { errorMessageOf } from '../../../lib/use-form-errors';
import type { UploadProgress } from '../../../lib/upload-request';
import { useUploadOriginal } from '../api/upload-original';
import { formatBytes, UPLOAD_LIMIT_BYTES } from '../file-check';
import { cutWords } from '../import-words';
import { DropZone } from './drop-zone';

type UploadPanelProps = {
  originals: readonly OriginalSummary[];
  /** Preselected "new version of …" (from an original's page). */
  versionOf?: string | null;
  onUploaded: (originalId: string) => void;
};

const cutOptions = (['groups', 'layers'] as const).map((value) => ({ value, ...cutWords[value] }));

const isAbort = (error: unknown) => error instanceof DOMException && error.name === 'AbortError';

export function UploadPanel({ originals, versionOf = null, onUploaded }: UploadPanelProps) {
  const [file, setFile] = useState<File | null>(null);
  const [cut, setCut] = useState<OriginalSummary['cut']>('groups');
  const [previousId, setPreviousId] = useState<string>(versionOf ?? '');
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [cancelled, setCancelled] = useState(false);
  const abortRef = useRef<AbortController | null>(null);
  const upload = useUploadOriginal();

  const earlier = originals.filter((o) => o.status === 'ready');
  const sameName = file ? earlier.find((o) => o.name === file.name && o.id !== previousId) : undefined;

  const start = () => {
    if (!file) return;
    const controller = new AbortController();
    abortRef.current = controller;
    setCancelled(false);
    setProgress({ loaded: 0, total: file.size });
    upload.mutate(
      { file, cut, previousOriginalId: previousId || undefined, onProgress: setProgress, signal: controller.signal },
      {
        onSuccess: ({ id }) => {
          setFile(null);
          setProgress(null);
          setPreviousId('');
          onUploaded(id);
        },
        onError: (error) => {
          setProgress(null);
          if (isAbort(error)) setCancelled(true);
        },
      },
    );
  };

  const uploading = upload.isPending;
  const percent = progress && progress.total > 0 ? (progress.loaded / progress.total) * 100 : null;
  const sent = progress && progress.loaded >= progress.total;

  return (
    <div className="flex flex-col gap-5">
      {!file && (
        <DropZone
          limitBytes={UPLOAD_LIMIT_BYTES}
          onFile={(chosen) => {
            upload.reset();
            setCancelled(false);
            setFile(chosen);
          }}
        />
      )}
      {file && (
        <div className="flex flex-col gap-5 rounded-lg border border-sand bg-shell/60 p-5">
          <div className="flex flex-wrap items-baseline justify-between gap-2">
            <p className="min-w-0 break-words">
              <span className="font-semibold text-ink">{file.name}</span>
              <span className="ml-2 text-ink-soft">{formatBytes(file.size)}</span>
            </p>
            {!uploading && (
              <Button variant="quiet" size="sm" onClick={() => setFile(null)}>
                Choose another file
              </Button>
            )}
          </div>
          <div className="grid gap-5 md:grid-cols-2">
            <RadioGroup legend="How to cut it into motifs" name="cut" value={cut} options={cutOptions} onChange={setCut} disabled={uploading} />
            <div className="flex flex-col gap-3">
              <SelectField
                label="Is it a new version of an earlier original?"
                hint="Motifs are matched by layer path, then by pixels: changed ones get a new version, products keep theirs."
                name="previousOriginalId"
                value={previousId}
                disabled={uploading}
                onChange={(event) => setPreviousId(event.target.value)}
                options={[{ value: '', label: 'No, it is a new original' }, ...earlier.map((o) => ({ value: o.id, label: `New version of ${o.name}` }))]}
              />
              {sameName && !uploading && (
                <StatusMessage tone="info">
                  An original named “{sameName.name}” is already here.{' '}
                  <button type="button" className="font-semibold text-tide-deep underline" onClick={() => setPreviousId(sameName.id)}>
                    Upload as its new version
                  </button>
                </StatusMessage>
              )}
            </div>
          </div>
          {uploading && progress && (
            <ProgressBar
              label={sent ? 'Sent; the server is storing the file…' : `Uploading ${file.name}`}
              percent={sent ? null : percent}
              detail={`${formatBytes(progress.loaded)} of ${formatBytes(progress.total)}`}
            />
          )}
          {upload.isError && !isAbort(upload.error) && (
            <StatusMessage tone="problem" title="The upload did not go through">
              {errorMessageOf(upload.error)}
            </StatusMessage>
          )}
          {cancelled && <StatusMessage tone="info">Upload cancelled; nothing was stored.</StatusMessage>}
          <div className="flex flex-wrap gap-2">
            {uploading ? (
              <Button variant="secondary" onClick={() => abortRef.current?.abort()}>
                Cancel upload
              </Button>
            ) : (
              <Button onClick={start}>{upload.isError ? 'Try the upload again' : 'Upload and import'}</Button>
            )}
          </div>
        </div>
      )}
    </div>
  );
}
