import { and, asc, desc, eq, sql } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { collectionMotifs, collections, motifs, motifVersions, originalMotifs, originals } from '../../db/schema/index';
import { recordLibraryChange } from './library-changes';

export type MotifChanges = Partial<
  Pick<typeof motifs.$inferInsert, 'name' | 'tags' | 'notes' | 'rightsStatus' | 'rightsSource' | 'rightsLicence' | 'attributionRequired' | 'archived'>
>;

export function createMotifsRepository(db: Database) {
  return {
    async findWithVersion(studioId: string, id: string, version?: number) {
      const [row] = await db
        .select({ motif: motifs, version: motifVersions })
        .from(motifs)
        .innerJoin(motifVersions, eq(motifVersions.motifId, motifs.id))
        .where(and(eq(motifs.id, id), eq(motifs.studioId, studioId), version ? eq(motifVersions.version, version) : eq(motifVersions.version, motifs.currentVersion)))
        .limit(1);
      return row ?? null;
    },

    async versionsOf(motifId: string) {
      return db
        .select({ version: motifVersions, originalName: originals.name })
        .from(motifVersions)
        .innerJoin(originals, eq(originals.id, motifVersions.originalId))
        .where(eq(motifVersions.motifId, motifId))
        .orderBy(desc(motifVersions.version));
    },

    async originalOf(motifId: string, originalId: string) {
      const [row] = await db
        .select({ id: originals.id, name: originals.name, width: originals.width, height: originals.height, position: originalMotifs.position, sourcePath: originalMotifs.sourcePath })
        .from(originals)
        .leftJoin(originalMotifs, and(eq(originalMotifs.originalId, originals.id), eq(originalMotifs.motifId, motifId)))
        .where(eq(originals.id, originalId))
        .orderBy(asc(originalMotifs.position))
        .limit(1);
      return row ?? null;
    },

    async collectionsOf(motifId: string) {
      return db
        .select({ id: collections.id, name: collections.name })
        .from(collectionMotifs)
        .innerJoin(collections, eq(collections.id, collectionMotifs.collectionId))
        .where(eq(collectionMotifs.motifId, motifId))
        .orderBy(asc(collections.name));
    },

    async update(studioId: string, id: string, changes: MotifChanges) {
      return db.transaction(async (tx) => {
        const [row] = await tx
          .update(motifs)
          .set({ ...changes, updatedAt: new Date() })
          .where(and(eq(motifs.id, id), eq(motifs.studioId, studioId)))
          .returning({ id: motifs.id });
        if (row) await recordLibraryChange(tx, studioId, [id]);
        return Boolean(row);
      });
    },

    // Restoring copies the chosen version as the newest, so the current version is always the
    // highest number: imports number their new versions from it, and products pinned to a
    // version keep what they had. The pixels are shared (keys are content hashes), not copied.
    async restoreVersion(studioId: string, id: string, version: number) {
      return db.transaction(async (tx) => {
        const [motif] = await tx.select().from(motifs).where(and(eq(motifs.id, id), eq(motifs.studioId, studioId))).for('update');
        if (!motif) return { kind: 'not-found' as const };
        const [old] = await tx.select().from(motifVersions).where(and(eq(motifVersions.motifId, id), eq(motifVersions.version, version)));
        if (!old) return { kind: 'not-found' as const };
        if (version === motif.currentVersion) return { kind: 'already-current' as const };
        const [{ latest }] = await tx.select({ latest: sql<number>`max(${motifVersions.version})::int` }).from(motifVersions).where(eq(motifVersions.motifId, id));
        const next = Math.max(latest, motif.currentVersion) + 1;
        const { id: _oldId, createdAt: _oldCreated, ...copy } = old;
        await tx.insert(motifVersions).values({ ...copy, version: next });
        await tx.update(motifs).set({ currentVersion: next, updatedAt: new Date() }).where(eq(motifs.id, id));
        await recordLibraryChange(tx, studioId, [id]);
        return { kind: 'restored' as const, version: next };
      });
    },

    // Removes the motif (its versions, links and memberships cascade) and says which stored
    // objects its versions used.
    async delete(studioId: string, id: string) {
      return db.transaction(async (tx) => {
        const versions = await tx
          .select({ png: motifVersions.pngKey, thumb: motifVersions.thumbKey })
          .from(motifVersions)
          .innerJoin(motifs, eq(motifs.id, motifVersions.motifId))
          .where(and(eq(motifs.id, id), eq(motifs.studioId, studioId)));
        const [row] = await tx.delete(motifs).where(and(eq(motifs.id, id), eq(motifs.studioId, studioId))).returning({ id: motifs.id });
        if (!row) return null;
        await recordLibraryChange(tx, studioId, [id]);
        return [...new Set(versions.flatMap((v) => [v.png, v.thumb]))];
      });
    },
  };
}

export type MotifsRepository = ReturnType<typeof createMotifsRepository>;
