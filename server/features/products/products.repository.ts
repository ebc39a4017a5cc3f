import { and, desc, eq, inArray } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { motifs, productMotifs, products } from '../../db/schema/index';
import type { Layout } from '../../../shared/scene/layout';
import { recordLibraryChange } from '../motifs/library-changes';

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
          const before = await tx.delete(productMotifs).where(eq(productMotifs.productId, id)).returning({ motifId: productMotifs.motifId });
          if (uses.length) await tx.insert(productMotifs).values(uses.map((u) => ({ ...u, productId: id })));
          // Usage counts feed the library's "most used" and used/unused filters in every process.
          await recordLibraryChange(tx, studioId, [...new Set([...before.map((b) => b.motifId), ...uses.map((u) => u.motifId)])]);
        }
        return row;
      });
    },
    async remove(studioId: string, id: string) {
      await db.transaction(async (tx) => {
        const used = await tx.select({ motifId: productMotifs.motifId }).from(productMotifs).where(eq(productMotifs.productId, id));
        await tx.delete(products).where(and(eq(products.studioId, studioId), eq(products.id, id)));
        if (used.length) await recordLibraryChange(tx, studioId, [...new Set(used.map((u) => u.motifId))]);
      });
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
