import type { MotifSales, SalesSplitRule, SalesSummary, SalesSummaryQuery } from '../../../shared/contracts/sales';
import { motifShares } from '../../../shared/sales/motif-shares';
import { rankSales, rollUpSales, type Revenue } from '../../../shared/sales/roll-up';
import { addDays, granularityFor, salesSeries } from '../../../shared/sales/time-buckets';
import { readSavedLayout } from '../../../shared/scene/migrate-layout';
import { findBuiltInTemplate } from '../../../shared/templates/built-in-templates';
import { templateGeometry } from '../../../shared/templates/template-geometry';
import type { Rect } from '../../../shared/geometry';
import { badRequest, notFound } from '../../lib/http-error';
import type { SalesRepository } from './sales.repository';

type ProductRow = Awaited<ReturnType<SalesRepository['products']>>[number];

const today = () => new Date().toISOString().slice(0, 10);

/** The chosen period, by default the twelve months up to today. */
export function salesPeriod(query: Pick<SalesSummaryQuery, 'from' | 'to'>) {
  const to = query.to ?? today();
  const from = query.from ?? addDays(`${Number(to.slice(0, 4)) - 1}${to.slice(4)}`, 1);
  if (Number.isNaN(Date.parse(from)) || Number.isNaN(Date.parse(to))) throw badRequest('validation.failed', 'Please check the query: that is not a date', { from: 'Not a date' });
  if (from > to) throw badRequest('validation.failed', 'Please check the query: the period ends before it starts', { to: 'The period ends before it starts' });
  return { from, to };
}

/** The currency to show revenue in: the asked one, or the one with most units sold. */
function pickCurrency(byCurrency: Map<string, { units: number }>, asked?: string): string | null {
  if (asked) return asked;
  return [...byCurrency].sort((a, b) => b[1].units - a[1].units || a[0].localeCompare(b[0]))[0]?.[0] ?? null;
}

