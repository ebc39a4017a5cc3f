import { createHash, randomUUID } from 'node:crypto';
import sharp from 'sharp';
import { rgbToOklab } from '../../../shared/colour/oklab';
import { hexToRgb } from '../../../shared/colour/srgb';
import type { Database } from '../../../server/db/client';
import { motifs, motifVersions, originalMotifs, originals, type RightsStatus } from '../../../server/db/schema/index';
import type { ObjectStorage } from '../../../server/lib/storage';
import { recordLibraryChange } from '../../../server/features/motifs/library-changes';
import { motifPngKey, motifThumbKey } from '../../../server/features/originals/motif-keys';

export type SeedMotif = {
  name: string;
  tags?: string[];
  notes?: string;
  sourcePath?: string;
  // Dominant colours, most first; shares default to an even split.
  colours?: { hex: string; share?: number }[];
  dhash?: string;
  width?: number;
  height?: number;
  rightsStatus?: RightsStatus;
  archived?: boolean;
  hiddenInOriginal?: boolean;
  createdAt?: Date;
};

export type SeededOriginal = { originalId: string; motifIds: string[]; keys: string[] };

const CHUNK = 1000;

// Writes motifs straight into the tables an import fills (the import pipeline is far too slow
// for thousands), then records one library change so every process's search index sees them.
// With `storage`, each motif also gets a real PNG and thumbnail object.
export async function seedMotifs(
  db: Database,
  studioId: string,
  specs: readonly SeedMotif[],
  options: { originalName?: string; storage?: ObjectStorage } = {},
): Promise<SeededOriginal> {
  const originalId = randomUUID();
  await db.insert(originals).values({
    id: originalId,
    studioId,
    name: options.originalName ?? 'seeded-original.psd',
    fileKind: 'psd',
    byteSize: 1,
    fileSha256: createHash('sha256').update(originalId).digest('hex'),
    storageKey: `studios/${studioId}/originals/${originalId}/file`,
    status: 'ready',
    phase: 'done',
    percent: 100,
    width: 3000,
    height: 2000,
    layerCount: specs.length,
    lineageId: randomUUID(),
    importedAt: new Date(),
  });
  const motifIds: string[] = [];
  const keys: string[] = [];
  const base = Date.now() - specs.length * 1000;
  for (let start = 0; start < specs.length; start += CHUNK) {
    const chunk = specs.slice(start, start + CHUNK);
    const rows = chunk.map((s, i) => ({
      id: randomUUID(),
      studioId,
      originalId,
      name: s.name,
      sourcePath: s.sourcePath ?? s.name,
      kind: 'group' as const,
      hiddenInOriginal: s.hiddenInOriginal ?? false,
      archived: s.archived ?? false,
      tags: s.tags ?? [],
      notes: s.notes ?? '',
      rightsStatus: s.rightsStatus ?? 'own_work',
      // Spread a second apart so "newest" has an order.
      createdAt: s.createdAt ?? new Date(base + (start + i) * 1000),
    }));
    await db.insert(motifs).values(rows);
    const versions = chunk.map((s, i) => {
      const contentHash = createHash('sha256').update(rows[i].id).digest('hex');
      const colours = s.colours ?? [];
      return {
        motifId: rows[i].id,
        studioId,
        version: 1,
        originalId,
        contentHash,
        dhash: s.dhash ?? contentHash.slice(0, 16),
        pngKey: motifPngKey(studioId, contentHash),
        thumbKey: motifThumbKey(studioId, contentHash),
        pngBytes: 100,
        width: s.width ?? 600,
        height: s.height ?? 450,
        offsetX: 10 * i,
        offsetY: 20,
        opacity: 1,
        blendMode: 'normal',
        colours: colours.map((c) => ({ hex: c.hex, share: c.share ?? 1 / colours.length, oklab: rgbToOklab(hexToRgb(c.hex)) })),
      };
    });
    await db.insert(motifVersions).values(versions);
    await db.insert(originalMotifs).values(rows.map((r, i) => ({ originalId, motifId: r.id, version: 1, sourcePath: r.sourcePath, position: start + i })));
    motifIds.push(...rows.map((r) => r.id));
    if (options.storage) {
      for (const v of versions) {
        const colour = hexToRgb(chunk[versions.indexOf(v)].colours?.[0]?.hex ?? '#808080');
        const png = await sharp({ create: { width: 4, height: 4, channels: 4, background: { ...colour, alpha: 1 } } }).png().toBuffer();
        await options.storage.put(v.pngKey, png, 'image/png');
        await options.storage.put(v.thumbKey, await sharp(png).webp().toBuffer(), 'image/webp');
        keys.push(v.pngKey, v.thumbKey);
      }
    }
  }
  await db.transaction((tx) => recordLibraryChange(tx, studioId, null));
  return { originalId, motifIds, keys };
}
