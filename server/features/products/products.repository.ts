import { and, desc, eq, inArray } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { motifs, productMotifs, products } from '../../db/schema/index';
import type { Layout } from '../../../shared/scene/layout';

export type ProductRow = typeof products.$inferSelect;
export type MotifUse = { motifId: string; placementId: string; version: number };

export function createProductsRepository(db: Database) {
  return {
    async list(studioId: string) {
      return db.select().from(products).where(eq(products.studioId, studioId)).orderBy(desc(products.updatedAt));
    },
    async find(studioId: string, id: string) {
      const [row] = await db.select().from(products).where(and(eq(products.studioId, studioId), eq(products.id, id))).limit(1);
      return row ?? null;
    },
    async insert(values: { studioId: string; name: string; templateId: string; layout: Layout; createdBy: string }) {
      const [row] = await db.insert(products).values(values).returning();
      return row;
    },
    // Saves only over the revision the editor loaded; null means someone saved first.
    async saveIfRevision(studioId: string, id: string, revision: number, patch: { name?: string; notes?: string; layout?: Layout }, uses: MotifUse[] | null) {
      return db.transaction(async (tx) => {
        const [row] = await tx
          .update(products)
          .set({ ...patch, revision: revision + 1, updatedAt: new Date() })
          .where(and(eq(products.studioId, studioId), eq(products.id, id), eq(products.revision, revision)))
          .returning();
        if (!row) return null;
        if (uses) {
          await tx.delete(productMotifs).where(eq(productMotifs.productId, id));
          if (uses.length) await tx.insert(productMotifs).values(uses.map((u) => ({ ...u, productId: id })));
        }
        return row;
      });
    },
    async remove(studioId: string, id: string) {
      await db.delete(products).where(and(eq(products.studioId, studioId), eq(products.id, id)));
    },
    async motifsOfStudio(studioId: string, ids: string[]) {
      if (ids.length === 0) return [];
      return db
        .select({ id: motifs.id, name: motifs.name, currentVersion: motifs.currentVersion, rightsStatus: motifs.rightsStatus, archived: motifs.archived })
        .from(motifs)
        .where(and(eq(motifs.studioId, studioId), inArray(motifs.id, ids)));
    },
    async usesOf(productId: string) {
      return db.select().from(productMotifs).where(eq(productMotifs.productId, productId));
    },
  };
}

export type ProductsRepository = ReturnType<typeof createProductsRepository>;
