import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import type { VariantOptions } from '../../../shared/contracts/variants';
import type { Database } from '../../db/client';
import { motifs, motifVersions, productExports, productVariants, studios, type ExportError, type ExportFile, type ExportKind, type ExportStatus } from '../../db/schema/index';

export type ExportRow = typeof productExports.$inferSelect;

/** What the renderer and the manifest need of one motif version, always within one studio. */
export type MotifVersionRecord = {
  motifId: string;
  version: number;
  name: string;
  pngKey: string;
  width: number;
  height: number;
  rightsStatus: 'own_work' | 'licensed' | 'public_domain' | 'unknown';
  rightsSource: string;
  rightsLicence: string;
};

export function createExportsRepository(db: Database) {
  return {
    async insert(values: { studioId: string; productId: string; productRevision: number; kind: ExportKind; paper: 'a4' | 'letter'; createdBy: string }) {
      const [row] = await db.insert(productExports).values(values).returning();
      return row;
    },
    async find(studioId: string, id: string) {
      const [row] = await db.select().from(productExports).where(and(eq(productExports.studioId, studioId), eq(productExports.id, id))).limit(1);
      return row ?? null;
    },
    async listForProduct(studioId: string, productId: string, limit: number) {
      return db.select().from(productExports)
        .where(and(eq(productExports.studioId, studioId), eq(productExports.productId, productId)))
        .orderBy(desc(productExports.createdAt), desc(productExports.id))
        .limit(limit);
    },
    async findForJob(id: string) {
      const [row] = await db.select().from(productExports).where(eq(productExports.id, id)).limit(1);
      return row ?? null;
    },
    async update(id: string, patch: { status?: ExportStatus; progress?: number; files?: ExportFile[]; error?: ExportError | null }) {
      await db.update(productExports).set({ ...patch, updatedAt: new Date() }).where(eq(productExports.id, id));
    },
    /** The most colour groups the studio allows a product before preflight points it out. */
    async paletteLimit(studioId: string): Promise<number | undefined> {
      const [row] = await db.select({ paletteLimit: studios.paletteLimit }).from(studios).where(eq(studios.id, studioId)).limit(1);
      return row?.paletteLimit;
    },
    async motifVersions(studioId: string, motifIds: string[]): Promise<MotifVersionRecord[]> {
      if (motifIds.length === 0) return [];
      return db
        .select({
          motifId: motifVersions.motifId, version: motifVersions.version, name: motifs.name, pngKey: motifVersions.pngKey,
          width: motifVersions.width, height: motifVersions.height, rightsStatus: motifs.rightsStatus, rightsSource: motifs.rightsSource, rightsLicence: motifs.rightsLicence,
        })
        .from(motifVersions)
        .innerJoin(motifs, eq(motifs.id, motifVersions.motifId))
        .where(and(eq(motifVersions.studioId, studioId), eq(motifs.studioId, studioId), inArray(motifVersions.motifId, motifIds)));
    },
    /** The product's variants in their shop order, for the bundle's per-variant previews and manifest. */
    async productVariants(studioId: string, productId: string) {
      const rows = await db
        .select({ id: productVariants.id, name: productVariants.name, sku: productVariants.sku, options: productVariants.options })
        .from(productVariants)
        .where(and(eq(productVariants.studioId, studioId), eq(productVariants.productId, productId)))
        .orderBy(asc(productVariants.position), asc(productVariants.createdAt));
      return rows.map((r) => ({ ...r, options: r.options as VariantOptions }));
    },
  };
}

export type ExportsRepository = ReturnType<typeof createExportsRepository>;
