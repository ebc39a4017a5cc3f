import { and, eq, inArray, sql } from 'drizzle-orm';
import type { MotifUsage } from '../../../shared/contracts/motifs';
import type { Database } from '../../db/client';
import { productMotifs, products } from '../../db/schema/index';

// Where motifs are used: the placements products record at every save (product_motifs).
// Saving a product calls recordLibraryChange, so "most used" and used/unused stay fresh.
// Delete refuses a motif whenever motifUsage lists anything.
export async function motifUsage(db: Database, studioId: string, motifId: string): Promise<MotifUsage[]> {
  return db
    .select({ productId: products.id, productName: products.name, stage: products.stage, placementId: productMotifs.placementId, version: productMotifs.version })
    .from(productMotifs)
    .innerJoin(products, eq(products.id, productMotifs.productId))
    .where(and(eq(products.studioId, studioId), eq(productMotifs.motifId, motifId)))
    .orderBy(products.name, productMotifs.placementId);
}

// Number of placements per motif, for the motifs given (all of the studio's when omitted).
export async function motifUsageCounts(db: Database, studioId: string, motifIds?: readonly string[]): Promise<Map<string, number>> {
  if (motifIds && motifIds.length === 0) return new Map();
  const rows = await db
    .select({ motifId: productMotifs.motifId, n: sql<number>`count(*)::int` })
    .from(productMotifs)
    .innerJoin(products, eq(products.id, productMotifs.productId))
    .where(motifIds ? and(eq(products.studioId, studioId), inArray(productMotifs.motifId, [...motifIds])) : eq(products.studioId, studioId))
    .groupBy(productMotifs.motifId);
  return new Map(rows.map((r) => [r.motifId, r.n]));
}
