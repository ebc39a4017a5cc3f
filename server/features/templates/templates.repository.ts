import { and, eq, sql } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { products, studioTemplates } from '../../db/schema/index';
import type { Template } from '../../../shared/templates/template-schema';

export function createTemplatesRepository(db: Database) {
  return {
    async listStudio(studioId: string) {
      return db.select().from(studioTemplates).where(eq(studioTemplates.studioId, studioId)).orderBy(studioTemplates.createdAt);
    },
    async find(studioId: string, id: string) {
      const [row] = await db.select().from(studioTemplates).where(and(eq(studioTemplates.studioId, studioId), eq(studioTemplates.id, id))).limit(1);
      return row ?? null;
    },
    async insert(studioId: string, id: string, spec: Template) {
      const [row] = await db.insert(studioTemplates).values({ id, studioId, spec }).returning();
      return row;
    },
    async update(studioId: string, id: string, spec: Template) {
      const [row] = await db
        .update(studioTemplates)
        .set({ spec, updatedAt: new Date() })
        .where(and(eq(studioTemplates.studioId, studioId), eq(studioTemplates.id, id)))
        .returning();
      return row ?? null;
    },
    async setGuideImageKey(studioId: string, id: string, key: string | null) {
      const [row] = await db
        .update(studioTemplates)
        .set({ guideImageKey: key, updatedAt: new Date() })
        .where(and(eq(studioTemplates.studioId, studioId), eq(studioTemplates.id, id)))
        .returning();
      return row ?? null;
    },
    async remove(studioId: string, id: string) {
      await db.delete(studioTemplates).where(and(eq(studioTemplates.studioId, studioId), eq(studioTemplates.id, id)));
    },
    async productCounts(studioId: string) {
      const rows = await db
        .select({ templateId: products.templateId, n: sql<number>`count(*)::int` })
        .from(products)
        .where(eq(products.studioId, studioId))
        .groupBy(products.templateId);
      return new Map(rows.map((r) => [r.templateId, r.n]));
    },
  };
}

export type TemplatesRepository = ReturnType<typeof createTemplatesRepository>;
