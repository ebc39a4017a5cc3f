import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import type { SaleRow } from '../../../shared/sales/validate-row';
import type { Database } from '../../db/client';
import { motifs, productMotifs, products, productVariants, salesImports, salesRows, studios, studioTemplates, users } from '../../db/schema/index';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

export type SkuEntry = { variantId: string; productId: string };
export type ImportRow = typeof salesImports.$inferSelect;

// ~5,000 rows a statement: arrays travel as ten parameters, so no parameter limit applies.
const BATCH = 5_000;

export function createSalesRepository(db: Database) {
  return {
    db,

    async skuIndex(studioId: string): Promise<Map<string, SkuEntry>> {
      const rows = await db
        .select({ sku: productVariants.sku, variantId: productVariants.id, productId: productVariants.productId })
        .from(productVariants)
        .where(and(eq(productVariants.studioId, studioId), sql`${productVariants.sku} is not null`));
      return new Map(rows.map((r) => [r.sku!.toLowerCase(), { variantId: r.variantId, productId: r.productId }]));
    },

    async settings(studioId: string) {
      const [row] = await db.select({ mapping: studios.salesColumnMapping, splitRule: studios.salesSplitRule }).from(studios).where(eq(studios.id, studioId));
      return row ?? { mapping: null, splitRule: 'even' as const };
    },

    async setSplitRule(studioId: string, splitRule: 'even' | 'area') {
      await db.update(studios).set({ salesSplitRule: splitRule }).where(eq(studios.id, studioId));
    },

    async findByHash(studioId: string, sha256: string) {
      const [row] = await db.select().from(salesImports).where(and(eq(salesImports.studioId, studioId), eq(salesImports.fileSha256, sha256)));
      return row ?? null;
    },

    async insertImport(tx: Tx, values: typeof salesImports.$inferInsert) {
      const [row] = await tx.insert(salesImports).values(values).returning();
      return row;
    },

    async finishImport(tx: Tx, id: string, values: Pick<ImportRow, 'rowCount' | 'report'>) {
      await tx.update(salesImports).set(values).where(eq(salesImports.id, id));
    },

    async saveMapping(tx: Tx, studioId: string, mapping: Record<string, string>) {
      await tx.update(studios).set({ salesColumnMapping: mapping }).where(eq(studios.id, studioId));
    },

    /**
     * Inserts in batches; a row whose key the studio already holds is skipped. Returns what was
     * written, per currency. Rows keep their SKU and are matched to variants when read: each
     * stored variant and product reference would cost a foreign-key check per row, which was
     * half of a 50,000-row import's time in the sales bench.
     */
    async insertRows(tx: Tx, studioId: string, importId: string, rows: readonly SaleRow[]) {
      const totals = new Map<string, { rows: number; units: number; revenueMinor: number }>();
      for (let start = 0; start < rows.length; start += BATCH) {
        const batch = rows.slice(start, start + BATCH);
        const column = <T>(pick: (r: SaleRow) => T) => sql.param(batch.map(pick));
        const result = await tx.execute<{ currency: string; rows: string; units: string; revenue: string }>(sql`
          with written as (
            insert into ${salesRows} (studio_id, import_id, line, sold_on, sku, quantity, revenue_minor, currency, row_key)
            select ${studioId}::uuid, ${importId}::uuid, t.*
            from unnest(
              ${column((r) => r.line)}::int[], ${column((r) => r.soldOn)}::date[], ${column((r) => r.sku)}::text[],
              ${column((r) => r.quantity)}::int[], ${column((r) => r.revenueMinor)}::bigint[], ${column((r) => r.currency)}::text[],
              ${column((r) => r.rowKey)}::text[]
            ) as t
            on conflict (studio_id, row_key) where row_key is not null do nothing
            returning currency, quantity, revenue_minor
          )
          select currency, count(*) as rows, sum(quantity) as units, sum(revenue_minor) as revenue from written group by currency`);
        for (const r of result.rows) {
          const t = totals.get(r.currency) ?? { rows: 0, units: 0, revenueMinor: 0 };
          t.rows += Number(r.rows);
          t.units += Number(r.units);
          t.revenueMinor += Number(r.revenue);
          totals.set(r.currency, t);
        }
      }
      return totals;
    },

    async list(studioId: string) {
      return db
        .select({ import: salesImports, userName: users.name })
        .from(salesImports)
        .leftJoin(users, eq(users.id, salesImports.importedBy))
        .where(eq(salesImports.studioId, studioId))
        .orderBy(desc(salesImports.createdAt));
    },

    async remove(studioId: string, id: string) {
      const [row] = await db.delete(salesImports).where(and(eq(salesImports.id, id), eq(salesImports.studioId, studioId))).returning({ id: salesImports.id, fileName: salesImports.fileName });
      return row ?? null;
    },

    /** Units and revenue per SKU (as the file wrote it, first spelling) and currency. */
    async totalsBySku(studioId: string, from: string, to: string) {
      const result = await db.execute<{ sku: string; currency: string; quantity: string; revenue: string }>(sql`
        select min(r.sku) as sku, r.currency, sum(r.quantity) as quantity, sum(r.revenue_minor) as revenue
        from ${salesRows} r
        where r.studio_id = ${studioId} and r.sold_on between ${from} and ${to}
        group by lower(r.sku), r.currency`);
      return result.rows.map((r) => ({ sku: r.sku, currency: r.currency, quantity: Number(r.quantity), revenueMinor: Number(r.revenue) }));
    },

    /** Per day (and product, through the variant with the row's SKU) and currency. */
    async dailyTotals(studioId: string, from: string, to: string, productIds?: readonly string[]) {
      const result = await db.execute<{ day: string; product_id: string | null; currency: string; quantity: string; revenue: string }>(sql`
        select to_char(r.sold_on, 'YYYY-MM-DD') as day, v.product_id, r.currency, sum(r.quantity) as quantity, sum(r.revenue_minor) as revenue
        from ${salesRows} r
        left join ${productVariants} v on v.studio_id = r.studio_id and lower(v.sku) = lower(r.sku)
        where r.studio_id = ${studioId} and r.sold_on between ${from} and ${to}
          ${productIds ? sql`and v.product_id = any(${sql.param([...productIds])}::uuid[])` : sql``}
        group by 1, 2, 3`);
      return result.rows.map((r) => ({ day: r.day, productId: r.product_id, currency: r.currency, quantity: Number(r.quantity), revenueMinor: Number(r.revenue) }));
    },

    async variants(studioId: string) {
      return db
        .select({ id: productVariants.id, productId: productVariants.productId, name: productVariants.name, sku: productVariants.sku })
        .from(productVariants)
        .where(and(eq(productVariants.studioId, studioId), sql`${productVariants.sku} is not null`));
    },

    async products(studioId: string, ids: readonly string[]) {
      if (ids.length === 0) return [];
      return db
        .select({ id: products.id, name: products.name, stage: products.stage, templateId: products.templateId, layout: products.layout })
        .from(products)
        .where(and(eq(products.studioId, studioId), inArray(products.id, [...ids])));
    },

    async studioTemplate(studioId: string, id: string) {
      const [row] = await db.select({ spec: studioTemplates.spec }).from(studioTemplates).where(and(eq(studioTemplates.id, id), eq(studioTemplates.studioId, studioId)));
      return row?.spec ?? null;
    },

    async motifNames(studioId: string, ids: readonly string[]) {
      if (ids.length === 0) return new Map<string, string>();
      const rows = await db.select({ id: motifs.id, name: motifs.name }).from(motifs).where(and(eq(motifs.studioId, studioId), inArray(motifs.id, [...ids])));
      return new Map(rows.map((r) => [r.id, r.name]));
    },

    async motifExists(studioId: string, id: string) {
      const [row] = await db.select({ id: motifs.id }).from(motifs).where(and(eq(motifs.id, id), eq(motifs.studioId, studioId)));
      return Boolean(row);
    },

    async productsUsingMotif(studioId: string, motifId: string): Promise<string[]> {
      const rows = await db
        .selectDistinct({ id: products.id })
        .from(productMotifs)
        .innerJoin(products, eq(products.id, productMotifs.productId))
        .where(and(eq(productMotifs.motifId, motifId), eq(products.studioId, studioId)));
      return rows.map((r) => r.id);
    },
  };
}

export type SalesRepository = ReturnType<typeof createSalesRepository>;

export function isDuplicateFile(err: unknown): boolean {
  const e = err as { code?: string; constraint?: string; cause?: { code?: string; constraint?: string } };
  const pg = e?.code ? e : e?.cause;
  return pg?.code === '23505' && pg.constraint === 'sales_imports_studio_file_key';
}
