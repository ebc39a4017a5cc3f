import { and, arrayContains, desc, eq, inArray, type SQL } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { collections, motifs, productMotifs, products, stageMoves } from '../../db/schema/index';
import type { ProductListQuery } from '../../../shared/contracts/products';
import type { Layout } from '../../../shared/scene/layout';
import { recordActivity } from '../activity/record-activity';
import { recordLibraryChange } from '../motifs/library-changes';
import { productExtras } from './product-extras';

export type ProductRow = typeof products.$inferSelect;
export type MotifUse = { motifId: string; placementId: string; version: number };

export function createProductsRepository(db: Database) {
  return {
    async list(studioId: string, filters: ProductListQuery = {}) {
      const where: SQL[] = [eq(products.studioId, studioId)];
      if (filters.stage) where.push(eq(products.stage, filters.stage));
      if (filters.collectionId) where.push(eq(products.collectionId, filters.collectionId));
      if (filters.templateId) where.push(eq(products.templateId, filters.templateId));
      if (filters.tag) where.push(arrayContains(products.tags, [filters.tag.toLowerCase()]));
      return db.select().from(products).where(and(...where)).orderBy(desc(products.updatedAt));
    },
    extras(studioId: string, rows: { id: string; collectionId: string | null }[]) {
      return productExtras(db, studioId, rows);
    },
    async hasCollection(studioId: string, collectionId: string) {
      const [row] = await db.select({ id: collections.id }).from(collections).where(and(eq(collections.studioId, studioId), eq(collections.id, collectionId))).limit(1);
      return Boolean(row);
    },
    async updateDetails(studioId: string, id: string, patch: { name?: string; notes?: string; tags?: string[]; collectionId?: string | null }) {
      const [row] = await db.update(products).set({ ...patch, updatedAt: new Date() }).where(and(eq(products.studioId, studioId), eq(products.id, id))).returning();
      return row ?? null;
    },
    async find(studioId: string, id: string) {
      const [row] = await db.select().from(products).where(and(eq(products.studioId, studioId), eq(products.id, id))).limit(1);
      return row ?? null;
    },
    // A new product starts its stage history and appears in the studio's activity at once.
    async insert(values: { studioId: string; name: string; templateId: string; layout: Layout; createdBy: string }) {
      return db.transaction(async (tx) => {
        const [row] = await tx.insert(products).values(values).returning();
        await tx.insert(stageMoves).values({ studioId: values.studioId, productId: row.id, fromStage: null, toStage: row.stage, movedBy: values.createdBy });
        await recordActivity(tx, {
          studioId: values.studioId,
          actorId: values.createdBy,
          kind: 'product.created',
          subjectType: 'product',
          subjectId: row.id,
          summary: `started “${row.name}”`,
          data: { templateId: row.templateId, stage: row.stage },
        });
        return row;
      });
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
        .select({ id: motifs.id, name: motifs.name, originalId: motifs.originalId, currentVersion: motifs.currentVersion, rightsStatus: motifs.rightsStatus, archived: motifs.archived })
        .from(motifs)
        .where(and(eq(motifs.studioId, studioId), inArray(motifs.id, ids)));
    },
    async usesOf(productId: string) {
      return db.select().from(productMotifs).where(eq(productMotifs.productId, productId));
    },
  };
}

export type ProductsRepository = ReturnType<typeof createProductsRepository>;
