import { getTableColumns } from 'drizzle-orm';
import type { PgColumn } from 'drizzle-orm/pg-core';
import type { StudioDataDocument, StudioDataRecordSection } from '../../../shared/contracts/studio-data';
import { badRequest } from '../../lib/http-error';
import { createIdMap, remapJson, remapText } from './id-remap';
import { sectionSpecs, type SectionSpec } from './section-specs';

type Row = Record<string, unknown>;

export type ImportPlan = {
  rows: Map<StudioDataRecordSection, Row[]>;
  // old key -> new key, for every object a record names
  keys: Map<string, string>;
  notes: string[];
};

export type PlanInput = {
  doc: StudioDataDocument;
  targetStudioId: string;
  // people of the file (their old user id) -> a member of the target studio
  people: ReadonlyMap<string, string>;
};

const problem = (path: string, message: string) =>
  badRequest('studio_data.invalid', `The file has a problem at ${path}: ${message}`, { [path]: message });

const records = (doc: StudioDataDocument, section: StudioDataRecordSection) => doc[section] as unknown as Row[];

function collectIds(doc: StudioDataDocument) {
  const bySection = new Map<StudioDataRecordSection, Set<string>>();
  const all: string[] = [];
  for (const spec of sectionSpecs) {
    const seen = new Set<string>();
    records(doc, spec.section).forEach((r, i) => {
      if (spec.own) {
        const id = String(r[spec.own]).toLowerCase();
        if (seen.has(id)) throw problem(`${spec.section}.${i}.${spec.own}`, 'two records share this id');
        seen.add(id);
        all.push(id);
      }
      for (const g of spec.groupIds ?? []) if (typeof r[g] === 'string') all.push(String(r[g]).toLowerCase());
    });
    bySection.set(spec.section, seen);
  }
  return { bySection, all };
}

/** Turns the document's records into rows for the target studio, every id and key rewritten. */
export function planImport({ doc, targetStudioId, people }: PlanInput): ImportPlan {
  const { bySection, all } = collectIds(doc);
  const ids = createIdMap(all);
  const anyRecord = new Set(all);
  // for ids inside text and JSON: records, the studio itself, and the people found here
  const text = new Map([...ids, [doc.source.studioId.toLowerCase(), targetStudioId], ...people]);
  const keys = new Map<string, string>();
  const notes: string[] = [];
  const rows = new Map<StudioDataRecordSection, Row[]>();
  let interrupted = 0;

  for (const spec of sectionSpecs) {
    const columns = getTableColumns(spec.table) as Record<string, PgColumn>;
    const out = records(doc, spec.section).map((record, i) => {
      const at = (c: string) => `${spec.section}.${i}.${c}`;
      const row: Row = {};
      for (const [name, column] of Object.entries(columns)) {
        if (spec.omit?.includes(name)) continue;
        if (name === 'studioId') {
          row.studioId = targetStudioId;
          continue;
        }
        const value = record[name];
        if (value === undefined) continue;
        row[name] = convert(spec, name, column, value, at(name));
      }
      if (spec.section === 'originals' && (row.status === 'queued' || row.status === 'importing')) {
        // its import job belonged to the other studio and will never run here
        row.status = 'failed';
        row.error = { code: 'studio_data.import_interrupted', message: 'This original was still being imported when the studio\'s data was exported. Upload it again.' };
        interrupted += 1;
      }
      return row;
    });
    rows.set(spec.section, out);
  }
  if (interrupted > 0) notes.push(`${interrupted} original(s) were still importing in the source studio; they are marked as failed here.`);
  return { rows, keys, notes };

  function convert(spec: SectionSpec, name: string, column: PgColumn, value: unknown, path: string): unknown {
    const id = typeof value === 'string' ? value.toLowerCase() : null;
    if (name === spec.own || spec.groupIds?.includes(name)) return ids.get(id!)!;
    const ref = spec.refs?.[name];
    if (ref) {
      if (!id || !bySection.get(ref)!.has(id)) throw problem(path, `it names a record of "${ref}" that is not in the file`);
      return ids.get(id);
    }
    const optional = spec.optionalRefs?.[name];
    if (optional) return id && bySection.get(optional)!.has(id) ? ids.get(id) : null;
    if (spec.softRefs?.includes(name)) return id && ids.has(id) ? ids.get(id) : value;
    if (spec.looseRefs?.includes(name)) return id && anyRecord.has(id) ? ids.get(id) : null;
    if (spec.people?.includes(name)) return id ? (people.get(id) ?? null) : null;
    if (spec.json?.includes(name)) return remapJson(value, text);
    if (spec.keys?.some((k) => k.column === name)) {
      if (typeof value !== 'string') return value;
      const next = remapText(value, text);
      keys.set(value, next);
      return next;
    }
    if (column.dataType === 'date' && value !== null) {
      const when = new Date(String(value));
      if (Number.isNaN(when.getTime())) throw problem(path, 'this is not a date-time');
      return when;
    }
    return value;
  }
}
