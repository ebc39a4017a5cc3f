import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import type { OriginalSummary } from '@shared/contracts/originals';
import { ProgressBar } from '../../../components/ui/progress-bar';
import { StatusMessage } from '../../../components/ui/status-message';
import { motifKeys } from '../../motifs/api/motif-keys';
import { tagKeys } from '../../library/api/tag-keys';
import { isImporting } from '../api/import-status';
import { originalsKeys } from '../api/originals-keys';
import { phaseWords } from '../import-words';
import { FailedImportActions } from './failed-import-actions';

type ImportProgressProps = {
  original: OriginalSummary;
  canImport: boolean;
  /** Shown on the originals page, where the name links to the original. */
  showName?: boolean;
  onDeleted?: () => void;
};

// The import's phase and percent while it runs; then its outcome, once, politely announced.
export function ImportProgress({ original, canImport, showName = false, onDeleted }: ImportProgressProps) {
  useRefreshWhenImported(original);
  const stalled = useStalled(original);
  const name = showName ? (
    <Link to={`/originals/${original.id}`} className="font-semibold text-tide-deep underline">
      {original.name}
    </Link>
  ) : (
    'This original'
  );

  if (isImporting(original)) {
    const started = original.status === 'importing';
    return (
      <div className="flex flex-col gap-2 rounded-lg border border-sand bg-paper p-4">
        <ProgressBar
          label={
            <>
              {showName && <span className="mr-1">{name} ·</span>}
              {phaseWords[original.phase]}
            </>
          }
          percent={started ? original.percent : null}
        />
        <p className="text-sm text-ink-soft">Its motifs appear all at once when the import is complete. You can leave this page meanwhile.</p>
        <p role="status" className="text-sm text-ink empty:hidden">
          {stalled && 'This import has not moved for a while. If the server was restarted, it starts again from the stored file by itself within about ten minutes; nothing of it is lost.'}
        </p>
      </div>
    );
  }
  if (original.status === 'failed') {
    return (
      <StatusMessage tone="problem" title={<>{name} could not be imported</>}>
        <p>{original.error?.message ?? 'The import stopped without saying why.'}</p>
        <p className="mt-1 text-sm">The file itself is kept. Try the import again, or delete it.</p>
        {canImport && <FailedImportActions original={original} onDeleted={onDeleted} />}
      </StatusMessage>
    );
  }
  return (
    <StatusMessage tone="ok" title={<>{name} is imported</>}>
      {original.motifCount === 1 ? '1 motif is' : `${original.motifCount} motifs are`} in the library now.{' '}
      {showName && (
        <Link to={`/originals/${original.id}`} className="font-semibold text-tide-deep underline">
          See its motifs and import report
        </Link>
      )}
    </StatusMessage>
  );
}

// An import whose phase and percent have not changed for this long has probably lost its worker
// (the queue hands it to another once its job expires).
export const STALLED_AFTER_MS = 3 * 60_000;

function useStalled(original: OriginalSummary): boolean {
  const running = original.status === 'importing';
  const mark = `${original.status}:${original.phase}:${original.percent}`;
  const [stalled, setStalled] = useState(false);
  useEffect(() => {
    setStalled(false);
    if (!running) return;
    const timer = setTimeout(() => setStalled(true), STALLED_AFTER_MS);
    return () => clearTimeout(timer);
  }, [mark, running]);
  return stalled;
}

// When an import this page watched finishes, the lists that show its motifs are out of date.
function useRefreshWhenImported(original: OriginalSummary) {
  const queryClient = useQueryClient();
  const wasImporting = useRef(isImporting(original));
  useEffect(() => {
    const now = isImporting(original);
    if (wasImporting.current && !now) {
      void queryClient.invalidateQueries({ queryKey: originalsKeys.lists() });
      void queryClient.invalidateQueries({ queryKey: motifKeys.all });
      void queryClient.invalidateQueries({ queryKey: tagKeys.all });
    }
    wasImporting.current = now;
  }, [original, queryClient]);
}
