import { and, eq, param, sql } from 'drizzle-orm';
import { hexToRgb } from '../../../shared/colour/srgb';
import { rgbToLab } from '../../../shared/colour/lab';
import type { PaletteEntry } from '../../../shared/library/colour-match';
import type { AnyPgColumn } from 'drizzle-orm/pg-core';
import type { Database } from '../../db/client';
import { collectionMotifs, collections, motifs, motifVersions, originalMotifs, originals } from '../../db/schema/index';
import { motifUsageCounts } from './motif-usage';

export type MotifRow = typeof motifs.$inferSelect;
export type VersionRow = typeof motifVersions.$inferSelect;

// One motif as the library holds it in memory: its rows and what filters and sorts need.
export type LibraryRecord = {
  motif: MotifRow;
  version: VersionRow;
  originalName: string;
  // Every original that yields it (the first one is motif.originalId).
  originalIds: string[];
  collectionIds: string[];
  usageCount: number;
  palette: PaletteEntry[];
  nameKey: string;
  createdMs: number;
};

function paletteOf(version: VersionRow): PaletteEntry[] {
  const palette: PaletteEntry[] = [];
  for (const c of version.colours ?? []) {
    try {
      palette.push({ hex: c.hex, share: c.share, lab: rgbToLab(hexToRgb(c.hex)) });
    } catch {
      // A colour that is not a hex value cannot be searched; the motif still can.
    }
  }
  return palette;
}

// Motif rows of a studio with their current version, original name, originals and collections;
// only the given motifs when ids are passed. Four plain queries joined here rather than one
// with grouped subqueries: each is an index walk from the studio (originals → original_motifs,
// collections → collection_motifs), so the plan stays good even before the tables have
// statistics (one grouped query took 50 s on a freshly seeded 10,000-motif studio).
export async function loadLibraryRecords(db: Database, studioId: string, ids?: readonly string[]): Promise<LibraryRecord[]> {
  const only = (column: AnyPgColumn) => (ids ? sql`${column} = any(${param(ids)}::uuid[])` : undefined);
  const [rows, links, members, usage] = await Promise.all([
    db
      .select({ motif: motifs, version: motifVersions, originalName: originals.name })
      .from(motifs)
      .innerJoin(motifVersions, and(eq(motifVersions.motifId, motifs.id), eq(motifVersions.version, motifs.currentVersion)))
      .innerJoin(originals, eq(originals.id, motifs.originalId))
      .where(and(eq(motifs.studioId, studioId), only(motifs.id))),
    db
      .select({ motifId: originalMotifs.motifId, originalId: originalMotifs.originalId })
      .from(originals)
      .innerJoin(originalMotifs, eq(originalMotifs.originalId, originals.id))
      .where(and(eq(originals.studioId, studioId), only(originalMotifs.motifId))),
    db
      .select({ motifId: collectionMotifs.motifId, collectionId: collectionMotifs.collectionId })
      .from(collections)
      .innerJoin(collectionMotifs, eq(collectionMotifs.collectionId, collections.id))
      .where(and(eq(collections.studioId, studioId), only(collectionMotifs.motifId))),
    motifUsageCounts(db, studioId, ids),
  ]);
  const originalsOf = groupBy(links, (l) => l.motifId, (l) => l.originalId);
  const collectionsOf = groupBy(members, (m) => m.motifId, (m) => m.collectionId);
  return rows.map((r) => ({
    motif: r.motif,
    version: r.version,
    originalName: r.originalName,
    originalIds: [...new Set([r.motif.originalId, ...(originalsOf.get(r.motif.id) ?? [])])],
    collectionIds: collectionsOf.get(r.motif.id) ?? [],
    usageCount: usage.get(r.motif.id) ?? 0,
    palette: paletteOf(r.version),
    nameKey: r.motif.name.normalize('NFKD').toLowerCase(),
    createdMs: r.motif.createdAt.getTime(),
  }));
}

function groupBy<T>(rows: readonly T[], key: (row: T) => string, value: (row: T) => string): Map<string, string[]> {
  const map = new Map<string, string[]>();
  for (const row of rows) {
    const list = map.get(key(row));
    if (list) list.push(value(row));
    else map.set(key(row), [value(row)]);
  }
  return map;
}

export async function loadCollectionNames(db: Database, studioId: string): Promise<Map<string, string>> {
  const rows = await db.select({ id: collections.id, name: collections.name }).from(collections).where(eq(collections.studioId, studioId));
  return new Map(rows.map((r) => [r.id, r.name]));
}
