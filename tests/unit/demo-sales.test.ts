import { describe, expect, it } from 'vitest';
import { salesMappingSchema } from '../../shared/contracts/sales';
import { createSalesFileCheck } from '../../shared/sales/validate-row';
import { demoSalesCsv, demoSalesMapping, demoSalesRows } from '../../scripts/demo/demo-sales';

const skus = [
  { sku: 'MUG-PUFFIN-BLUE', priceMinor: 1400, popularity: 2, season: 'spring' as const },
  { sku: 'TOTE-WAVE', priceMinor: 1800 },
  { sku: 'CARD-LANTERN-FOX', priceMinor: 350, season: 'autumn' as const },
];
const options = { skus, months: 12, endDate: '2026-11-30', seed: 7 };

describe('the demo shop’s sales export', () => {
  it('is the same file for the same options and another for another seed', () => {
    expect(demoSalesCsv(options)).toBe(demoSalesCsv(options));
    expect(demoSalesCsv({ ...options, seed: 8 })).not.toBe(demoSalesCsv(options));
  });

  it('passes the sales check with the mapping a user would choose, refunds included', () => {
    const [header, ...rows] = demoSalesRows(options);
    expect(header).toEqual(['Order', 'Sold on', 'Item code', 'Qty', 'Total', 'Currency']);
    const check = createSalesFileCheck({ header, mapping: salesMappingSchema.parse(demoSalesMapping), knownSku: (s) => skus.some((k) => k.sku.toLowerCase() === s) }, true);
    rows.forEach((r, i) => check.add(r, i + 2));
    const { validation, rows: good } = check.result();
    expect(validation.badRowCount).toBe(0);
    expect(good.some((r) => r.quantity < 0)).toBe(true);
    expect(validation.firstDay! >= '2025-12-01' && validation.lastDay! <= '2026-11-30').toBe(true);
  });

  it('sells the spring mug in spring and the lantern card in autumn', () => {
    const units = (sku: string, month: string) => demoSalesRows(options).filter((r) => r[2] === sku && r[1].slice(3) === month).reduce((s, r) => s + Number(r[3]), 0);
    expect(units('MUG-PUFFIN-BLUE', '04/2026')).toBeGreaterThan(2 * units('MUG-PUFFIN-BLUE', '01/2026'));
    expect(units('CARD-LANTERN-FOX', '10/2026')).toBeGreaterThan(2 * units('CARD-LANTERN-FOX', '04/2026'));
  });

  it('stops at an exact number of rows when asked', () => {
    expect(demoSalesRows({ ...options, ordersPerDay: 50, maxRows: 1000 })).toHaveLength(1001);
  });
});
