import { and, asc, eq, inArray } from 'drizzle-orm';
import { getTableColumns } from 'drizzle-orm';
import type { PgColumn } from 'drizzle-orm/pg-core';
import {
  STUDIO_DATA_FORMAT,
  STUDIO_DATA_VERSION,
  type StudioDataDocument,
  type StudioDataRecordSection,
} from '../../../shared/contracts/studio-data';
import type { Database } from '../../db/client';
import { memberships, studios, users } from '../../db/schema/index';
import { notFound } from '../../lib/http-error';
import { columnOf, sectionSpecs, type SectionSpec } from './section-specs';

type Row = Record<string, unknown>;

// Timestamps leave as ISO strings; calendar days, numbers and JSON as they are.
function toRecord(spec: SectionSpec, row: Row): Row {
  const out: Row = {};
  const columns = getTableColumns(spec.table) as Record<string, PgColumn>;
  for (const name of Object.keys(columns)) {
    if (name === 'studioId' || spec.omit?.includes(name)) continue;
    const value = row[name];
    out[name] = value instanceof Date ? value.toISOString() : value;
  }
  return out;
}

async function readSection(db: Database, studioId: string, spec: SectionSpec, parentIds: Map<StudioDataRecordSection, string[]>): Promise<Row[]> {
  const table = spec.table;
  if (spec.via) {
    const ids = parentIds.get(spec.via.section) ?? [];
    if (ids.length === 0) return [];
    const rows: Row[] = [];
    // in slices, so a studio with many records stays under Postgres's bind-parameter limit
    for (let i = 0; i < ids.length; i += 5000) {
      const slice = ids.slice(i, i + 5000);
      rows.push(...((await db.select().from(table).where(inArray(columnOf(table, spec.via.column), slice)).orderBy(...spec.order())) as Row[]));
    }
    return rows;
  }
  return (await db.select().from(table).where(eq(columnOf(table, 'studioId'), studioId)).orderBy(...spec.order())) as Row[];
}

function tagsOf(motifs: Row[], products: Row[]) {
  const counts = new Map<string, { motifs: number; products: number }>();
  const add = (tags: unknown, kind: 'motifs' | 'products') => {
    for (const tag of Array.isArray(tags) ? (tags as string[]) : []) {
      const c = counts.get(tag) ?? { motifs: 0, products: 0 };
      c[kind] += 1;
      counts.set(tag, c);
    }
  };
  for (const m of motifs) add(m.tags, 'motifs');
  for (const p of products) add(p.tags, 'products');
  return [...counts.entries()].sort(([a], [b]) => a.localeCompare(b)).map(([tag, c]) => ({ tag, ...c }));
}

// Every stored object the records name, once, with its size where a record knows it.
function objectsOf(sections: Map<StudioDataRecordSection, Row[]>) {
  const objects = new Map<string, number | null>();
  for (const spec of sectionSpecs) {
    for (const row of sections.get(spec.section) ?? []) {
      for (const k of spec.keys ?? []) {
        const key = row[k.column];
        if (typeof key !== 'string') continue;
        const bytes = k.bytes && typeof row[k.bytes] === 'number' ? (row[k.bytes] as number) : null;
        if (!objects.has(key) || (objects.get(key) === null && bytes !== null)) objects.set(key, bytes);
      }
    }
  }
  return [...objects.entries()].map(([key, bytes]) => ({ key, bytes }));
}

// Built in memory: fine for a small studio's metadata (tens of MB at most, see STUDIO_DATA_IMPORT_LIMIT_BYTES).
export async function exportStudioData(db: Database, studioId: string, now = new Date()): Promise<StudioDataDocument> {
  const [studio] = await db.select().from(studios).where(eq(studios.id, studioId)).limit(1);
  if (!studio) throw notFound('That studio');
  const members = await db
    .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.studioId, studioId)))
    .orderBy(asc(memberships.createdAt), asc(users.email));

  const sections = new Map<StudioDataRecordSection, Row[]>();
  const ids = new Map<StudioDataRecordSection, string[]>();
  for (const spec of sectionSpecs) {
    const rows = (await readSection(db, studioId, spec, ids)).map((r) => toRecord(spec, r));
    sections.set(spec.section, rows);
    if (spec.own) ids.set(spec.section, rows.map((r) => r[spec.own!] as string));
  }
  const section = <K extends StudioDataRecordSection>(k: K) => (sections.get(k) ?? []) as unknown as StudioDataDocument[K];

  return {
    format: STUDIO_DATA_FORMAT,
    version: STUDIO_DATA_VERSION,
    exportedAt: now.toISOString(),
    source: { studioId, studioName: studio.name },
    studio: {
      name: studio.name,
      paletteLimit: studio.paletteLimit,
      readyWeeksBeforeLaunch: studio.readyWeeksBeforeLaunch,
      salesColumnMapping: studio.salesColumnMapping ?? null,
      salesSplitRule: studio.salesSplitRule,
    },
    members,
    tags: tagsOf(sections.get('motifs') ?? [], sections.get('products') ?? []),
    originals: section('originals'),
    motifs: section('motifs'),
    motifVersions: section('motifVersions'),
    originalMotifs: section('originalMotifs'),
    collections: section('collections'),
    collectionMotifs: section('collectionMotifs'),
    templates: section('templates'),
    products: section('products'),
    productMotifs: section('productMotifs'),
    variants: section('variants'),
    stageMoves: section('stageMoves'),
    samples: section('samples'),
    samplePhotos: section('samplePhotos'),
    commentThreads: section('commentThreads'),
    comments: section('comments'),
    reviewRequests: section('reviewRequests'),
    reviewDecisions: section('reviewDecisions'),
    salesImports: section('salesImports'),
    salesRows: section('salesRows'),
    activity: section('activity'),
    objects: objectsOf(sections),
  };
}
