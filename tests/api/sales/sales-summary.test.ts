import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';
import { csv, seedSalesCatalogue, shopMapping, type SalesCatalogue } from './sales-seed';

let t: TestApp;
let owner: ApiClient;
let catalogue: SalesCatalogue;

// The hand-worked example of shared/sales/roll-up.test.ts, imported as a shop file:
// mug 4 units £48.00; tote 3 units £30.00 + €20.00 (layouts and areas in sales-seed.ts).
beforeAll(async () => {
  t = await createTestApp();
  const signedUp = await signUpOwner(t.app, 'Saltmarsh What Sells');
  owner = signedUp.client;
  catalogue = await seedSalesCatalogue(t.runtime.db.db, signedUp.me.studio.id);
  const file = csv(
    'S-1,02/03/2026,MUG-BLUE,3,36.00,GBP',
    'S-2,10/03/2026,mug-white,1,12.00,GBP',
    'S-3,05/04/2026,TOTE-01,2,30.00,GBP',
    'S-4,06/04/2026,tote-01,1,"20,00 €",EUR',
    // outside the period asked for below
    'S-5,01/06/2026,TOTE-01,9,90.00,GBP',
  );
  // one mapping for the file: the euro row's amount uses a comma, so it comes in a second file
  const gbp = file.toString().split('\n').filter((l) => !l.includes('EUR')).join('\n');
  const eur = [file.toString().split('\n')[0], file.toString().split('\n').find((l) => l.includes('EUR'))].join('\n');
  const first = await owner.upload('/api/sales/imports', Buffer.from(gbp), 'march-april.csv', { mapping: JSON.stringify(shopMapping) });
  expect(first.status).toBe(201);
  const second = await owner.upload('/api/sales/imports', Buffer.from(eur), 'april-eu.csv', { mapping: JSON.stringify({ ...shopMapping, decimalSeparator: ',' }) });
  expect(second.status).toBe(201);
}, 60_000);
afterAll(() => t.close());

const period = 'from=2026-03-01&to=2026-04-30';
const byId = <T extends Record<string, unknown>>(items: T[], key: keyof T) => Object.fromEntries(items.map((i) => [i[key] as string, i]));

