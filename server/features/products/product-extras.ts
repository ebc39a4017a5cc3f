import { and, count, eq, inArray, sql } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { collections, productVariants, samples } from '../../db/schema/index';
import type { SampleVerdict } from '../../db/schema/product-life';

export type ProductExtras = { collectionName: string | null; variantCount: number; latestSampleVerdict: SampleVerdict | null };

// What a product list row shows beyond the product's own columns: its collection's name,
// how many variants it has and the verdict of its latest sample.
export async function productExtras(db: Database, studioId: string, rows: { id: string; collectionId: string | null }[]): Promise<Map<string, ProductExtras>> {
  const out = new Map<string, ProductExtras>();
  if (rows.length === 0) return out;
  const ids = rows.map((r) => r.id);
  const collectionIds = [...new Set(rows.flatMap((r) => (r.collectionId ? [r.collectionId] : [])))];
  const [names, variantCounts, verdicts] = await Promise.all([
    collectionIds.length
      ? db.select({ id: collections.id, name: collections.name }).from(collections).where(and(eq(collections.studioId, studioId), inArray(collections.id, collectionIds)))
      : Promise.resolve([]),
    db
      .select({ productId: productVariants.productId, n: count() })
      .from(productVariants)
      .where(and(eq(productVariants.studioId, studioId), inArray(productVariants.productId, ids)))
      .groupBy(productVariants.productId),
    // the latest sample is the one ordered last (ties: recorded last)
    db
      .selectDistinctOn([samples.productId], { productId: samples.productId, verdict: samples.verdict })
      .from(samples)
      .where(and(eq(samples.studioId, studioId), inArray(samples.productId, ids)))
      .orderBy(samples.productId, sql`${samples.orderedOn} desc`, sql`${samples.createdAt} desc`),
  ]);
  const nameOf = new Map(names.map((c) => [c.id, c.name]));
  const countOf = new Map(variantCounts.map((v) => [v.productId, Number(v.n)]));
  const verdictOf = new Map(verdicts.map((v) => [v.productId, v.verdict]));
  for (const r of rows) {
    out.set(r.id, {
      collectionName: r.collectionId ? (nameOf.get(r.collectionId) ?? null) : null,
      variantCount: countOf.get(r.id) ?? 0,
      latestSampleVerdict: verdictOf.get(r.id) ?? null,
    });
  }
  return out;
}

// The verdict that decides the sample gate; read inside the moving transaction.
export async function latestSampleVerdict(db: Database | Parameters<Parameters<Database['transaction']>[0]>[0], studioId: string, productId: string): Promise<SampleVerdict | null> {
  const [row] = await db
    .select({ verdict: samples.verdict })
    .from(samples)
    .where(and(eq(samples.studioId, studioId), eq(samples.productId, productId)))
    .orderBy(sql`${samples.orderedOn} desc`, sql`${samples.createdAt} desc`)
    .limit(1);
  return row?.verdict ?? null;
}
