// The demo shop's sales export: our own invented CSV layout ("Order", "Sold on", "Item code",
// "Qty", "Total", "Currency"), day-first dates as a UK shop writes them, generated from a seeded
// PRNG so the same options always give the same bytes. Used by the seed and the sales bench.
import { writeFile } from 'node:fs/promises';
import type { SalesMappingInput } from '../../shared/contracts/sales';

export type DemoSku = {
  sku: string;
  // the shop price of one item, in minor units (pence)
  priceMinor: number;
  // relative pull of this item against the others (1 = typical)
  popularity?: number;
  // when it sells best: spring lines peak March–May, autumn lines September–November
  season?: 'spring' | 'autumn' | 'all';
};

export type DemoSalesOptions = {
  skus: readonly DemoSku[];
  // how many months back from `endDate` the export covers
  months: number;
  // the last day of the export, yyyy-mm-dd (default: today, UTC)
  endDate?: string;
  seed?: number;
  currency?: string;
  // orders on an ordinary weekday in an ordinary month
  ordersPerDay?: number;
  // share of order lines refunded a few days later (a negative line under the same order)
  refundRate?: number;
  // stop after this many data rows (the bench wants an exact count)
  maxRows?: number;
};

export const demoSalesHeader = ['Order', 'Sold on', 'Item code', 'Qty', 'Total', 'Currency'] as const;

// The mapping a user would choose for this export.
export const demoSalesMapping: SalesMappingInput = {
  orderId: 'Order',
  date: 'Sold on',
  sku: 'Item code',
  quantity: 'Qty',
  revenue: 'Total',
  currency: 'Currency',
  dateFormat: 'dmy',
  decimalSeparator: '.',
  delimiter: ',',
};

function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

// Month factors, January first: a small shop's year with a December gift peak (invented shape).
const baseYear = [0.7, 0.75, 0.9, 1, 1, 0.9, 0.85, 0.85, 0.95, 1.05, 1.3, 1.8];
const seasonBoost: Record<NonNullable<DemoSku['season']>, number[]> = {
  spring: [0.4, 0.7, 1.6, 2, 1.7, 0.8, 0.5, 0.4, 0.3, 0.3, 0.4, 0.6],
  autumn: [0.3, 0.3, 0.3, 0.3, 0.4, 0.5, 0.6, 0.9, 1.7, 2.1, 1.8, 1.2],
  all: Array.from({ length: 12 }, () => 1),
};

const DAY_MS = 86_400_000;
const dayFirst = (ms: number) => {
  const d = new Date(ms);
  return `${String(d.getUTCDate()).padStart(2, '0')}/${String(d.getUTCMonth() + 1).padStart(2, '0')}/${d.getUTCFullYear()}`;
};
const money = (minor: number) => (minor / 100).toFixed(2);

/** The rows of the export, header first, as arrays of cells. */
export function demoSalesRows(options: DemoSalesOptions): string[][] {
  const random = mulberry32(options.seed ?? 20260314);
  const currency = options.currency ?? 'GBP';
  const ordersPerDay = options.ordersPerDay ?? 3;
  const refundRate = options.refundRate ?? 0.02;
  const end = Date.parse(`${options.endDate ?? new Date().toISOString().slice(0, 10)}T00:00:00Z`);
  const startDate = new Date(end);
  startDate.setUTCMonth(startDate.getUTCMonth() - options.months);
  const rows: string[][] = [[...demoSalesHeader]];
  const refunds: { dueMs: number; row: string[] }[] = [];
  let orderNumber = 10_000;
  const full = () => options.maxRows !== undefined && rows.length - 1 >= options.maxRows;

  for (let ms = startDate.getTime() + DAY_MS; ms <= end && !full(); ms += DAY_MS) {
    const date = new Date(ms);
    const month = date.getUTCMonth();
    const weekend = date.getUTCDay() === 0 || date.getUTCDay() === 6;
    const weights = options.skus.map((s) => (s.popularity ?? 1) * seasonBoost[s.season ?? 'all'][month]);
    const totalWeight = weights.reduce((a, b) => a + b, 0);
    const pick = () => {
      let r = random() * totalWeight;
      for (let i = 0; i < weights.length; i++) if ((r -= weights[i]) <= 0) return options.skus[i];
      return options.skus[options.skus.length - 1];
    };
    // the day's orders: the expected number rounded up or down at random
    const expected = ordersPerDay * baseYear[month] * (weekend ? 1.4 : 1) * (totalWeight / Math.max(1, options.skus.length));
    const orders = Math.floor(expected + random());
    for (const due of refunds.filter((r) => r.dueMs === ms)) if (!full()) rows.push(due.row);
    for (let o = 0; o < orders && !full(); o++) {
      const order = `SM-${orderNumber++}`;
      const lines = 1 + (random() < 0.3 ? 1 : 0) + (random() < 0.1 ? 1 : 0);
      const inOrder = new Set<string>();
      for (let l = 0; l < lines && !full(); l++) {
        const item = pick();
        if (inOrder.has(item.sku)) continue;
        inOrder.add(item.sku);
        const qty = random() < 0.85 ? 1 : 2 + Math.floor(random() * 2);
        rows.push([order, dayFirst(ms), item.sku, String(qty), money(qty * item.priceMinor), currency]);
        if (random() < refundRate) {
          const dueMs = ms + (3 + Math.floor(random() * 10)) * DAY_MS;
          refunds.push({ dueMs, row: [order, dayFirst(dueMs), item.sku, '-1', money(-item.priceMinor), currency] });
        }
      }
    }
  }
  return rows;
}

const cell = (value: string) => (/[",\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value);

/** The export as CSV text (CRLF line ends, as spreadsheet-minded shops write them). */
export function demoSalesCsv(options: DemoSalesOptions): string {
  return `${demoSalesRows(options).map((r) => r.map(cell).join(',')).join('\r\n')}\r\n`;
}

/** Writes the export to `path`; returns how many data rows it holds. */
export async function writeDemoSalesCsv(path: string, options: DemoSalesOptions): Promise<{ path: string; rows: number }> {
  const text = demoSalesCsv(options);
  await writeFile(path, text);
  return { path, rows: text.split('\r\n').length - 2 };
}
