import { salesMappingSchema, type SalesImport, type SalesImportReport, type SalesMapping, type SalesPreviewResponse, type SalesValidation } from '../../../shared/contracts/sales';
import { savedMappingFits, suggestMapping } from '../../../shared/sales/suggest-mapping';
import { createSalesFileCheck, type SaleRow } from '../../../shared/sales/validate-row';
import { badRequest, conflict } from '../../lib/http-error';
import { recordActivity } from '../activity/record-activity';
import { readSalesRecords, sha256OfFile, sniffSalesCsv, type CsvShape } from './sales-csv';
import { isDuplicateFile, type ImportRow, type SalesRepository } from './sales.repository';

export type SalesUpload = { filePath: string; fileName: string };
export type ImportOutcome = { ok: true; import: SalesImport } | { ok: false; validation: SalesValidation };

const SAMPLE_ROWS = 10;
// Rows read before suggesting a mapping: enough dates to tell day-first from month-first.
const SUGGEST_ROWS = 500;

export function parseMappingField(json: string | undefined): SalesMapping | null {
  if (json === undefined || json === '') return null;
  let value: unknown;
  try {
    value = JSON.parse(json);
  } catch {
    throw badRequest('validation.failed', 'Please check the form: the column mapping is not valid JSON', { mapping: 'Not valid JSON' });
  }
  const parsed = salesMappingSchema.safeParse(value);
  if (!parsed.success) {
    const fields = Object.fromEntries(parsed.error.issues.map((i) => [`mapping.${i.path.join('.') || '_'}`, i.message]));
    throw badRequest('validation.failed', `Please check the column mapping: ${parsed.error.issues[0]?.message ?? 'it is incomplete'}`, fields);
  }
  return parsed.data;
}

const fmtDay = (d: Date) => d.toISOString().slice(0, 10);

export function toSalesImport(row: ImportRow, userName: string | null): SalesImport {
  const report = row.report as Partial<SalesImportReport>;
  return {
    id: row.id,
    fileName: row.fileName,
    rowCount: row.rowCount,
    skippedRows: row.skippedRows,
    report: {
      badRowCount: report.badRowCount ?? row.skippedRows,
      badRows: report.badRows ?? [],
      unknownSkus: report.unknownSkus ?? [],
      alreadyImported: report.alreadyImported ?? 0,
      firstDay: report.firstDay ?? null,
      lastDay: report.lastDay ?? null,
      totals: report.totals ?? [],
    },
    importedBy: row.importedBy && userName !== null ? { id: row.importedBy, name: userName } : null,
    createdAt: row.createdAt.toISOString(),
  };
}

