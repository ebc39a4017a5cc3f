import { and, eq, param, sql } from 'drizzle-orm';
import { hexToRgb } from '../../../shared/colour/srgb';
import { rgbToLab } from '../../../shared/colour/lab';
import type { PaletteEntry } from '../../../shared/library/colour-match';
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
// only the given motifs when ids are passed.
export async function loadLibraryRecords(db: Database, studioId: string, ids?: readonly string[]): Promise<LibraryRecord[]> {
  const inStudio = db.select({ id: motifs.id }).from(motifs).where(eq(motifs.studioId, studioId));
  const scope = ids ? sql`in (select unnest(${param(ids)}::uuid[]))` : sql`in (${inStudio})`;
  const links = db
    .select({ motifId: originalMotifs.motifId, ids: sql<string[]>`array_agg(distinct ${originalMotifs.originalId})::text[]`.as('original_ids') })
    .from(originalMotifs)
    .where(sql`${originalMotifs.motifId} ${scope}`)
    .groupBy(originalMotifs.motifId)
    .as('links');
  const members = db
    .select({ motifId: collectionMotifs.motifId, ids: sql<string[]>`array_agg(${collectionMotifs.collectionId})::text[]`.as('collection_ids') })
    .from(collectionMotifs)
    .where(sql`${collectionMotifs.motifId} ${scope}`)
    .groupBy(collectionMotifs.motifId)
    .as('members');
  const rows = await db
    .select({ motif: motifs, version: motifVersions, originalName: originals.name, originalIds: links.ids, collectionIds: members.ids })
    .from(motifs)
    .innerJoin(motifVersions, and(eq(motifVersions.motifId, motifs.id), eq(motifVersions.version, motifs.currentVersion)))
    .innerJoin(originals, eq(originals.id, motifs.originalId))
    .leftJoin(links, eq(links.motifId, motifs.id))
    .leftJoin(members, eq(members.motifId, motifs.id))
    .where(ids ? and(eq(motifs.studioId, studioId), sql`${motifs.id} = any(${param(ids)}::uuid[])`) : eq(motifs.studioId, studioId));
  const usage = await motifUsageCounts(studioId, ids);
  return rows.map((r) => ({
    motif: r.motif,
    version: r.version,
    originalName: r.originalName,
    originalIds: r.originalIds?.length ? r.originalIds : [r.motif.originalId],
    collectionIds: r.collectionIds ?? [],
    usageCount: usage.get(r.motif.id) ?? 0,
    palette: paletteOf(r.version),
    nameKey: r.motif.name.normalize('NFKD').toLowerCase(),
    createdMs: r.motif.createdAt.getTime(),
  }));
}

export async function loadCollectionNames(db: Database, studioId: string): Promise<Map<string, string>> {
  const rows = await db.select({ id: collections.id, name: collections.name }).from(collections).where(eq(collections.studioId, studioId));
  return new Map(rows.map((r) => [r.id, r.name]));
}
