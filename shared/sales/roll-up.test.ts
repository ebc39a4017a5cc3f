import { describe, expect, it } from 'vitest';
import { layoutOf, motif, repeat, text } from '../scene/test-support/fixtures';
import { motifShares, printedArea } from './motif-shares';
import { rankSales, rollUpSales, type SaleTotal } from './roll-up';

// A hand-worked example (arithmetic below, done on paper).
// Motifs: puffin 100×200 px, kite 50×50 px, wave 400×100 px.
// Mug layout: puffin at scale 2 → 200×400 = 80,000 px²; kite at scale 2 → 100×100 = 10,000 px²;
//   the kite again at scale 1 → 2,500 px²; a title text (no motif); a hidden wave (not printed).
//   even: {puffin, kite} → ½ each.  area: puffin 80,000 / 92,500; kite 12,500 / 92,500.
// Tote layout: wave at scale 1 → 40,000 px²; puffin at scale 1 turned 90° → 20,000 px² (turning keeps area).
//   even: ½ each.  area: wave 40,000 / 60,000 = ⅔; puffin ⅓.
const puffin = { motifId: 'm-puffin', naturalWidth: 100, naturalHeight: 200 };
const kite = { motifId: 'm-kite', naturalWidth: 50, naturalHeight: 50 };
const wave = { motifId: 'm-wave', naturalWidth: 400, naturalHeight: 100 };
const mugLayout = layoutOf(
  motif({ id: 'a', ...puffin, scale: 2 }),
  motif({ id: 'b', ...kite, scale: 2 }),
  motif({ id: 'c', ...kite, scale: 1 }),
  text({ id: 't' }),
  motif({ id: 'd', ...wave, hidden: true }),
);
const toteLayout = layoutOf(motif({ id: 'a', ...wave }), motif({ id: 'b', ...puffin, rotationDeg: 90 }));

// Sales: mug blue 3 units £36.00, mug white 1 unit £12.00 (SKU in other case), tote 2 units
// £30.00 and 1 unit €20.00, and 5 units of a SKU no variant has.
// Mug: 4 units, £48.00. Tote: 3 units, £30.00 + €20.00.
const sales: SaleTotal[] = [
  { sku: 'MUG-BLUE', currency: 'GBP', quantity: 3, revenueMinor: 3600 },
  { sku: 'mug-white', currency: 'GBP', quantity: 1, revenueMinor: 1200 },
  { sku: 'TOTE-01', currency: 'GBP', quantity: 2, revenueMinor: 3000 },
  { sku: 'tote-01', currency: 'EUR', quantity: 1, revenueMinor: 2000 },
  { sku: 'OLD-SKU', currency: 'GBP', quantity: 5, revenueMinor: 5000 },
];
const variants = [
  { id: 'v-blue', productId: 'mug', name: 'Blue handle', sku: 'MUG-BLUE' },
  { id: 'v-white', productId: 'mug', name: 'White handle', sku: 'MUG-WHITE' },
  { id: 'v-tote', productId: 'tote', name: 'Natural', sku: 'TOTE-01' },
];
const productsWith = (rule: 'even' | 'area') => [
  { id: 'mug', name: 'Puffin mug', motifShares: motifShares(mugLayout, rule) },
  { id: 'tote', name: 'Wave tote', motifShares: motifShares(toteLayout, rule) },
];
const byMotif = (rule: 'even' | 'area') => Object.fromEntries(rollUpSales(sales, variants, productsWith(rule)).motifs.map((m) => [m.motifId, m]));

describe('printed area', () => {
  it('is the motif’s pixel size times its scale squared, whatever its turn', () => {
    expect(printedArea(motif({ ...puffin, scale: 2 }))).toBeCloseTo(80_000, 6);
    expect(printedArea(motif({ ...puffin, rotationDeg: 90 }))).toBeCloseTo(20_000, 6);
    // stretched to twice the height with the aspect unlocked: 100 × 400
    expect(printedArea(motif({ ...puffin, stretchY: 2, aspectLocked: false }))).toBeCloseTo(40_000, 6);
  });

  it('counts a repeat at its tiles’ density over the print area', () => {
    // 100 × 100 tiles with 100 px gaps: a quarter of a 1,000 × 1,000 area is printed
    const r = repeat({ spacingX: 100, spacingY: 100 });
    expect(printedArea(r, { x: 0, y: 0, width: 1000, height: 1000 })).toBeCloseTo(250_000, 6);
    expect(printedArea(r)).toBeCloseTo(10_000, 6);
  });
});

