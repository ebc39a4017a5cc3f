import { salesMappingSchema, type SalesDelimiter, type SalesMapping } from '../contracts/sales';
import { dateOrderEvidence } from './parse-date';

// Header words shops commonly use for each field (common practice, from memory), most specific first.
const headerWords: Record<'date' | 'sku' | 'quantity' | 'revenue' | 'currency' | 'orderId', RegExp[]> = {
  date: [/^(sale|sold|order|paid|created)[ _]?(date|on|at)$/i, /date/i, /^sold/i, /^day$/i],
  sku: [/^sku$/i, /sku/i, /(item|product|variant|article)[ _]?(code|number|no|id)/i, /^code$/i],
  quantity: [/^(qty|quantity)$/i, /qty|quantity|units|^count$/i],
  revenue: [/^(total|revenue|net|gross|amount)$/i, /total|revenue|amount|gross|net|sales|price/i],
  currency: [/^(currency|cur|ccy)$/i, /currency/i],
  orderId: [/^(order|order[ _]?(id|no|number|#)|transaction[ _]?id)$/i, /order/i],
};

function pick(header: readonly string[], patterns: RegExp[], taken: Set<string>): string | undefined {
  for (const pattern of patterns) {
    const hit = header.find((h) => !taken.has(h) && pattern.test(h.trim()));
    if (hit !== undefined) return hit;
  }
  return undefined;
}

/** The delimiter of a header line: the most frequent of , ; and tab outside quotes. */
export function detectDelimiter(headerLine: string): SalesDelimiter {
  const counts = { ',': 0, ';': 0, '\t': 0 } as Record<SalesDelimiter, number>;
  let quoted = false;
  for (const ch of headerLine) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && ch in counts) counts[ch as SalesDelimiter]++;
  }
  const [best, n] = (Object.entries(counts) as [SalesDelimiter, number][]).sort((a, b) => b[1] - a[1])[0];
  return n > 0 ? best : ',';
}

/** Does a saved mapping fit this header (every column it names is present)? */
export function savedMappingFits(saved: unknown, header: readonly string[]): SalesMapping | null {
  const parsed = salesMappingSchema.safeParse(saved);
  if (!parsed.success) return null;
  const names = new Set(header.map((h) => h.trim()));
  const m = parsed.data;
  const used = [m.date, m.sku, m.quantity, m.revenue, m.currency, m.orderId].filter((c): c is string => c !== undefined);
  return used.every((c) => names.has(c.trim())) ? m : null;
}

/** The decimal separator the sample amounts imply: ',' when some amount ends in ",dd". */
function decimalEvidence(values: readonly string[]): '.' | ',' {
  const comma = values.filter((v) => /\d,\d{1,2}\s*\D*$/.test(v.trim())).length;
  const dot = values.filter((v) => /\d\.\d{1,2}\s*\D*$/.test(v.trim())).length;
  return comma > dot ? ',' : '.';
}

/**
 * A first mapping from the header and sample rows: what the user confirms or changes. The date
 * order is only filled in when the values decide it; `missing` lists what the user must choose.
 */
export function suggestMapping(header: readonly string[], sample: readonly (readonly string[])[], delimiter: SalesDelimiter): { mapping: Record<string, string>; missing: string[] } {
  const taken = new Set<string>();
  const mapping: Record<string, string> = { delimiter };
  for (const field of ['sku', 'quantity', 'currency', 'orderId', 'date', 'revenue'] as const) {
    const column = pick(header, headerWords[field], taken);
    if (column !== undefined) {
      mapping[field] = column;
      taken.add(column);
    }
  }
  const valuesOf = (column: string | undefined) => (column === undefined ? [] : sample.map((r) => r[header.indexOf(column)] ?? ''));
  const order = dateOrderEvidence(valuesOf(mapping.date));
  if (order) mapping.dateFormat = order;
  mapping.decimalSeparator = decimalEvidence(valuesOf(mapping.revenue));
  const missing = ['date', 'sku', 'quantity', 'revenue', 'dateFormat'].filter((f) => mapping[f] === undefined);
  if (mapping.currency === undefined) missing.push('currency');
  return { mapping, missing };
}
