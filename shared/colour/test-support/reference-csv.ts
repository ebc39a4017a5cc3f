// Test-only helper (uses node:fs): reads the team's reference tables from <repo>/../shared/reference,
// where CI places them beside the cloned repository.
import { readFileSync } from 'node:fs';

export type CsvRow = Record<string, string>;

const REFERENCE_DIR = new URL('../../../../shared/reference/', import.meta.url);

export function readReferenceCsv(fileName: string): CsvRow[] {
  const text = readFileSync(new URL(fileName, REFERENCE_DIR), 'utf8');
  const [header, ...rows] = parseCsv(text);
  return rows
    .filter((cells) => cells.some((c) => c !== ''))
    .map((cells) => Object.fromEntries(header.map((name, i) => [name, cells[i] ?? ''])));
}

/** RFC 4180 fields: quoted fields may hold commas, newlines and doubled quotes. */
export function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  const endField = () => {
    row.push(field);
    field = '';
  };
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch !== '"') field += ch;
      else if (text[i + 1] === '"') field += text[++i];
      else quoted = false;
    } else if (ch === '"') {
      quoted = true;
    } else if (ch === ',') {
      endField();
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && text[i + 1] === '\n') i++;
      endField();
      rows.push(row);
      row = [];
    } else {
      field += ch;
    }
  }
  if (field !== '' || row.length > 0) {
    endField();
    rows.push(row);
  }
  return rows;
}