export function createSalesSummaries(repo: SalesRepository) {
  /** Each product's motif shares under the rule; a repeat needs its template's print area. */
  async function sharesOf(studioId: string, rows: readonly ProductRow[], rule: SalesSplitRule) {
    const areas = new Map<string, Rect | undefined>();
    const printArea = async (templateId: string) => {
      if (!areas.has(templateId)) {
        const template = findBuiltInTemplate(templateId) ?? (/^[0-9a-f-]{36}$/i.test(templateId) ? await repo.studioTemplate(studioId, templateId) : null);
        areas.set(templateId, template ? templateGeometry(template).printArea : undefined);
      }
      return areas.get(templateId);
    };
    const shares = new Map<string, Map<string, number>>();
    for (const row of rows) {
      const saved = readSavedLayout(row.layout);
      if (!saved.ok) {
        shares.set(row.id, new Map());
        continue;
      }
      const hasRepeat = saved.layout.placements.some((p) => p.type === 'repeat');
      shares.set(row.id, motifShares(saved.layout, rule, rule === 'area' && hasRepeat ? await printArea(row.templateId) : undefined));
    }
    return shares;
  }

  const revenueIn = (revenue: Revenue, currency: string | null) => (currency ? (revenue[currency] ?? 0) : 0);

  return {
    async summary(studioId: string, query: SalesSummaryQuery): Promise<SalesSummary> {
      const { from, to } = salesPeriod(query);
      const settings = await repo.settings(studioId);
      const splitRule = query.split ?? settings.splitRule;
      const [totals, variants, days] = await Promise.all([repo.totalsBySku(studioId, from, to), repo.variants(studioId), repo.dailyTotals(studioId, from, to)]);
      const variantRefs = variants.map((v) => ({ ...v, sku: v.sku! }));
      const soldSkus = new Set(totals.map((t) => t.sku.toLowerCase()));
      const productIds = [...new Set(variantRefs.filter((v) => soldSkus.has(v.sku.toLowerCase())).map((v) => v.productId))];
      const productRows = await repo.products(studioId, productIds);
      const shares = await sharesOf(studioId, productRows, splitRule);
      const rolled = rollUpSales(totals, variantRefs, productRows.map((p) => ({ id: p.id, name: p.name, motifShares: shares.get(p.id) ?? new Map() })));

      const byCurrency = new Map<string, { units: number; revenueMinor: number }>();
      for (const t of totals) {
        const c = byCurrency.get(t.currency) ?? { units: 0, revenueMinor: 0 };
        c.units += t.quantity;
        c.revenueMinor += t.revenueMinor;
        byCurrency.set(t.currency, c);
      }
      const currency = pickCurrency(byCurrency, query.currency);
      const motifNames = await repo.motifNames(studioId, rolled.motifs.map((m) => m.motifId));
      const productById = new Map(productRows.map((p) => [p.id, p]));
      const variantById = new Map(variantRefs.map((v) => [v.id, v]));
      const totalUnits = totals.reduce((s, t) => s + t.quantity, 0);
      const granularity = granularityFor(from, to);
      const dayTotals = new Map<string, { day: string; units: number; revenueMinor: number }>();
      for (const d of days) {
        const t = dayTotals.get(d.day) ?? { day: d.day, units: 0, revenueMinor: 0 };
        t.units += d.quantity;
        if (d.currency === currency) t.revenueMinor += d.revenueMinor;
        dayTotals.set(d.day, t);
      }
      const rank = <T extends { units: number; revenue: Revenue }>(items: T[], id: (t: T) => string) => rankSales(items, currency, id);
      return {
        from,
        to,
        splitRule,
        currency,
        currencies: [...byCurrency].map(([c, v]) => ({ currency: c, ...v })).sort((a, b) => b.units - a.units || a.currency.localeCompare(b.currency)),
        totals: { units: totalUnits, revenueMinor: currency ? (byCurrency.get(currency)?.revenueMinor ?? 0) : 0 },
        products: rank(rolled.products, (p) => p.productId).map((p) => ({
          productId: p.productId, name: productById.get(p.productId)?.name ?? 'Removed product', stage: productById.get(p.productId)?.stage ?? 'retired', units: p.units, revenueMinor: revenueIn(p.revenue, currency),
        })),
        variants: rank(rolled.variants, (v) => v.variantId).map((v) => ({
          variantId: v.variantId, productId: v.productId, productName: productById.get(v.productId)?.name ?? 'Removed product', name: variantById.get(v.variantId)?.name ?? v.sku, sku: v.sku, units: v.units, revenueMinor: revenueIn(v.revenue, currency),
        })),
        motifs: rank(rolled.motifs, (m) => m.motifId).map((m) => ({
          motifId: m.motifId, name: motifNames.get(m.motifId) ?? 'Removed motif', units: m.units, revenueMinor: revenueIn(m.revenue, currency), shareOfUnits: totalUnits === 0 ? 0 : m.units / totalUnits, productCount: m.productIds.length,
        })),
        unmatched: rank(rolled.unmatched, (u) => u.sku).map((u) => ({ sku: u.sku, units: u.units, revenueMinor: revenueIn(u.revenue, currency) })),
        granularity,
        series: salesSeries([...dayTotals.values()], from, to, granularity),
      };
    },

    async motifSales(studioId: string, motifId: string, query: SalesSummaryQuery): Promise<MotifSales> {
      if (!(await repo.motifExists(studioId, motifId))) throw notFound('That motif');
      const { from, to } = salesPeriod(query);
      const splitRule = query.split ?? (await repo.settings(studioId)).splitRule;
      const productIds = await repo.productsUsingMotif(studioId, motifId);
      const [productRows, days] = await Promise.all([repo.products(studioId, productIds), repo.dailyTotals(studioId, from, to, productIds)]);
      const shares = await sharesOf(studioId, productRows, splitRule);
      const shareOf = (productId: string | null) => (productId ? (shares.get(productId)?.get(motifId) ?? 0) : 0);
      const byCurrency = new Map<string, { units: number }>();
      for (const d of days) byCurrency.set(d.currency, { units: (byCurrency.get(d.currency)?.units ?? 0) + d.quantity * shareOf(d.productId) });
      const currency = pickCurrency(byCurrency, query.currency);
      const perProduct = new Map<string, { units: number; revenue: number }>();
      const perDay = new Map<string, { day: string; units: number; revenueMinor: number }>();
      for (const d of days) {
        const share = shareOf(d.productId);
        const revenue = d.currency === currency ? d.revenueMinor * share : 0;
        const p = perProduct.get(d.productId!) ?? { units: 0, revenue: 0 };
        p.units += d.quantity * share;
        p.revenue += revenue;
        perProduct.set(d.productId!, p);
        const t = perDay.get(d.day) ?? { day: d.day, units: 0, revenueMinor: 0 };
        t.units += d.quantity * share;
        t.revenueMinor += revenue;
        perDay.set(d.day, t);
      }
      const granularity = granularityFor(from, to);
      const products = productRows
        .map((p) => ({ productId: p.id, name: p.name, share: shareOf(p.id), units: perProduct.get(p.id)?.units ?? 0, revenueMinor: Math.round(perProduct.get(p.id)?.revenue ?? 0) }))
        .sort((a, b) => b.units - a.units || a.name.localeCompare(b.name));
      const units = [...perProduct.values()].reduce((s, p) => s + p.units, 0);
      const revenue = [...perProduct.values()].reduce((s, p) => s + p.revenue, 0);
      return {
        motifId,
        from,
        to,
        splitRule,
        currency,
        totals: { units, revenueMinor: Math.round(revenue) },
        products,
        granularity,
        series: salesSeries([...perDay.values()], from, to, granularity).map((p) => ({ ...p, revenueMinor: Math.round(p.revenueMinor) })),
      };
    },
  };
}
