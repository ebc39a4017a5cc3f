import { copyFile, stat } from 'node:fs/promises';
import path from 'node:path';
import { parseConfig } from '../../server/config';
import { memberships, studios, users } from '../../server/db/schema/index';
import { createOriginalImporter, type ImportPhaseTimings } from '../../server/features/originals/import-original';
import { createOriginalsCleanup } from '../../server/features/originals/originals-cleanup';
import { createOriginalsRepository } from '../../server/features/originals/originals.repository';
import { createOriginalsService } from '../../server/features/originals/originals.service';
import { prewarmUnpackWorker, runUnpack } from '../../server/features/originals/unpack/run-unpack';
import { openRuntime } from '../../server/runtime';
import type { UnpackBenchRow } from './import-bench';
import { generateBenchPsds } from './psd-fixtures';

export type ImportBenchRow = { file: string; wallMs: number; uploadMs: number; timings: ImportPhaseTimings; parentPeakRssMb: number; vsImageMagick: number | null; vsFloor: number };

// The whole import a user waits for — upload to storage, queue row, unpack in the child, S3 puts
// of masters and thumbnails, the DB commit — against the peers timed in the same run.
export async function benchImportEndToEnd(peers: UnpackBenchRow[], log: (line: string) => void = console.log): Promise<ImportBenchRow[]> {
  const runtime = await openRuntime(parseConfig({ ...process.env, NODE_ENV: 'test' }));
  const rows: ImportBenchRow[] = [];
  try {
    const db = runtime.db.db;
    const [studio] = await db.insert(studios).values({ name: `Bench studio ${Date.now()}` }).returning();
    const [user] = await db.insert(users).values({ name: 'Bench', email: `bench-${Date.now()}@saltmarsh.test`, passwordHash: 'x' }).returning();
    await db.insert(memberships).values({ studioId: studio.id, userId: user.id, role: 'owner' });
    const repo = createOriginalsRepository(db);
    const service = createOriginalsService({ repo, storage: runtime.storage, queue: { enqueueImport: async () => {} }, cleanup: createOriginalsCleanup(db, runtime.storage) });
    let timings: ImportPhaseTimings | undefined;
    const importOriginal = createOriginalImporter({ db, repo, storage: runtime.storage, runUnpack, onTimings: (t) => (timings = t) });
    // A worker keeps one child loaded between jobs, as `npm run worker` does.
    prewarmUnpackWorker(true);
    for (const psd of await generateBenchPsds()) {
      await new Promise((r) => setTimeout(r, 2500));
      const peer = peers.find((p) => p.file === psd.name);
      let parentPeak = process.memoryUsage().rss;
      const sampler = setInterval(() => (parentPeak = Math.max(parentPeak, process.memoryUsage().rss)), 50);
      const started = performance.now();
      const upload = path.join(path.dirname(psd.file), `${psd.name}.upload`);
      await copyFile(psd.file, upload);
      const { id } = await service.upload({ studioId: studio.id, userId: user.id, filePath: upload, fileName: path.basename(psd.file), byteSize: (await stat(upload)).size, cut: 'layers' });
      const uploadMs = performance.now() - started;
      const outcome = await importOriginal(id);
      const wallMs = Math.round(performance.now() - started);
      clearInterval(sampler);
      if (outcome !== 'imported' || !timings) throw new Error(`bench import of ${psd.name} ended ${outcome}`);
      const row: ImportBenchRow = {
        file: psd.name,
        wallMs,
        uploadMs: Math.round(uploadMs),
        timings,
        parentPeakRssMb: Math.round(parentPeak / 1048576),
        vsImageMagick: peer?.imageMagickMs ? wallMs / peer.imageMagickMs : null,
        vsFloor: peer ? wallMs / peer.floorMs : NaN,
      };
      rows.push(row);
      const t = row.timings;
      log(`${psd.name}: whole import ${wallMs} ms = ${row.vsImageMagick?.toFixed(2) ?? 'n/a'}x ImageMagick, ${row.vsFloor.toFixed(2)}x floor`);
      const ms = (v: number) => `${Math.round(v)} ms`;
      log(`  phases: upload to storage ${ms(row.uploadMs)}, claim ${ms(t.claimMs)}, download ${ms(t.downloadMs)}, unpack ${ms(t.unpackMs)} (parse ${ms(t.unpack?.parseMs ?? 0)}, cut ${ms(t.unpack?.cutMs ?? 0)}, encode ${ms(t.unpack?.encodeMs ?? 0)}),`
        + ` storage after the unpack ${ms(t.storageMs)} (${t.storedDuringUnpack} of ${t.stored} motifs stored during the unpack), db ${ms(t.dbMs)}`);
      log(`  peak memory: unpack child ${Math.round((t.childPeakRssBytes ?? 0) / 1048576)} MB, worker process ${row.parentPeakRssMb} MB`);
    }
  } finally {
    prewarmUnpackWorker(false);
    await runtime.close();
  }
  return rows;
}