describe('what sells', () => {
  it('ranks products and variants by units with revenue in the main currency', async () => {
    const s = (await owner.get(`/api/sales/summary?${period}&split=even`).expect(200)).body;
    expect(s.currency).toBe('GBP');
    expect(s.currencies).toEqual([{ currency: 'GBP', units: 6, revenueMinor: 7800 }, { currency: 'EUR', units: 1, revenueMinor: 2000 }]);
    expect(s.totals).toEqual({ units: 7, revenueMinor: 7800 });
    expect(s.products.map((p: { name: string; units: number; revenueMinor: number }) => [p.name, p.units, p.revenueMinor])).toEqual([
      ['Puffin Picnic mug', 4, 4800],
      ['Wave tote', 3, 3000],
    ]);
    expect(s.variants.map((v: { sku: string; units: number }) => [v.sku, v.units])).toEqual([['MUG-BLUE', 3], ['TOTE-01', 3], ['MUG-WHITE', 1]]);
  });

  it('splits product sales evenly across their motifs (hand-worked)', async () => {
    const s = (await owner.get(`/api/sales/summary?${period}&split=even`).expect(200)).body;
    expect(s.splitRule).toBe('even');
    const m = byId(s.motifs, 'motifId');
    // puffin: 4 × ½ + 3 × ½ = 3.5 units, £24.00 + £15.00; kite: 2 units, £24.00; wave: 1.5 units, £15.00
    expect([m[catalogue.motifs.puffin].units, m[catalogue.motifs.puffin].revenueMinor, m[catalogue.motifs.puffin].shareOfUnits]).toEqual([3.5, 3900, 0.5]);
    expect([m[catalogue.motifs.kite].units, m[catalogue.motifs.kite].revenueMinor]).toEqual([2, 2400]);
    expect([m[catalogue.motifs.wave].units, m[catalogue.motifs.wave].revenueMinor]).toEqual([1.5, 1500]);
    expect(s.motifs.map((x: { name: string }) => x.name)).toEqual(['Puffin in a jumper', 'Kite', 'Wave band']);
  });

  it('splits by printed area, and keeps euros apart (hand-worked)', async () => {
    const s = (await owner.get(`/api/sales/summary?${period}&split=area`).expect(200)).body;
    const m = byId(s.motifs, 'motifId');
    // puffin: 4 × 80,000/92,500 + 3 × ⅓ = 4.459459 units; 4800p × 0.864865 + 3000p × ⅓ = 5151.35p → 5151p
    // kite: 4 × 12,500/92,500 = 0.540541 units, 648.65p → 649p; wave: 3 × ⅔ = 2 units, 2000p
    expect(m[catalogue.motifs.puffin].units).toBeCloseTo(4.459459, 5);
    expect([m[catalogue.motifs.puffin].revenueMinor, m[catalogue.motifs.kite].revenueMinor, m[catalogue.motifs.wave].revenueMinor]).toEqual([5151, 649, 2000]);
    expect(s.motifs.map((x: { name: string }) => x.name)).toEqual(['Puffin in a jumper', 'Wave band', 'Kite']);
    const eur = byId((await owner.get(`/api/sales/summary?${period}&split=area&currency=EUR`).expect(200)).body.motifs, 'motifId');
    // the tote's €20.00: puffin ⅓ → 666.67c → 667c, wave ⅔ → 1333c; the mug sold nothing in euros
    expect([eur[catalogue.motifs.puffin].revenueMinor, eur[catalogue.motifs.wave].revenueMinor, eur[catalogue.motifs.kite].revenueMinor]).toEqual([667, 1333, 0]);
  });

  it('uses the studio’s split rule unless asked otherwise', async () => {
    expect((await owner.get(`/api/sales/summary?${period}`).expect(200)).body.splitRule).toBe('even');
    const saved = await owner.patch('/api/sales/settings', { splitRule: 'area' });
    expect(saved.status).toBe(200);
    expect(saved.body.splitRule).toBe('area');
    expect((await owner.get(`/api/sales/summary?${period}`).expect(200)).body.splitRule).toBe('area');
    expect((await owner.patch('/api/sales/settings', { splitRule: 'by-colour' })).status).toBe(400);
    await owner.patch('/api/sales/settings', { splitRule: 'even' });
  });

  it('draws a daily line for a two-month period', async () => {
    const s = (await owner.get(`/api/sales/summary?${period}`).expect(200)).body;
    expect(s.granularity).toBe('day');
    expect(s.series).toHaveLength(61);
    const day = byId(s.series, 'start');
    expect([day['2026-03-02'].units, day['2026-03-02'].revenueMinor]).toEqual([3, 3600]);
    // the euro sale counts as a unit but adds no pounds
    expect([day['2026-04-06'].units, day['2026-04-06'].revenueMinor]).toEqual([1, 0]);
    expect(s.series.reduce((sum: number, p: { units: number }) => sum + p.units, 0)).toBe(7);
  });

  it('gives a motif page its sales line under the split rule', async () => {
    const res = await owner.get(`/api/motifs/${catalogue.motifs.puffin}/sales?${period}&split=area`).expect(200);
    expect(res.body.splitRule).toBe('area');
    expect(res.body.totals.units).toBeCloseTo(4.459459, 5);
    expect(res.body.totals.revenueMinor).toBe(5151);
    const shares = byId(res.body.products, 'name');
    expect(shares['Puffin Picnic mug'].share).toBeCloseTo(80_000 / 92_500, 9);
    expect(shares['Wave tote'].share).toBeCloseTo(1 / 3, 9);
    expect(res.body.series.reduce((s: number, p: { units: number }) => s + p.units, 0)).toBeCloseTo(4.459459, 5);
  });

  it('answers 404 for another studio’s motif and shows them none of these sales', async () => {
    const other = (await signUpOwner(t.app, 'Another Coast Studio')).client;
    expect((await other.get(`/api/motifs/${catalogue.motifs.puffin}/sales?${period}`)).status).toBe(404);
    expect((await other.get(`/api/sales/summary?${period}`).expect(200)).body.motifs).toEqual([]);
  });

  it('refuses a period that ends before it starts', async () => {
    const res = await owner.get('/api/sales/summary?from=2026-05-01&to=2026-04-01');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('to');
  });
});
