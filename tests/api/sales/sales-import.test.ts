import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addMember, createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';
import { csv, seedSalesCatalogue, shopMapping } from './sales-seed';

let t: TestApp;
let owner: ApiClient;
let reviewer: ApiClient;
let studioId: string;

beforeAll(async () => {
  t = await createTestApp();
  const signedUp = await signUpOwner(t.app, 'Saltmarsh Sales');
  owner = signedUp.client;
  studioId = signedUp.me.studio.id;
  reviewer = (await addMember(t.app, owner, 'reviewer')).client;
  await seedSalesCatalogue(t.runtime.db.db, studioId);
}, 60_000);
afterAll(() => t.close());

const mappingJson = (extra: Record<string, string> = {}) => JSON.stringify({ ...shopMapping, ...extra });
const importFile = (client: ApiClient, file: Buffer, name: string, fields: Record<string, string> = {}) =>
  client.upload('/api/sales/imports', file, name, { mapping: mappingJson(), ...fields });
const rowsOf = async (importId: string) =>
  (await t.runtime.db.pool.query('select line, sold_on::text as day, sku, quantity, revenue_minor::int as revenue, currency from sales_rows where import_id = $1 order by line', [importId])).rows;
const studioRowCount = async () => Number((await t.runtime.db.pool.query('select count(*) from sales_rows where studio_id = $1', [studioId])).rows[0].count);

describe('previewing a sales file', () => {
  it('suggests a mapping from the headers and asks for the date order when the dates fit both', async () => {
    const res = await owner.upload('/api/sales/imports/preview', csv('A-1,03/04/2026,MUG-BLUE,1,12.00,GBP'), 'shop-april.csv');
    expect(res.status).toBe(200);
    expect(res.body.columns).toEqual(['Order', 'Sold on', 'Item code', 'Qty', 'Total', 'Currency']);
    expect(res.body.sampleRows).toEqual([['A-1', '03/04/2026', 'MUG-BLUE', '1', '12.00', 'GBP']]);
    expect(res.body.suggestedMapping).toMatchObject({ date: 'Sold on', sku: 'Item code', quantity: 'Qty', revenue: 'Total', currency: 'Currency', orderId: 'Order' });
    expect(res.body.missing).toEqual(['dateFormat']);
    expect(res.body.validation).toBeNull();
  });

  it('checks the whole file against a mapping: malformed dates with their line numbers, unknown SKUs', async () => {
    const file = csv(
      'A-1,14/03/2026,MUG-BLUE,1,12.00,GBP',
      'A-2,14 March,MUG-BLUE,1,12.00,GBP',
      'A-3,31/02/2026,TOTE-01,1,15.00,GBP',
      'A-4,15/03/2026,LANTERN-FOX,2,20.00,GBP',
      '"A-5","16/03/2026","TOTE-01","1","1,500.00","GBP"',
      // year first is never ambiguous, so it is read whatever the mapping's order
      'A-6,2026-03-14,MUG-BLUE,1,12.00,GBP',
    );
    const res = await owner.upload('/api/sales/imports/preview', file, 'shop-march.csv', { mapping: mappingJson() });
    expect(res.status).toBe(200);
    const v = res.body.validation;
    expect([v.rowCount, v.goodRowCount, v.badRowCount]).toEqual([6, 3, 3]);
    expect(v.badRows).toEqual([
      { line: 3, reasons: ['date: "14 March" is not a date'] },
      { line: 4, reasons: ['date: there is no day 31 in 2026-02'] },
      { line: 5, reasons: ['SKU: no variant has the SKU "LANTERN-FOX"'] },
    ]);
    expect([v.firstDay, v.lastDay]).toEqual(['2026-03-14', '2026-03-16']);
    expect(v.unknownSkus).toEqual([{ sku: 'LANTERN-FOX', rows: 1, firstLine: 5 }]);
  });

  it('refuses what is not a CSV file with 415', async () => {
    const zip = Buffer.from([0x50, 0x4b, 0x03, 0x04, 0, 0, 0, 0]);
    const res = await owner.upload('/api/sales/imports/preview', zip, 'sales.xlsx');
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('sales.not_csv');
    expect(res.body.error.message).toMatch(/spreadsheet/);
  });

  it('counts lines as in the file when a quoted field spans two lines', async () => {
    const file = Buffer.from('Order,Sold on,Item code,Qty,Total,Currency\nA-1,14/03/2026,"MUG-BLUE",1,12.00,GBP\n"A-2\nsecond line",14/03/2026,MUG-BLUE,x,12.00,GBP\nA-3,14/03/2026,MUG-BLUE,y,12.00,GBP\n');
    const res = await owner.upload('/api/sales/imports/preview', file, 'multi-line.csv', { mapping: mappingJson() });
    expect(res.body.validation.badRows.map((b: { line: number }) => b.line)).toEqual([3, 5]);
  });
});

