// Sales to variants (by SKU, ignoring case), variants to products, products to motifs by each
// product's motif shares. Revenue stays in minor units per currency: currencies are never added.

export type SaleTotal = { sku: string; currency: string; quantity: number; revenueMinor: number };
export type VariantRef = { id: string; productId: string; name: string; sku: string };
export type ProductRef = { id: string; name: string; motifShares: ReadonlyMap<string, number> };

export type Revenue = Record<string, number>;
export type Rolled = { units: number; revenue: Revenue };
export type VariantSales = Rolled & { variantId: string; productId: string; sku: string };
export type ProductSales = Rolled & { productId: string };
export type MotifSales = Rolled & { motifId: string; productIds: string[] };
export type UnmatchedSales = Rolled & { sku: string };

export type RollUp = { variants: VariantSales[]; products: ProductSales[]; motifs: MotifSales[]; unmatched: UnmatchedSales[] };

const addTo = (target: Rolled, units: number, currency: string, revenueMinor: number) => {
  target.units += units;
  target.revenue[currency] = (target.revenue[currency] ?? 0) + revenueMinor;
};

export function rollUpSales(sales: readonly SaleTotal[], variants: readonly VariantRef[], products: readonly ProductRef[]): RollUp {
  const variantBySku = new Map(variants.map((v) => [v.sku.toLowerCase(), v]));
  const productById = new Map(products.map((p) => [p.id, p]));
  const byVariant = new Map<string, VariantSales>();
  const byProduct = new Map<string, ProductSales>();
  const byMotif = new Map<string, MotifSales & { fractions: Revenue }>();
  const unmatched = new Map<string, UnmatchedSales>();

  for (const sale of sales) {
    const variant = variantBySku.get(sale.sku.toLowerCase());
    if (!variant) {
      const key = sale.sku.toLowerCase();
      const u = unmatched.get(key) ?? { sku: sale.sku, units: 0, revenue: {} };
      addTo(u, sale.quantity, sale.currency, sale.revenueMinor);
      unmatched.set(key, u);
      continue;
    }
    const v = byVariant.get(variant.id) ?? { variantId: variant.id, productId: variant.productId, sku: variant.sku, units: 0, revenue: {} };
    addTo(v, sale.quantity, sale.currency, sale.revenueMinor);
    byVariant.set(variant.id, v);
    const p = byProduct.get(variant.productId) ?? { productId: variant.productId, units: 0, revenue: {} };
    addTo(p, sale.quantity, sale.currency, sale.revenueMinor);
    byProduct.set(variant.productId, p);
  }

  // Motifs from product totals, so each product's shares are applied once per currency.
  for (const p of byProduct.values()) {
    const shares = productById.get(p.productId)?.motifShares ?? new Map<string, number>();
    for (const [motifId, share] of shares) {
      const m = byMotif.get(motifId) ?? { motifId, productIds: [], units: 0, revenue: {}, fractions: {} };
      m.units += p.units * share;
      for (const [currency, minor] of Object.entries(p.revenue)) m.fractions[currency] = (m.fractions[currency] ?? 0) + minor * share;
      m.productIds.push(p.productId);
      byMotif.set(motifId, m);
    }
  }
  // Rounded to whole minor units only after summing, so no product's rounding piles up.
  const motifs = [...byMotif.values()].map(({ fractions, ...m }) => ({
    ...m,
    revenue: Object.fromEntries(Object.entries(fractions).map(([c, v]) => [c, Math.round(v)])),
  }));
  return { variants: [...byVariant.values()], products: [...byProduct.values()], motifs, unmatched: [...unmatched.values()] };
}

/** Highest units first, then highest revenue in `currency`, then the id, so ties keep one order. */
export function rankSales<T extends Rolled>(items: readonly T[], currency: string | null, idOf: (t: T) => string): T[] {
  const revenue = (t: T) => (currency ? (t.revenue[currency] ?? 0) : 0);
  return [...items].sort((a, b) => b.units - a.units || revenue(b) - revenue(a) || idOf(a).localeCompare(idOf(b)));
}
