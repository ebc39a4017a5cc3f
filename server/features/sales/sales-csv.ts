import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { open } from 'node:fs/promises';
import { parse, CsvError } from 'csv-parse';
import type { SalesDelimiter } from '../../../shared/contracts/sales';
import { detectDelimiter } from '../../../shared/sales/suggest-mapping';
import { badRequest, HttpError } from '../../lib/http-error';

const SNIFF_BYTES = 64 * 1024;

const notCsv = (what: string) =>
  new HttpError(415, 'sales.not_csv', `This looks like ${what}, not a CSV file. Export the sales from your shop as CSV (comma, semicolon or tab separated) and choose that file.`);

// Signatures of files people pick by mistake: spreadsheets, archives, documents, images.
const binarySignatures: [number[], string][] = [
  [[0x50, 0x4b, 0x03, 0x04], 'a spreadsheet or ZIP archive (.xlsx, .ods, .numbers)'],
  [[0xd0, 0xcf, 0x11, 0xe0], 'an old Excel file (.xls)'],
  [[0x25, 0x50, 0x44, 0x46], 'a PDF'],
  [[0x89, 0x50, 0x4e, 0x47], 'a PNG image'],
  [[0xff, 0xd8, 0xff], 'a JPEG image'],
  [[0x1f, 0x8b], 'a gzip archive'],
];

export type CsvShape = { delimiter: SalesDelimiter; encoding: 'utf8' | 'latin1' };

/** Reads the file's start: refuses what is not text, and finds its encoding and delimiter. */
export async function sniffSalesCsv(filePath: string, delimiter?: SalesDelimiter): Promise<CsvShape> {
  const handle = await open(filePath, 'r');
  let sample: Buffer;
  try {
    const buffer = Buffer.alloc(SNIFF_BYTES);
    const { bytesRead } = await handle.read(buffer, 0, SNIFF_BYTES, 0);
    sample = buffer.subarray(0, bytesRead);
  } finally {
    await handle.close();
  }
  if (sample.length === 0) throw badRequest('sales.empty_file', 'This file is empty.');
  for (const [signature, what] of binarySignatures) {
    if (signature.every((byte, i) => sample[i] === byte)) throw notCsv(what);
  }
  if (sample.includes(0)) throw notCsv('a binary file');
  // Shops mostly export UTF-8; older ones write Windows-1252, read here as latin-1.
  let encoding: CsvShape['encoding'] = 'utf8';
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(sample, { stream: true });
  } catch {
    encoding = 'latin1';
  }
  const firstLine = sample.toString(encoding).replace(/^\uFEFF/, '').split(/\r\n|\n|\r/, 1)[0] ?? '';
  return { delimiter: delimiter ?? detectDelimiter(firstLine), encoding };
}

export async function sha256OfFile(filePath: string): Promise<string> {
  const hash = createHash('sha256');
  for await (const chunk of createReadStream(filePath)) hash.update(chunk as Buffer);
  return hash.digest('hex');
}

/**
 * Streams the records of a CSV file with the line each starts on (the header is line 1).
 * csv-parse reports the line a record ends on; a quoted field's own line breaks are subtracted
 * (it counts \r and \n of a quoted CRLF each, so they are counted the same way here).
 */
export async function* readSalesRecords(filePath: string, shape: CsvShape): AsyncGenerator<{ record: string[]; line: number }> {
  const parser = createReadStream(filePath).pipe(
    parse({
      delimiter: shape.delimiter,
      encoding: shape.encoding,
      bom: true,
      info: true,
      relax_column_count: true,
      skip_empty_lines: true,
      record_delimiter: ['\r\n', '\n', '\r'],
    }),
  );
  try {
    for await (const { record, info } of parser as AsyncIterable<{ record: string[]; info: { lines: number } }>) {
      let breaks = 0;
      for (const field of record) for (let i = 0; i < field.length; i++) if (field.charCodeAt(i) === 10 || field.charCodeAt(i) === 13) breaks++;
      yield { record, line: info.lines - breaks };
    }
  } catch (err) {
    if (err instanceof CsvError) {
      const where = (err as CsvError & { lines?: number }).lines;
      throw badRequest('sales.csv_malformed', `The file cannot be read as CSV${where ? ` near line ${where}` : ''}: ${err.message.replace(/^Invalid [^:]*: /, '')}`);
    }
    throw err;
  }
}
