import { useId, useRef, useState, type ChangeEvent } from 'react';
import type { StudioDataImportReport } from '@shared/contracts/studio-data';
import { buttonClasses } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { StatusMessage } from '../../../components/ui/status-message';
import { isApiRequestError } from '../../../lib/api-client';
import { STUDIO_DATA_FILE_LIMIT_BYTES, studioDataExportUrl, useImportStudioData } from '../api/import-studio-data';

function ImportReport({ report }: { report: StudioDataImportReport }) {
  const counts = Object.entries(report.imported).filter(([, n]) => n > 0);
  return (
    <StatusMessage tone={report.missingObjects.length > 0 || report.unmatchedPeople.length > 0 ? 'warning' : 'ok'} title="The studio's data was imported">
      <ul className="mt-1 list-disc pl-5">
        <li>Records: {counts.map(([k, n]) => `${n} ${k.replace(/([A-Z])/g, ' $1').toLowerCase()}`).join(', ') || 'none'}.</li>
        <li>Stored files copied: {report.objectsCopied}.</li>
        {report.missingObjects.length > 0 && (
          <li>
            {report.missingObjects.length} stored file(s) could not be copied: {report.missingObjects[0].reason}
          </li>
        )}
        {report.matchedPeople.length > 0 && <li>People found here: {report.matchedPeople.map((p) => p.name).join(', ')}.</li>}
        {report.unmatchedPeople.length > 0 && (
          <li>Not members here, so their work is kept with nobody named: {report.unmatchedPeople.map((p) => `${p.name} (${p.email})`).join(', ')}.</li>
        )}
        {report.notes.map((n) => (
          <li key={n}>{n}</li>
        ))}
      </ul>
    </StatusMessage>
  );
}

// The owner's backup and move: download every record as one file, or fill an empty studio from one.
export function StudioDataCard() {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [report, setReport] = useState<StudioDataImportReport | null>(null);
  const importData = useImportStudioData({
    mutationConfig: {
      onSuccess: (r) => setReport(r),
      onError: (e) => setProblem(isApiRequestError(e) ? e.message : 'The import failed. Try again.'),
    },
  });

  const choose = async (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.currentTarget.files?.[0];
    event.currentTarget.value = '';
    setProblem(null);
    setReport(null);
    if (!file) return;
    if (file.size > STUDIO_DATA_FILE_LIMIT_BYTES) return setProblem('This file is larger than 50 MB, the most one import takes.');
    let document: unknown;
    try {
      document = JSON.parse(await file.text());
    } catch {
      return setProblem(`“${file.name}” is not a studio data file: it could not be read as JSON.`);
    }
    importData.mutate(document);
  };

  return (
    <Card
      title="Keeping the studio’s data"
      description="Download every record of the studio (library, collections, products, samples, comments, sales) as one file, to keep as a backup or to move the studio. The images stay in storage; the file lists them."
    >
      <div className="flex flex-wrap items-center gap-3">
        <a href={studioDataExportUrl} download className={buttonClasses('secondary')}>
          Download studio data
        </a>
        <label htmlFor={inputId} className={buttonClasses('secondary', 'md', 'cursor-pointer focus-within:ring-2 focus-within:ring-tide')}>
          {importData.isPending ? 'Importing…' : 'Import into this empty studio'}
          <input
            ref={input}
            id={inputId}
            type="file"
            accept="application/json,.json"
            className="sr-only"
            disabled={importData.isPending}
            aria-describedby={`${inputId}-hint`}
            onChange={(e) => void choose(e)}
          />
        </label>
      </div>
      <p id={`${inputId}-hint`} className="mt-2 text-sm text-ink-soft">
        An import only goes into a studio with no originals, motifs, products or collections yet. Its images are copied when you also own the studio the file came from.
      </p>
      <div className="mt-3 flex flex-col gap-2" aria-live="polite">
        {importData.isPending && <StatusMessage tone="info">Importing the studio’s data…</StatusMessage>}
        {problem && <StatusMessage tone="problem">{problem}</StatusMessage>}
        {report && <ImportReport report={report} />}
      </div>
    </Card>
  );
}
