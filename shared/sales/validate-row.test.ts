import { describe, expect, it } from 'vitest';
import { salesMappingSchema } from '../contracts/sales';
import { createSalesFileCheck } from './validate-row';
import { detectDelimiter, savedMappingFits, suggestMapping } from './suggest-mapping';
import { bucketStart, granularityFor, salesSeries } from './time-buckets';

const header = ['Order', 'Sold on', 'Item code', 'Qty', 'Total', 'Currency'];
const mapping = salesMappingSchema.parse({ orderId: 'Order', date: 'Sold on', sku: 'Item code', quantity: 'Qty', revenue: 'Total', currency: 'Currency', dateFormat: 'dmy', decimalSeparator: '.' });
const known = new Set(['mug-blue', 'tote-01']);

function check(rows: string[][], keep = true) {
  const c = createSalesFileCheck({ header, mapping, knownSku: (s) => known.has(s) }, keep);
  // the header is line 1, so the first data row is line 2
  rows.forEach((r, i) => c.add(r, i + 2));
  return c.result();
}

describe('checking a sales file', () => {
  it('keeps good rows and lists every reason of each bad row with its line', () => {
    const { validation, rows } = check([
      ['1001', '14/03/2026', ' MUG-BLUE ', '2', '£24.00', 'gbp'],
      ['1002', '31/02/2026', 'TOTE-01', 'two', '12,50', 'GBP'],
      ['1003', '15/03/2026', '', '1', '10.00', 'GBP'],
      ['1004', '15/03/2026', 'TOTE-01', '-1', '-15.00', 'GBP'],
    ]);
    expect(rows.map((r) => [r.line, r.sku, r.soldOn, r.quantity, r.revenueMinor, r.currency])).toEqual([
      [2, 'MUG-BLUE', '2026-03-14', 2, 2400, 'GBP'],
      [5, 'TOTE-01', '2026-03-15', -1, -1500, 'GBP'],
    ]);
    expect(validation.badRows).toEqual([
      { line: 3, reasons: ['date: there is no day 31 in 2026-02', 'quantity: "two" is not a whole number of items', expect.stringContaining('revenue: "12,50" is not an amount')] },
      { line: 4, reasons: ['SKU: the SKU is empty'] },
    ]);
    expect([validation.rowCount, validation.goodRowCount, validation.badRowCount]).toEqual([4, 2, 2]);
    expect([validation.firstDay, validation.lastDay]).toEqual(['2026-03-14', '2026-03-15']);
  });

  it('reports unknown SKUs once each with how many rows name them', () => {
    const { validation } = check([
      ['1', '14/03/2026', 'LANTERN-FOX', '1', '5.00', 'GBP'],
      ['2', '14/03/2026', 'lantern-fox', '1', '5.00', 'GBP'],
    ]);
    expect(validation.unknownSkus).toEqual([{ sku: 'LANTERN-FOX', rows: 2, firstLine: 2 }]);
    expect(validation.badRows.map((b) => b.line)).toEqual([2, 3]);
  });

  it('keys rows by order and SKU, counting repeats of the same item in one order', () => {
    const { rows } = check([
      ['1001', '14/03/2026', 'MUG-BLUE', '1', '12.00', 'GBP'],
      ['1001', '14/03/2026', 'mug-blue', '1', '12.00', 'GBP'],
      ['', '14/03/2026', 'MUG-BLUE', '1', '12.00', 'GBP'],
    ]);
    expect(rows.map((r) => r.rowKey)).toEqual(['1001\u001fmug-blue\u001f1', '1001\u001fmug-blue\u001f2', null]);
  });

  it('reports a short row and a currency mismatch', () => {
    const { validation } = check([
      ['1', '14/03/2026', 'MUG-BLUE', '1'],
      ['2', '14/03/2026', 'MUG-BLUE', '1', 'EUR 5.00', 'GBP'],
    ]);
    expect(validation.badRows[0].reasons[0]).toBe('has 4 fields where the header has 6');
    expect(validation.badRows[1].reasons).toEqual(['revenue: the amount says EUR but the row\'s currency is GBP']);
  });

  it('names mapped columns the header lacks', () => {
    const c = createSalesFileCheck({ header: ['Date', 'SKU'], mapping, knownSku: () => true });
    expect(c.missingColumns).toEqual(['Sold on', 'Item code', 'Qty', 'Total', 'Currency', 'Order']);
  });
});

describe('suggesting a mapping', () => {
  it('guesses columns from headers and leaves an undecidable date order to the user', () => {
    const s = suggestMapping(header, [['1', '03/04/2026', 'A', '1', '12.00', 'GBP']], ',');
    expect(s.mapping).toMatchObject({ orderId: 'Order', date: 'Sold on', sku: 'Item code', quantity: 'Qty', revenue: 'Total', currency: 'Currency', decimalSeparator: '.' });
    expect(s.missing).toEqual(['dateFormat']);
    expect(suggestMapping(header, [['1', '25/04/2026', 'A', '1', '12,00', 'EUR']], ';').mapping).toMatchObject({ dateFormat: 'dmy', decimalSeparator: ',', delimiter: ';' });
  });

  it('reuses a saved mapping only when its columns are all present', () => {
    expect(savedMappingFits(mapping, header)).toEqual(mapping);
    expect(savedMappingFits(mapping, header.slice(1))).toBeNull();
  });

  it('finds the delimiter of a header line outside quotes', () => {
    expect(detectDelimiter('Order;Sold on;"Total, net"')).toBe(';');
    expect(detectDelimiter('a\tb\tc')).toBe('\t');
  });
});

describe('time buckets', () => {
  it('picks days, weeks or months by the range and fills empty buckets', () => {
    expect(granularityFor('2026-03-01', '2026-03-31')).toBe('day');
    expect(granularityFor('2025-12-01', '2026-11-30')).toBe('week');
    expect(granularityFor('2024-01-01', '2026-11-30')).toBe('month');
    // 2026-03-15 is a Sunday; its ISO week starts on Monday 9 March
    expect(bucketStart('2026-03-15', 'week')).toBe('2026-03-09');
    const series = salesSeries([{ day: '2026-03-02', units: 2, revenueMinor: 100 }, { day: '2026-03-20', units: 1, revenueMinor: 50 }], '2026-01-15', '2026-03-31', 'month');
    expect(series).toEqual([
      { start: '2026-01-01', units: 0, revenueMinor: 0 },
      { start: '2026-02-01', units: 0, revenueMinor: 0 },
      { start: '2026-03-01', units: 3, revenueMinor: 150 },
    ]);
  });
});
