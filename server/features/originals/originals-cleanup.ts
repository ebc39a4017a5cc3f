import { and, eq, inArray, ne, or } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { motifs, motifVersions, originalMotifs, originals } from '../../db/schema/index';
import type { ObjectStorage } from '../../lib/storage';
import { recordLibraryChange } from '../motifs/library-changes';
import type { OriginalRow } from './originals.repository';

// Deleting removes rows first, then exactly the stored objects no remaining row refers to.
export function createOriginalsCleanup(db: Database, storage: ObjectStorage) {
  async function unreferencedKeys(candidates: string[]): Promise<string[]> {
    if (candidates.length === 0) return [];
    const stillUsed = new Set<string>();
    const versionRows = await db
      .select({ png: motifVersions.pngKey, thumb: motifVersions.thumbKey })
      .from(motifVersions)
      .where(or(inArray(motifVersions.pngKey, candidates), inArray(motifVersions.thumbKey, candidates)));
    for (const r of versionRows) stillUsed.add(r.png).add(r.thumb);
    const originalRows = await db.select({ key: originals.storageKey }).from(originals).where(inArray(originals.storageKey, candidates));
    for (const r of originalRows) stillUsed.add(r.key);
    return candidates.filter((k) => !stillUsed.has(k));
  }

  return {
    unreferencedKeys,

    async deleteOriginal(row: OriginalRow) {
      const candidateKeys = new Set<string>([row.storageKey]);
      await db.transaction(async (tx) => {
        const own = await tx.select({ id: motifs.id }).from(motifs).where(eq(motifs.originalId, row.id));
        const ownIds = own.map((m) => m.id);
        if (ownIds.length) {
          // Motifs this original first yielded but that a later original also yields move to it.
          const elsewhere = await tx
            .select({ motifId: originalMotifs.motifId, originalId: originalMotifs.originalId })
            .from(originalMotifs)
            .where(and(inArray(originalMotifs.motifId, ownIds), ne(originalMotifs.originalId, row.id)));
          const movedTo = new Map(elsewhere.map((e) => [e.motifId, e.originalId]));
          for (const [motifId, originalId] of movedTo) {
            await tx.update(motifs).set({ originalId }).where(eq(motifs.id, motifId));
            await tx.update(motifVersions).set({ originalId }).where(and(eq(motifVersions.motifId, motifId), eq(motifVersions.originalId, row.id)));
          }
          const doomed = ownIds.filter((id) => !movedTo.has(id));
          if (doomed.length) {
            const versions = await tx.select({ png: motifVersions.pngKey, thumb: motifVersions.thumbKey }).from(motifVersions).where(inArray(motifVersions.motifId, doomed));
            for (const v of versions) candidateKeys.add(v.png).add(v.thumb);
            await tx.delete(motifs).where(inArray(motifs.id, doomed));
          }
        }
        // Versions another motif received from this original stay; they point at a survivor.
        const leftover = await tx.select({ motifId: motifVersions.motifId }).from(motifVersions).where(eq(motifVersions.originalId, row.id));
        for (const v of leftover) {
          const [other] = await tx.select({ originalId: originalMotifs.originalId }).from(originalMotifs).where(and(eq(originalMotifs.motifId, v.motifId), ne(originalMotifs.originalId, row.id))).limit(1);
          const target = other?.originalId ?? row.previousOriginalId;
          if (target) await tx.update(motifVersions).set({ originalId: target }).where(and(eq(motifVersions.motifId, v.motifId), eq(motifVersions.originalId, row.id)));
        }
        await tx.update(originals).set({ previousOriginalId: row.previousOriginalId }).where(eq(originals.previousOriginalId, row.id));
        await tx.delete(originals).where(eq(originals.id, row.id));
        // Last in the transaction: its motifs left or moved to another original.
        await recordLibraryChange(tx, row.studioId, ownIds);
      });
      await storage.remove(await unreferencedKeys([...candidateKeys]));
    },
  };
}

export type OriginalsCleanup = ReturnType<typeof createOriginalsCleanup>;