describe('importing a sales file', () => {
  it('imports nothing when a row is bad, and says which rows', async () => {
    const before = await studioRowCount();
    const res = await importFile(owner, csv('B-1,14/03/2026,MUG-BLUE,1,12.00,GBP', 'B-2,14/13/2026,MUG-BLUE,1,12.00,GBP', 'B-3,14/03/2026,NOPE-1,1,1.00,GBP'), 'shop-b.csv');
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('sales.rows_invalid');
    expect(res.body.validation.badRows.map((b: { line: number }) => b.line)).toEqual([3, 4]);
    expect(res.body.validation.unknownSkus.map((u: { sku: string }) => u.sku)).toEqual(['NOPE-1']);
    expect(await studioRowCount()).toBe(before);
    expect((await owner.get('/api/sales/imports')).body.imports.some((i: { fileName: string }) => i.fileName === 'shop-b.csv')).toBe(false);
  });

  it('imports the good rows when asked to skip the bad ones, and records the skipped lines', async () => {
    const file = csv('C-1,14/03/2026,MUG-BLUE,2,"£24.00",GBP', 'C-2,14/13/2026,MUG-BLUE,1,12.00,GBP', 'C-3,15/03/2026,tote-01,-1,-15.00,gbp');
    const res = await importFile(owner, file, 'shop-c.csv', { skipBadRows: 'true' });
    expect(res.status).toBe(201);
    expect([res.body.rowCount, res.body.skippedRows]).toEqual([2, 1]);
    expect(res.body.report.badRows).toEqual([{ line: 3, reasons: ['date: there is no month 13'] }]);
    expect(res.body.report.totals).toEqual([{ currency: 'GBP', units: 1, revenueMinor: 900 }]);
    expect(await rowsOf(res.body.id)).toEqual([
      { line: 2, day: '2026-03-14', sku: 'MUG-BLUE', quantity: 2, revenue: 2400, currency: 'GBP' },
      { line: 4, day: '2026-03-15', sku: 'tote-01', quantity: -1, revenue: -1500, currency: 'GBP' },
    ]);
    // the mapping is remembered: the next preview of the same columns starts from it
    const preview = await owner.upload('/api/sales/imports/preview', csv('X,01/02/2026,MUG-BLUE,1,1.00,GBP'), 'next.csv');
    expect(preview.body.suggestedFrom).toBe('saved');
    expect(preview.body.suggestedMapping.dateFormat).toBe('dmy');
    expect(preview.body.validation.goodRowCount).toBe(1);
    const { rows: activity } = await t.runtime.db.pool.query("select summary from activity_events where studio_id = $1 and kind = 'sales.imported' and subject_id = $2", [studioId, res.body.id]);
    expect(activity).toEqual([{ summary: 'imported 2 sales rows from "shop-c.csv"' }]);
  });

  it('refuses the same file twice with 409, naming the earlier import', async () => {
    const file = csv('D-1,14/03/2026,MUG-WHITE,1,12.00,GBP');
    const first = await importFile(owner, file, 'shop-d.csv');
    expect(first.status).toBe(201);
    const again = await importFile(owner, file, 'shop-d (1).csv');
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('sales.duplicate_file');
    expect(again.body.error.message).toContain(first.body.id);
    expect(again.body.error.message).toContain('"shop-d.csv"');
  });

  it('skips order lines an earlier, overlapping export already brought in', async () => {
    const first = await importFile(owner, csv('E-1,20/03/2026,MUG-BLUE,1,12.00,GBP', 'E-2,20/03/2026,MUG-BLUE,1,12.00,GBP', 'E-2,20/03/2026,MUG-BLUE,1,12.00,GBP'), 'shop-e1.csv');
    expect(first.body.rowCount).toBe(3);
    // the next export repeats E-2 (both of its lines) and adds E-3
    const second = await importFile(owner, csv('E-2,20/03/2026,MUG-BLUE,1,12.00,GBP', 'E-2,20/03/2026,MUG-BLUE,1,12.00,GBP', 'E-3,21/03/2026,mug-blue,1,12.00,GBP', 'E-2,20/03/2026,MUG-BLUE,1,12.00,GBP'), 'shop-e2.csv');
    expect(second.status).toBe(201);
    expect([second.body.rowCount, second.body.report.alreadyImported]).toEqual([2, 2]);
    expect((await rowsOf(second.body.id)).map((r) => r.line)).toEqual([4, 5]);
  });

  it('lets the reviewer (the shop manager) import, and undo an import', async () => {
    const res = await importFile(reviewer, csv('F-1,22/03/2026,TOTE-01,3,45.00,GBP'), 'june-export.csv');
    expect(res.status).toBe(201);
    expect(res.body.importedBy.name).toBe('June Abara');
    const listed = (await owner.get('/api/sales/imports').expect(200)).body.imports;
    expect(listed[0]).toMatchObject({ id: res.body.id, fileName: 'june-export.csv', rowCount: 1, importedBy: { name: 'June Abara' } });
    expect((await reviewer.delete(`/api/sales/imports/${res.body.id}`)).status).toBe(204);
    expect(await rowsOf(res.body.id)).toEqual([]);
    // undone, the same file may come in again
    expect((await importFile(reviewer, csv('F-1,22/03/2026,TOTE-01,3,45.00,GBP'), 'june-export.csv')).status).toBe(201);
  });

  it('answers 400 with the field for a mapping that is not complete', async () => {
    const res = await owner.upload('/api/sales/imports', csv('G-1,22/03/2026,TOTE-01,3,45.00,GBP'), 'g.csv', { mapping: JSON.stringify({ ...shopMapping, dateFormat: undefined }) });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(['mapping.dateFormat']);
  });
});

describe('another studio', () => {
  it('sees none of these imports and cannot undo them', async () => {
    const other = (await signUpOwner(t.app, 'Another Coast Studio')).client;
    const mine = (await owner.get('/api/sales/imports')).body.imports;
    expect(mine.length).toBeGreaterThan(0);
    expect((await other.get('/api/sales/imports').expect(200)).body.imports).toEqual([]);
    const del = await other.delete(`/api/sales/imports/${mine[0].id}`);
    expect(del.status).toBe(404);
    expect(JSON.stringify(del.body)).not.toContain(mine[0].fileName);
    const summary = await other.get('/api/sales/summary?from=2026-01-01&to=2026-12-31').expect(200);
    expect([summary.body.totals.units, summary.body.products]).toEqual([0, []]);
    // their SKUs are not ours: the same rows are unknown SKUs there
    const preview = await other.upload('/api/sales/imports/preview', csv('Z-1,14/03/2026,MUG-BLUE,1,12.00,GBP'), 'z.csv', { mapping: mappingJson() });
    expect(preview.body.validation.unknownSkus).toEqual([{ sku: 'MUG-BLUE', rows: 1, firstLine: 2 }]);
  });
});
