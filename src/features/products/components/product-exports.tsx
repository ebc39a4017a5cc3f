import { useEffect, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { ExportStatusView } from '@shared/contracts/exports';
import type { ProductDetail } from '@shared/contracts/products';
import { cautionsFor } from '@shared/exports/cautions';
import { Button, buttonClasses } from '../../../components/ui/button';
import { ErrorState } from '../../../components/ui/error-state';
import { ProgressBar } from '../../../components/ui/progress-bar';
import { RadioGroup } from '../../../components/ui/radio-group';
import { StatusMessage } from '../../../components/ui/status-message';
import { formatBytes } from '../../originals/file-check';
import { exportDownloadUrl, productExportsKey, useCreateProductExport, useExport, useProductExports } from '../api/product-exports';

type Kind = 'print-file' | 'bundle';
type Paper = 'a4' | 'letter';

const kindOptions = [
  { value: 'print-file', label: 'Print file only', hint: 'The file the printer asks for, at the template’s exact size and DPI.' },
  { value: 'bundle', label: 'Full pack (zip)', hint: 'Print files for each variant, previews, a proof sheet to print at actual size (also offered on its own), a manifest and the cautions.' },
] as const;
const paperOptions = [
  { value: 'a4', label: 'A4' },
  { value: 'letter', label: 'US Letter' },
] as const;

const fileLabels: Record<string, string> = {
  'bundle.zip': 'Full pack (zip)',
  'print-file.png': 'Print file (PNG)',
  'print-file.jpg': 'Print file (JPEG)',
  'proof-sheet-a4.pdf': 'Proof sheet (PDF, A4: print at actual size)',
  'proof-sheet-letter.pdf': 'Proof sheet (PDF, US Letter: print at actual size)',
};

// Makes the printer's files from the saved layout: a job on the server with its own progress,
// the usual cautions for food and heat shown before anything is downloaded.
export function ProductExports({ product, canExport }: { product: ProductDetail; canExport: boolean }) {
  const [kind, setKind] = useState<Kind>('print-file');
  const [paper, setPaper] = useState<Paper>('a4');
  const [exportId, setExportId] = useState<string | null>(null);
  const create = useCreateProductExport();
  const job = useExport(exportId);
  const cautions = cautionsFor(product.template);
  const client = useQueryClient();
  const finished = job.data?.status === 'done' || job.data?.status === 'failed';
  // a job that ends joins the list of earlier ones
  useEffect(() => {
    if (finished) void client.invalidateQueries({ queryKey: productExportsKey(product.id) });
  }, [finished, client, product.id]);
  const running = create.isPending || (exportId !== null && job.data?.status !== 'done' && job.data?.status !== 'failed' && !job.isError);

  const start = () => {
    setExportId(null);
    create.mutate({ productId: product.id, request: { kind, paper } }, { onSuccess: ({ id }) => setExportId(id) });
  };

  return (
    <div className="flex flex-col gap-4">
      <section aria-labelledby="export-cautions" className="rounded-md border border-ochre/60 bg-ochre/10 p-3 text-sm">
        <h3 id="export-cautions" className="mb-1 font-semibold text-ink">Before you sell it</h3>
        <ul className="list-disc space-y-1 pl-5 text-ink-soft">
          {cautions.map((line) => <li key={line}>{line}</li>)}
        </ul>
      </section>
      {canExport ? (
        <>
          <div className="grid gap-4 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
            <RadioGroup legend="What to make" name="export-kind" value={kind} options={kindOptions} onChange={setKind} disabled={running} />
            {kind === 'bundle' && <RadioGroup legend="Proof sheet paper" name="export-paper" value={paper} options={paperOptions} onChange={setPaper} disabled={running} />}
          </div>
          <div>
            <Button onClick={start} disabled={running} aria-disabled={running || undefined}>
              {running ? 'Making…' : kind === 'bundle' ? 'Make the full pack' : 'Make the print file'}
            </Button>
          </div>
        </>
      ) : (
        <p className="text-sm text-ink-soft">Reviewers see the product and its cautions; an editor or the owner makes the print files.</p>
      )}
      {create.isError && <ErrorState title="The export could not be started" error={create.error} onRetry={start} />}
      {exportId !== null && job.isError && <ErrorState title="The export’s progress could not be read" error={job.error} onRetry={() => void job.refetch()} />}
      {exportId !== null && job.data && <ExportOutcome job={job.data} />}
      <EarlierExports product={product} except={exportId} />
    </div>
  );
}

const kindNames: Record<ExportStatusView['kind'], string> = { 'print-file': 'Print file', bundle: 'Full pack' };
const when = (iso: string) => new Date(iso).toLocaleString(undefined, { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

// Files made before (on this page or another visit), newest first, with their downloads.
function EarlierExports({ product, except }: { product: ProductDetail; except: string | null }) {
  const list = useProductExports(product.id);
  if (list.isPending) return <p className="text-sm text-ink-soft">Looking for files made earlier…</p>;
  if (list.isError) return <ErrorState title="Files made earlier could not be listed" error={list.error} onRetry={() => void list.refetch()} />;
  const earlier = list.data.exports.filter((e) => e.id !== except);
  if (earlier.length === 0) return except ? null : <p className="text-sm text-ink-soft">No print files made yet for this product.</p>;
  return (
    <section aria-labelledby="earlier-exports">
      <h3 id="earlier-exports" className="mb-1 text-sm font-semibold text-ink">Made earlier</h3>
      <ul className="flex flex-col divide-y divide-sand text-sm">
        {earlier.map((e) => (
          <li key={e.id} className="flex flex-col gap-0.5 py-1.5">
            <div className="flex flex-wrap items-baseline gap-x-3">
              <span className="font-semibold text-ink">{kindNames[e.kind]}</span>
              <span className="text-ink-soft tabular-nums">{when(e.createdAt)}</span>
              {e.productRevision < product.revision && <span className="text-ink-soft">made from an earlier layout (revision {e.productRevision})</span>}
              {e.status === 'failed' && <span className="text-rust">failed: {e.error?.message ?? 'no reason given'}</span>}
              {(e.status === 'queued' || e.status === 'running') && <span className="text-ink-soft">still being made…</span>}
            </div>
            {e.status === 'done' && (
              <div className="flex flex-wrap gap-x-4 gap-y-0.5">
                {e.files.map((file) => (
                  <a key={file.name} className="text-tide-deep underline underline-offset-2" href={exportDownloadUrl(e.id, file.name)} download={file.name}>
                    {fileLabels[file.name] ?? file.name} · {formatBytes(file.bytes)}
                    <span className="sr-only">, made {when(e.createdAt)}</span>
                  </a>
                ))}
              </div>
            )}
          </li>
        ))}
      </ul>
    </section>
  );
}

function ExportOutcome({ job }: { job: ExportStatusView }) {
  if (job.status === 'failed') {
    return <StatusMessage tone="problem" title="The export failed">{job.error?.message ?? 'The server could not render this product. Nothing was lost: open the layout, check the preflight, and try again.'}</StatusMessage>;
  }
  if (job.status !== 'done') {
    return <ProgressBar label={job.status === 'queued' ? 'Waiting for a free worker…' : 'Rendering at print size…'} percent={job.status === 'queued' ? null : job.progress * 100} />;
  }
  return (
    <StatusMessage tone="ok" title="Ready to download">
      <ul className="mt-2 flex flex-col gap-2">
        {job.files.map((file) => (
          <li key={file.name} className="flex flex-wrap items-center gap-3">
            <a className={buttonClasses('secondary', 'sm')} href={exportDownloadUrl(job.id, file.name)} download={file.name}>
              Download {fileLabels[file.name] ?? file.name}
            </a>
            <span className="text-ink-soft tabular-nums">{formatBytes(file.bytes)}</span>
          </li>
        ))}
      </ul>
    </StatusMessage>
  );
}
