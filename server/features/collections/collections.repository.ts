import { and, asc, eq, sql } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { collectionMotifs, collections } from '../../db/schema/index';
import { recordLibraryChange } from '../motifs/library-changes';

export type CollectionRow = typeof collections.$inferSelect;
export type CollectionFields = Partial<Pick<typeof collections.$inferInsert, 'name' | 'notes' | 'seasonStart' | 'seasonEnd' | 'launchDate'>>;

const motifCount = sql<number>`(select count(*)::int from ${collectionMotifs} where ${collectionMotifs.collectionId} = ${collections.id})`;

export function isNameTaken(err: unknown): boolean {
  const e = err as { code?: string; constraint?: string; cause?: { code?: string; constraint?: string } };
  const pg = e?.code ? e : e?.cause;
  return pg?.code === '23505' && pg.constraint === 'collections_studio_name_key';
}

export function createCollectionsRepository(db: Database) {
  return {
    async list(studioId: string) {
      return db.select({ collection: collections, motifCount }).from(collections).where(eq(collections.studioId, studioId)).orderBy(asc(collections.name));
    },

    async find(studioId: string, id: string) {
      const [row] = await db.select({ collection: collections, motifCount }).from(collections).where(and(eq(collections.id, id), eq(collections.studioId, studioId)));
      return row ?? null;
    },

    async insert(studioId: string, fields: CollectionFields & { name: string }) {
      return db.transaction(async (tx) => {
        const [row] = await tx.insert(collections).values({ studioId, ...fields }).returning();
        // No motif changed, but facet names are re-read on every library change.
        await recordLibraryChange(tx, studioId, []);
        return row;
      });
    },

    async update(studioId: string, id: string, fields: CollectionFields) {
      return db.transaction(async (tx) => {
        const [row] = await tx
          .update(collections)
          .set({ ...fields, updatedAt: new Date() })
          .where(and(eq(collections.id, id), eq(collections.studioId, studioId)))
          .returning();
        if (row) await recordLibraryChange(tx, studioId, []);
        return row ?? null;
      });
    },

    // The motifs stay; only the grouping goes.
    async delete(studioId: string, id: string) {
      return db.transaction(async (tx) => {
        const members = await tx.select({ motifId: collectionMotifs.motifId }).from(collectionMotifs).where(eq(collectionMotifs.collectionId, id));
        const [row] = await tx.delete(collections).where(and(eq(collections.id, id), eq(collections.studioId, studioId))).returning({ id: collections.id });
        if (!row) return false;
        await recordLibraryChange(tx, studioId, members.map((m) => m.motifId));
        return true;
      });
    },

    async firstMotifIds(collectionId: string, limit: number) {
      const rows = await db
        .select({ motifId: collectionMotifs.motifId })
        .from(collectionMotifs)
        .where(eq(collectionMotifs.collectionId, collectionId))
        .orderBy(asc(collectionMotifs.addedAt), asc(collectionMotifs.motifId))
        .limit(limit);
      return rows.map((r) => r.motifId);
    },

    async countMotifs(collectionId: string) {
      const [row] = await db.select({ n: sql<number>`count(*)::int` }).from(collectionMotifs).where(eq(collectionMotifs.collectionId, collectionId));
      return row?.n ?? 0;
    },
  };
}

export type CollectionsRepository = ReturnType<typeof createCollectionsRepository>;