export function createSalesImports(repo: SalesRepository) {
  /** Streams the file once: header, sample rows and (with a mapping) every row checked. */
  async function scan(upload: SalesUpload, shape: CsvShape, chooseMapping: (header: string[], sample: string[][]) => SalesMapping | null, skus: ReadonlySet<string>, keep: boolean) {
    let header: string[] | null = null;
    const buffered: { record: string[]; line: number }[] = [];
    const state: { decided: boolean; mapping: SalesMapping | null; check: ReturnType<typeof createSalesFileCheck> | null } = { decided: false, mapping: null, check: null };
    const decide = () => {
      state.decided = true;
      const mapping = chooseMapping(header!, buffered.map((b) => b.record));
      if (mapping) {
        const check = createSalesFileCheck({ header: header!, mapping, knownSku: (s) => skus.has(s) }, keep);
        if (check.missingColumns.length > 0) {
          throw badRequest('sales.columns_missing', `The file has no column ${check.missingColumns.map((c) => `"${c}"`).join(', ')}; check the mapping.`);
        }
        Object.assign(state, { mapping, check });
      }
      for (const b of buffered) state.check?.add(b.record, b.line);
    };
    for await (const { record, line } of readSalesRecords(upload.filePath, shape)) {
      if (header === null) {
        header = record.map((h) => h.trim());
        if (header.every((h) => h === '')) throw badRequest('sales.no_header', 'The first line of the file should name its columns.');
        continue;
      }
      if (!state.decided) {
        buffered.push({ record, line });
        if (buffered.length === SUGGEST_ROWS) decide();
        continue;
      }
      state.check?.add(record, line);
    }
    if (header === null) throw badRequest('sales.empty_file', 'This file has no lines.');
    if (!state.decided) decide();
    const sample = buffered.slice(0, SAMPLE_ROWS).map((b) => b.record);
    return { header, sample, mapping: state.mapping, result: state.check?.result() ?? null };
  }

  const knownSkus = async (studioId: string) => {
    const index = await repo.skuIndex(studioId);
    return { index, set: new Set(index.keys()) };
  };

  return {
    async preview(studioId: string, upload: SalesUpload, given: SalesMapping | null): Promise<SalesPreviewResponse> {
      const [settings, skus] = await Promise.all([repo.settings(studioId), knownSkus(studioId)]);
      const shape = await sniffSalesCsv(upload.filePath, given?.delimiter);
      let suggested: { mapping: Record<string, string>; missing: string[]; from: 'saved' | 'headers' } = { mapping: {}, missing: [], from: 'headers' };
      const { header, sample, mapping, result } = await scan(upload, shape, (head, rows) => {
        const saved = savedMappingFits(settings.mapping, head);
        suggested = saved ? { mapping: saved, missing: [], from: 'saved' } : { ...suggestMapping(head, rows, shape.delimiter), from: 'headers' };
        if (given) return given;
        return suggested.missing.length === 0 ? salesMappingSchema.safeParse(suggested.mapping).data ?? null : null;
      }, skus.set, false);
      return {
        fileName: upload.fileName,
        delimiter: shape.delimiter,
        columns: header,
        sampleRows: sample,
        suggestedMapping: suggested.mapping,
        suggestedFrom: suggested.from,
        missing: given ? [] : suggested.missing,
        mapping: mapping,
        validation: result?.validation ?? null,
      };
    },

    async importFile(studioId: string, userId: string, upload: SalesUpload, mapping: SalesMapping, skipBadRows: boolean): Promise<ImportOutcome> {
      const shape = await sniffSalesCsv(upload.filePath, mapping.delimiter);
      const sha256 = await sha256OfFile(upload.filePath);
      const earlier = await repo.findByHash(studioId, sha256);
      if (earlier) throw duplicateFile(earlier);
      const skus = await knownSkus(studioId);
      const { result } = await scan(upload, shape, () => mapping, skus.set, true);
      const { validation, rows } = result!;
      if (validation.rowCount === 0) throw badRequest('sales.no_rows', 'The file has a header but no sales rows.');
      if (validation.badRowCount > 0 && !skipBadRows) return { ok: false, validation };
      if (rows.length === 0) throw badRequest('sales.no_good_rows', 'No row of this file can be imported; see the reasons for each line.');
      try {
        const row = await repo.db.transaction(async (tx) => {
          const created = await repo.insertImport(tx, { studioId, fileName: upload.fileName, fileSha256: sha256, rowCount: 0, skippedRows: validation.badRowCount, mapping: mapping as Record<string, string>, importedBy: userId });
          const written = await repo.insertRows(tx, studioId, created.id, rows);
          const report = reportOf(validation, rows, written);
          const rowCount = [...written.values()].reduce((s, t) => s + t.rows, 0);
          await repo.finishImport(tx, created.id, { rowCount, report });
          await repo.saveMapping(tx, studioId, mapping as Record<string, string>);
          await recordActivity(tx, {
            studioId,
            actorId: userId,
            kind: 'sales.imported',
            subjectType: 'sales_import',
            subjectId: created.id,
            summary: `imported ${rowCount.toLocaleString('en')} sales rows from "${upload.fileName}"`,
            data: { rowCount, skippedRows: validation.badRowCount, alreadyImported: report.alreadyImported, firstDay: report.firstDay, lastDay: report.lastDay },
          });
          return { ...created, rowCount, report };
        });
        return { ok: true, import: toSalesImport(row, null) };
      } catch (err) {
        if (isDuplicateFile(err)) {
          const again = await repo.findByHash(studioId, sha256);
          if (again) throw duplicateFile(again);
        }
        throw err;
      }
    },
  };
}

function duplicateFile(earlier: ImportRow) {
  return conflict('sales.duplicate_file', `This file was already imported on ${fmtDay(earlier.createdAt)} as "${earlier.fileName}" (import ${earlier.id}); its sales are counted once. Undo that import first to import it again.`);
}

function reportOf(validation: SalesValidation, rows: readonly SaleRow[], written: Map<string, { rows: number; units: number; revenueMinor: number }>): SalesImportReport {
  const writtenRows = [...written.values()].reduce((s, t) => s + t.rows, 0);
  return {
    badRowCount: validation.badRowCount,
    badRows: validation.badRows,
    unknownSkus: validation.unknownSkus,
    alreadyImported: rows.length - writtenRows,
    firstDay: validation.firstDay,
    lastDay: validation.lastDay,
    totals: [...written].map(([currency, t]) => ({ currency, units: t.units, revenueMinor: t.revenueMinor })).sort((a, b) => a.currency.localeCompare(b.currency)),
  };
}
