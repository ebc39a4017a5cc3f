import { useRef, useState } from 'react';
import type { SalesImport, SalesPreviewResponse } from '@shared/contracts/sales';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { StatusMessage } from '../../../components/ui/status-message';
import { useCreateSalesImport } from '../api/create-sales-import';
import { usePreviewSalesImport } from '../api/preview-sales-import';
import { draftFrom, MappingForm, mappingFrom, type DraftMapping } from './mapping-form';
import { formatMinor } from './sales-format';
import { ValidationReport } from './validation-report';

// Choose a CSV → preview → map columns (remembered by the server) → see bad rows → import → result.
export function ImportFlow() {
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<SalesPreviewResponse | null>(null);
  const [draft, setDraft] = useState<DraftMapping | null>(null);
  const [skipBadRows, setSkipBadRows] = useState(false);
  const [done, setDone] = useState<SalesImport | null>(null);
  const previewing = usePreviewSalesImport();
  const importing = useCreateSalesImport({ onSuccess: setDone });

  const choose = (chosen: File | null) => {
    setFile(chosen);
    setPreview(null);
    setDone(null);
    setSkipBadRows(false);
    importing.reset();
    if (!chosen) return;
    previewing.mutate({ file: chosen }, { onSuccess: (p) => { setPreview(p); setDraft(draftFrom(p.mapping ?? p.suggestedMapping)); } });
  };

  const complete = draft ? mappingFrom(draft) : null;
  const checkAgain = () => {
    if (!file || !complete?.ok) return;
    previewing.mutate({ file, mapping: complete.mapping }, { onSuccess: setPreview });
  };
  const validation = preview?.validation ?? null;
  // The check shown was made with this very mapping (not an earlier one).
  const checked = Boolean(validation && complete?.ok && preview?.mapping && JSON.stringify(mappingFrom(draftFrom(preview.mapping))) === JSON.stringify(complete));
  const canImport = checked && validation !== null && validation.goodRowCount > 0 && (validation.badRowCount === 0 || skipBadRows);

  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-center gap-3">
        <input ref={input} type="file" accept=".csv,.tsv,.txt,text/csv" className="sr-only" id="sales-file" onChange={(e) => choose(e.target.files?.[0] ?? null)} />
        <Button variant="secondary" onClick={() => input.current?.click()}>{file ? 'Choose another file' : 'Choose a CSV file'}</Button>
        {file && <span className="break-all text-ink-soft">{file.name}</span>}
      </div>
      {previewing.isPending && <p className="text-ink-soft" role="status">Reading the file…</p>}
      {previewing.isError && <StatusMessage tone="problem" title="This file cannot be read">{previewing.error.message}</StatusMessage>}

      {preview && draft && !done && (
        <>
          <section aria-labelledby="sales-map-heading" className="flex flex-col gap-3">
            <h3 id="sales-map-heading" className="font-semibold text-ink">Which column is which</h3>
            <p className="text-sm text-ink-soft">
              {preview.suggestedFrom === 'saved' ? 'Your saved mapping fits this file.' : 'Guessed from the column names; check each one.'} The mapping is remembered for the next file.
            </p>
            <SampleRows columns={preview.columns} rows={preview.sampleRows} />
            <MappingForm columns={preview.columns} draft={draft} onChange={setDraft} sampleDates={preview.sampleRows.map((r) => r[preview.columns.indexOf(draft.date)] ?? '')} />
            {!complete?.ok && complete && <p className="text-sm text-ochre">Still to choose: {complete.missing.join(', ')}.</p>}
            {complete?.ok && !checked && <Button variant="secondary" className="self-start" onClick={checkAgain} busy={previewing.isPending} busyLabel="Checking…">Check the file with this mapping</Button>}
          </section>
          {checked && validation && (
            <section aria-labelledby="sales-check-heading" className="flex flex-col gap-3">
              <h3 id="sales-check-heading" className="font-semibold text-ink">Check of every row</h3>
              <ValidationReport validation={validation} />
              {validation.badRowCount > 0 && validation.goodRowCount > 0 && (
                <Checkbox checked={skipBadRows} onChange={(e) => setSkipBadRows(e.target.checked)} label={`Import the ${validation.goodRowCount.toLocaleString()} good rows and skip the ${validation.badRowCount.toLocaleString()} others`} hint="The skipped lines are kept in the import’s report." />
              )}
              <Button className="self-start" disabled={!canImport} busy={importing.isPending} busyLabel="Importing…" onClick={() => file && complete?.ok && importing.mutate({ file, mapping: complete.mapping, skipBadRows })}>
                Import {validation.badRowCount > 0 ? 'the good rows' : 'these sales'}
              </Button>
              {importing.isError && <StatusMessage tone="problem" title="Not imported">{importing.error.message}</StatusMessage>}
            </section>
          )}
        </>
      )}
      {done && <ImportResult result={done} />}
    </div>
  );
}

function SampleRows({ columns, rows }: { columns: string[]; rows: string[][] }) {
  return (
    <div className="overflow-x-auto rounded-md border border-sand" tabIndex={0} aria-label="The file's first rows">
      <table className="w-full text-left text-sm">
        <thead>
          <tr className="text-ink-soft">
            <th scope="col" className="px-2 py-1.5 font-semibold">Line</th>
            {columns.map((c, i) => <th key={`${c}-${i}`} scope="col" className="px-2 py-1.5 font-semibold whitespace-nowrap">{c}</th>)}
          </tr>
        </thead>
        <tbody>
          {rows.slice(0, 5).map((r, i) => (
            <tr key={i} className="border-t border-sand">
              <td className="px-2 py-1 tabular-nums text-ink-soft">{i + 2}</td>
              {columns.map((_, j) => <td key={j} className="px-2 py-1 whitespace-nowrap">{r[j] ?? ''}</td>)}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function ImportResult({ result }: { result: SalesImport }) {
  const r = result.report;
  return (
    <StatusMessage tone="ok" title={`Imported ${result.rowCount.toLocaleString()} sales rows from “${result.fileName}”`}>
      <ul className="list-disc pl-5">
        {r.totals.map((t) => <li key={t.currency}>{t.units.toLocaleString()} units, {formatMinor(t.revenueMinor, t.currency)}</li>)}
        {result.skippedRows > 0 && <li>{result.skippedRows.toLocaleString()} bad rows skipped (listed in the import’s report)</li>}
        {r.alreadyImported > 0 && <li>{r.alreadyImported.toLocaleString()} order lines were already imported from an earlier file and were not counted again</li>}
      </ul>
    </StatusMessage>
  );
}