describe('motif shares of a product', () => {
  it('splits evenly across the distinct motifs it prints', () => {
    expect(Object.fromEntries(motifShares(mugLayout, 'even'))).toEqual({ 'm-puffin': 0.5, 'm-kite': 0.5 });
  });

  it('splits by printed area, summed per motif', () => {
    const shares = motifShares(mugLayout, 'area');
    expect(shares.get('m-puffin')).toBeCloseTo(80_000 / 92_500, 12);
    expect(shares.get('m-kite')).toBeCloseTo(12_500 / 92_500, 12);
    expect(shares.has('m-wave')).toBe(false);
  });

  it('gives nothing for a layout without motifs', () => {
    expect(motifShares(layoutOf(text()), 'area').size).toBe(0);
  });
});

describe('the sales roll-up', () => {
  it('rolls sales to variants by SKU ignoring case, and to products', () => {
    const r = rollUpSales(sales, variants, productsWith('even'));
    expect(Object.fromEntries(r.variants.map((v) => [v.variantId, [v.units, v.revenue]]))).toEqual({
      'v-blue': [3, { GBP: 3600 }],
      'v-white': [1, { GBP: 1200 }],
      'v-tote': [3, { GBP: 3000, EUR: 2000 }],
    });
    expect(Object.fromEntries(r.products.map((p) => [p.productId, [p.units, p.revenue]]))).toEqual({
      mug: [4, { GBP: 4800 }],
      tote: [3, { GBP: 3000, EUR: 2000 }],
    });
    expect(r.unmatched).toEqual([{ sku: 'OLD-SKU', units: 5, revenue: { GBP: 5000 } }]);
  });

  it('shares product sales evenly among motifs', () => {
    // puffin: mug 4 × ½ + tote 3 × ½ = 3.5 units; £48.00/2 + £30.00/2 = £39.00; €20.00/2 = €10.00
    // kite: mug 4 × ½ = 2 units, £24.00.   wave: tote 3 × ½ = 1.5 units, £15.00, €10.00
    const m = byMotif('even');
    expect([m['m-puffin'].units, m['m-puffin'].revenue]).toEqual([3.5, { GBP: 3900, EUR: 1000 }]);
    expect([m['m-kite'].units, m['m-kite'].revenue]).toEqual([2, { GBP: 2400 }]);
    expect([m['m-wave'].units, m['m-wave'].revenue]).toEqual([1.5, { GBP: 1500, EUR: 1000 }]);
    expect(m['m-puffin'].productIds.sort()).toEqual(['mug', 'tote']);
  });

  it('shares product sales by printed area', () => {
    // puffin: 4 × 80,000/92,500 + 3 × ⅓ = 3.459459… + 1 = 4.459459… units;
    //   £48.00 × 0.864865 = 4151.35p + £30.00 × ⅓ = 1000p → 5151.35p → 5151p; €20.00 × ⅓ = 666.67c → 667c
    // kite: 4 × 12,500/92,500 = 0.540541 units; 4800p × 0.135135 = 648.65p → 649p
    // wave: 3 × ⅔ = 2 units; 3000p × ⅔ = 2000p; 2000c × ⅔ = 1333.33c → 1333c
    // check: 5151 + 649 + 2000 = 7800p, all the products' pounds; 667 + 1333 = 2000c
    const m = byMotif('area');
    expect(m['m-puffin'].units).toBeCloseTo(4.459459, 5);
    expect(m['m-puffin'].revenue).toEqual({ GBP: 5151, EUR: 667 });
    expect(m['m-kite'].units).toBeCloseTo(0.540541, 5);
    expect(m['m-kite'].revenue).toEqual({ GBP: 649 });
    expect(m['m-wave'].units).toBeCloseTo(2, 9);
    expect(m['m-wave'].revenue).toEqual({ GBP: 2000, EUR: 1333 });
  });

  it('ranks by units, then revenue in the chosen currency', () => {
    const ranked = rankSales(rollUpSales(sales, variants, productsWith('area')).motifs, 'GBP', (m) => m.motifId);
    expect(ranked.map((m) => m.motifId)).toEqual(['m-puffin', 'm-wave', 'm-kite']);
  });
});
