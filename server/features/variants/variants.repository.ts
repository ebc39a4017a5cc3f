import { and, asc, eq, ne, sql, type SQL } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { products, productVariants } from '../../db/schema/index';
import { recordActivity } from '../activity/record-activity';

export type VariantRow = typeof productVariants.$inferSelect;
export type VariantFields = { name?: string; sku?: string | null; options?: Record<string, string>; position?: number };
type Actor = { studioId: string; userId: string };

export function isSkuTaken(err: unknown): boolean {
  const e = err as { code?: string; constraint?: string; cause?: { code?: string; constraint?: string } };
  const pg = e?.code ? e : e?.cause;
  return pg?.code === '23505' && pg.constraint === 'product_variants_studio_sku_key';
}

export function createVariantsRepository(db: Database) {
  // Each change to a product's variants writes one line of the studio's activity in its transaction.
  async function changed(actor: Actor, productId: string, summary: string, work: (tx: Parameters<Parameters<Database['transaction']>[0]>[0]) => Promise<VariantRow | null>) {
    return db.transaction(async (tx) => {
      const row = await work(tx);
      if (row) await recordActivity(tx, { studioId: actor.studioId, actorId: actor.userId, kind: 'product.variants_changed', subjectType: 'product', subjectId: productId, summary, data: { variantId: row.id, sku: row.sku } });
      return row;
    });
  }

  return {
    async product(studioId: string, productId: string) {
      const [row] = await db.select({ id: products.id, name: products.name, templateId: products.templateId }).from(products).where(and(eq(products.studioId, studioId), eq(products.id, productId))).limit(1);
      return row ?? null;
    },
    async list(studioId: string, productId: string) {
      return db.select().from(productVariants).where(and(eq(productVariants.studioId, studioId), eq(productVariants.productId, productId))).orderBy(asc(productVariants.position), asc(productVariants.createdAt));
    },
    async find(studioId: string, productId: string, id: string) {
      const [row] = await db.select().from(productVariants).where(and(eq(productVariants.studioId, studioId), eq(productVariants.productId, productId), eq(productVariants.id, id))).limit(1);
      return row ?? null;
    },
    // Who already sells under this SKU in the studio (case-insensitive), other than `exceptId`.
    async skuHolder(studioId: string, sku: string, exceptId?: string) {
      const where: SQL[] = [eq(productVariants.studioId, studioId), sql`lower(${productVariants.sku}) = lower(${sku})`];
      if (exceptId) where.push(ne(productVariants.id, exceptId));
      const [row] = await db
        .select({ productName: products.name, variantName: productVariants.name })
        .from(productVariants)
        .innerJoin(products, eq(products.id, productVariants.productId))
        .where(and(...where))
        .limit(1);
      return row ?? null;
    },
    async insert(actor: Actor, product: { id: string; name: string }, fields: Required<Pick<VariantFields, 'name' | 'options'>> & VariantFields) {
      return changed(actor, product.id, `added the variant “${fields.name}” to “${product.name}”`, async (tx) => {
        const [{ next }] = await tx.select({ next: sql<number>`coalesce(max(${productVariants.position}) + 1, 0)::int` }).from(productVariants).where(eq(productVariants.productId, product.id));
        const [row] = await tx.insert(productVariants).values({ studioId: actor.studioId, productId: product.id, position: next, ...fields }).returning();
        return row;
      });
    },
    async update(actor: Actor, product: { id: string; name: string }, id: string, fields: VariantFields) {
      return changed(actor, product.id, `changed a variant of “${product.name}”`, async (tx) => {
        const [row] = await tx.update(productVariants).set(fields).where(and(eq(productVariants.studioId, actor.studioId), eq(productVariants.productId, product.id), eq(productVariants.id, id))).returning();
        return row ?? null;
      });
    },
    async remove(actor: Actor, product: { id: string; name: string }, id: string) {
      return changed(actor, product.id, `removed a variant of “${product.name}”`, async (tx) => {
        const [row] = await tx.delete(productVariants).where(and(eq(productVariants.studioId, actor.studioId), eq(productVariants.productId, product.id), eq(productVariants.id, id))).returning();
        return row ?? null;
      });
    },
  };
}

export type VariantsRepository = ReturnType<typeof createVariantsRepository>;
