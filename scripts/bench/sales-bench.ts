// Sales import speed: a 50,000-row shop export imported through the real sales service (stream
// parse, every row checked, batched inserts in one transaction) into a throwaway database,
// against csv-parse alone over the same file and Postgres COPY of the same file into a bare
// table, both measured in the same run. `npm run bench -- sales`, or standalone:
// `tsx scripts/bench/sales-bench.ts`.
import { randomUUID } from 'node:crypto';
import { chmod, mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseConfig } from '../../server/config';
import { memberships, products, productVariants, studios, users } from '../../server/db/schema/index';
import { readSalesRecords, sniffSalesCsv } from '../../server/features/sales/sales-csv';
import { createSalesRepository } from '../../server/features/sales/sales.repository';
import { createSalesService } from '../../server/features/sales/sales.service';
import { openRuntime, type Runtime } from '../../server/runtime';
import { salesMappingSchema } from '../../shared/contracts/sales';
import { emptyLayout } from '../../shared/scene';
import { demoSalesMapping, writeDemoSalesCsv, type DemoSku } from '../demo/demo-sales';

// Target of the sales issue: a 50,000-row file imported in well under 10 s.
const TARGET_MS = 10_000;

export type SalesBenchResult = { rows: number; fileMb: number; importMs: number; previewMs: number; reimportMs: number; parseOnlyMs: number; copyMs: number | null; pass: boolean };

async function timed<T>(fn: () => Promise<T>): Promise<[number, T]> {
  const started = performance.now();
  const value = await fn();
  return [performance.now() - started, value];
}

async function seedStudio(runtime: Runtime, skuCount: number) {
  const db = runtime.db.db;
  const [user] = await db.insert(users).values({ email: `bench-sales-${randomUUID()}@saltmarsh.test`, name: 'June Abara', passwordHash: 'not-a-real-hash' }).returning();
  const [studio] = await db.insert(studios).values({ name: 'Saltmarsh Sales Bench' }).returning();
  await db.insert(memberships).values({ studioId: studio.id, userId: user.id, role: 'reviewer' });
  const productRows = await db
    .insert(products)
    .values(Array.from({ length: skuCount / 3 }, (_, i) => ({ studioId: studio.id, name: `Bench product ${i + 1}`, templateId: 'mug-11oz', layout: emptyLayout, stage: 'listed' as const })))
    .returning({ id: products.id });
  const skus: DemoSku[] = [];
  const variants = productRows.flatMap((p, i) =>
    ['BLUE', 'WHITE', 'BLACK'].map((colour, j) => {
      const sku = `SM-${String(i + 1).padStart(3, '0')}-${colour}`;
      skus.push({ sku, priceMinor: 900 + ((i * 37 + j * 11) % 25) * 100, popularity: 0.5 + ((i * 7 + j) % 5) / 2, season: (['spring', 'autumn', 'all'] as const)[i % 3] });
      return { studioId: studio.id, productId: p.id, name: colour.toLowerCase(), sku, position: j };
    }),
  );
  await db.insert(productVariants).values(variants);
  return { studioId: studio.id, userId: user.id, skus };
}

