import type { BadSalesRow, SalesMapping, SalesValidation } from '../contracts/sales';
import { parseSaleDay } from './parse-date';
import { currencyMinorDigits, parseCurrencyCode, parseQuantity, parseRevenueMinor } from './parse-money';

export type SaleRow = {
  line: number;
  soldOn: string;
  sku: string;
  quantity: number;
  revenueMinor: number;
  currency: string;
  // the shop's order id with the SKU, when the mapping names an order column and the row has one
  rowKey: string | null;
};

export type RowCheck = { ok: true; row: SaleRow } | { ok: false; reasons: string[] };

const MAX_SKU_LENGTH = 200;

type Columns = { date: number; sku: number; quantity: number; revenue: number; currency: number | null; orderId: number | null };

/** Where each mapped field sits in the header, or which mapped columns the header lacks. */
export function locateColumns(header: readonly string[], mapping: SalesMapping): { ok: true; columns: Columns } | { ok: false; missing: string[] } {
  const names = header.map((h) => h.trim());
  const find = (name: string | undefined) => (name === undefined ? null : names.indexOf(name.trim()));
  const wanted = { date: mapping.date, sku: mapping.sku, quantity: mapping.quantity, revenue: mapping.revenue, currency: mapping.currency, orderId: mapping.orderId };
  const missing = Object.values(wanted).filter((name): name is string => name !== undefined && find(name) === -1);
  if (missing.length > 0) return { ok: false, missing };
  return {
    ok: true,
    columns: {
      date: find(mapping.date)!,
      sku: find(mapping.sku)!,
      quantity: find(mapping.quantity)!,
      revenue: find(mapping.revenue)!,
      currency: find(mapping.currency),
      orderId: find(mapping.orderId),
    },
  };
}

/** One data row against the mapping; every problem of the row is listed, not just the first. */
export function checkSalesRow(record: readonly string[], line: number, columns: Columns, mapping: SalesMapping, headerLength: number): RowCheck {
  const reasons: string[] = [];
  const cell = (i: number) => record[i] ?? '';
  if (record.length !== headerLength) reasons.push(`has ${record.length} fields where the header has ${headerLength}`);

  const day = parseSaleDay(cell(columns.date), mapping.dateFormat);
  if (!day.ok) reasons.push(`date: ${day.reason}`);

  const sku = cell(columns.sku).trim();
  if (sku === '') reasons.push('SKU: the SKU is empty');
  else if (sku.length > MAX_SKU_LENGTH) reasons.push(`SKU: longer than ${MAX_SKU_LENGTH} characters`);

  const quantity = parseQuantity(cell(columns.quantity));
  if (!quantity.ok) reasons.push(`quantity: ${quantity.reason}`);

  const currency = columns.currency === null ? parseCurrencyCode(mapping.fixedCurrency ?? '') : parseCurrencyCode(cell(columns.currency));
  if (!currency.ok) reasons.push(`currency: ${currency.reason}`);

  let revenueMinor = 0;
  if (currency.ok) {
    const revenue = parseRevenueMinor(cell(columns.revenue), mapping.decimalSeparator, currencyMinorDigits(currency.code) ?? 2);
    if (!revenue.ok) reasons.push(`revenue: ${revenue.reason}`);
    else if (revenue.codeInText && currencyMinorDigits(revenue.codeInText) !== null && revenue.codeInText !== currency.code) {
      reasons.push(`revenue: the amount says ${revenue.codeInText} but the row's currency is ${currency.code}`);
    } else revenueMinor = revenue.minor;
  }

  const orderId = columns.orderId === null ? '' : cell(columns.orderId).trim();
  if (reasons.length > 0 || !day.ok || !quantity.ok || !currency.ok) return { ok: false, reasons };
  return {
    ok: true,
    row: { line, soldOn: day.day, sku, quantity: quantity.quantity, revenueMinor, currency: currency.code, rowKey: orderId === '' ? null : orderId },
  };
}

export type SalesFileCheckOptions = {
  header: readonly string[];
  mapping: SalesMapping;
  // is this SKU (lower case) one of the studio's variants?
  knownSku: (skuLower: string) => boolean;
  badRowCap?: number;
};

export const BAD_ROW_CAP = 200;

/**
 * Checks a file row by row as it streams (rows are not kept unless `keep` is true) and sums up
 * what is wrong with it. Rows sharing an order id and SKU (the same item on two lines of one
 * order) get their occurrence in the key, so the n-th such line of an overlapping export meets
 * the same key again and is not counted twice.
 */
export function createSalesFileCheck(options: SalesFileCheckOptions, keep = false) {
  const located = locateColumns(options.header, options.mapping);
  const cap = options.badRowCap ?? BAD_ROW_CAP;
  const badRows: BadSalesRow[] = [];
  const unknown = new Map<string, { sku: string; rows: number; firstLine: number }>();
  const good: SaleRow[] = [];
  const occurrences = new Map<string, number>();
  let rowCount = 0;
  let badRowCount = 0;
  let goodRowCount = 0;
  let firstDay: string | null = null;
  let lastDay: string | null = null;

  const bad = (line: number, reasons: string[]) => {
    badRowCount++;
    if (badRows.length < cap) badRows.push({ line, reasons });
  };

  return {
    missingColumns: located.ok ? [] : located.missing,

    add(record: readonly string[], line: number): void {
      if (!located.ok) return;
      rowCount++;
      const check = checkSalesRow(record, line, located.columns, options.mapping, options.header.length);
      if (!check.ok) return bad(line, check.reasons);
      const row = check.row;
      const skuLower = row.sku.toLowerCase();
      if (!options.knownSku(skuLower)) {
        const entry = unknown.get(skuLower) ?? { sku: row.sku, rows: 0, firstLine: line };
        entry.rows++;
        unknown.set(skuLower, entry);
        return bad(line, [`SKU: no variant has the SKU "${row.sku.slice(0, 60)}"`]);
      }
      if (row.rowKey !== null) {
        const base = `${row.rowKey}\u001f${skuLower}`;
        const n = (occurrences.get(base) ?? 0) + 1;
        occurrences.set(base, n);
        row.rowKey = `${base}\u001f${n}`;
      }
      goodRowCount++;
      if (firstDay === null || row.soldOn < firstDay) firstDay = row.soldOn;
      if (lastDay === null || row.soldOn > lastDay) lastDay = row.soldOn;
      if (keep) good.push(row);
    },

    result(): { validation: SalesValidation; rows: SaleRow[] } {
      return {
        validation: { rowCount, goodRowCount, badRowCount, badRows, unknownSkus: [...unknown.values()].sort((a, b) => b.rows - a.rows), firstDay, lastDay },
        rows: good,
      };
    },
  };
}