export async function benchSales(options: { runtime?: Runtime; env?: Record<string, string>; rows?: number; log?: (line: string) => void } = {}): Promise<SalesBenchResult> {
  const log = options.log ?? console.log;
  const wantedRows = options.rows ?? 50_000;
  const runtime = options.runtime ?? (await openRuntime(parseConfig({ ...process.env, NODE_ENV: 'test', ...options.env })));
  const dir = await mkdtemp(path.join(os.tmpdir(), 'motifold-sales-bench-'));
  try {
    const { studioId, userId, skus } = await seedStudio(runtime, 120);
    const filePath = path.join(dir, 'shop-export.csv');
    const written = await writeDemoSalesCsv(filePath, { skus, months: 12, endDate: '2026-11-30', ordersPerDay: 120, refundRate: 0.02, maxRows: wantedRows });
    const fileMb = (await import('node:fs')).statSync(filePath).size / 1048576;
    const mapping = salesMappingSchema.parse(demoSalesMapping);
    const service = createSalesService(createSalesRepository(runtime.db.db));
    const file = { filePath, fileName: 'shop-export.csv' };

    // Peer 1: csv-parse alone, the same stream reader the import uses, no checks, no database.
    const [parseOnlyMs, parsed] = await timed(async () => {
      let n = 0;
      for await (const _ of readSalesRecords(filePath, await sniffSalesCsv(filePath))) n++;
      return n - 1;
    });
    // Peer 2: Postgres COPY of the same file into a bare text table (the server reads the file itself).
    let copyMs: number | null = null;
    try {
      await chmod(dir, 0o755);
      await chmod(filePath, 0o644);
      await runtime.db.pool.query('create table if not exists bench_sales_copy ("order" text, sold_on text, sku text, qty text, total text, currency text)');
      [copyMs] = await timed(() => runtime.db.pool.query(`copy bench_sales_copy from '${filePath.replace(/'/g, "''")}' with (format csv, header true)`));
      await runtime.db.pool.query('drop table bench_sales_copy');
    } catch (err) {
      log(`(Postgres COPY peer skipped: ${(err as Error).message})`);
    }

    const [previewMs, preview] = await timed(() => service.preview(studioId, file, mapping));
    const [importMs, outcome] = await timed(() => service.importFile(studioId, userId, file, mapping, false));
    if (!outcome.ok) throw new Error(`bench import refused: ${JSON.stringify(outcome.validation.badRows.slice(0, 3))}`);
    // The next month's export overlaps this one completely: every row is found by its key and skipped.
    const overlapPath = path.join(dir, 'shop-export-again.csv');
    await writeDemoSalesCsv(overlapPath, { skus, months: 12, endDate: '2026-11-30', ordersPerDay: 120, refundRate: 0.02, maxRows: wantedRows });
    await (await import('node:fs/promises')).appendFile(overlapPath, '\r\n');
    const [reimportMs, again] = await timed(() => service.importFile(studioId, userId, { filePath: overlapPath, fileName: 'shop-export-again.csv' }, mapping, false));
    if (!again.ok) throw new Error('bench re-import refused');

    const result: SalesBenchResult = { rows: written.rows, fileMb, importMs, previewMs, reimportMs, parseOnlyMs, copyMs, pass: importMs < TARGET_MS && outcome.import.rowCount === written.rows };
    const ms = (v: number) => `${Math.round(v).toLocaleString('en')} ms`.padStart(10);
    log(`machine load average ${os.loadavg().map((l) => l.toFixed(1)).join(' / ')} on ${os.cpus().length} cores (1 / 5 / 15 min)`);
    log(`sales file: ${written.rows.toLocaleString('en')} rows (${parsed.toLocaleString('en')} parsed), ${fileMb.toFixed(1)} MB, ${skus.length} SKUs`);
    log(`import through the sales service      ${ms(importMs)}  ${outcome.import.rowCount.toLocaleString('en')} rows written   target < ${TARGET_MS / 1000} s ${result.pass ? 'ok' : 'MISSED'}`);
    log(`preview (whole file checked)          ${ms(previewMs)}  ${preview.validation?.badRowCount ?? '?'} bad rows`);
    log(`overlapping export, all rows known    ${ms(reimportMs)}  ${again.import.report.alreadyImported.toLocaleString('en')} already imported, ${again.import.rowCount} written`);
    log(`csv-parse alone, same file            ${ms(parseOnlyMs)}`);
    if (copyMs !== null) log(`Postgres COPY into a bare text table  ${ms(copyMs)}`);
    log(`ratio import / csv-parse alone: ${(importMs / parseOnlyMs).toFixed(2)}x${copyMs !== null ? `; import / COPY: ${(importMs / copyMs).toFixed(2)}x — COPY checks nothing and keeps no index` : ''}`);
    return result;
  } finally {
    await rm(dir, { recursive: true, force: true });
    if (!options.runtime) await runtime.close();
  }
}

// Standalone: throwaway Postgres, S3 and mail, removed afterwards.
if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const { startTestServices } = await import('../../tests/setup/test-services');
  const services = await startTestServices({ label: 'sales-bench' });
  try {
    const result = await benchSales({ env: services.env });
    process.exitCode = result.pass ? 0 : 1;
  } finally {
    await services.stop();
  }
}
