import { copyFile, rm, stat } from 'node:fs/promises';
import { availableParallelism } from 'node:os';
import path from 'node:path';
import { parseConfig } from '../../server/config';
import { memberships, studios, users } from '../../server/db/schema/index';
import { createEarlyUnpacks } from '../../server/features/originals/early-unpacks';
import { createOriginalImporter, type ImportPhaseTimings } from '../../server/features/originals/import-original';
import { createOriginalsCleanup } from '../../server/features/originals/originals-cleanup';
import { createOriginalsRepository } from '../../server/features/originals/originals.repository';
import { createOriginalsService } from '../../server/features/originals/originals.service';
import { prewarmUnpackWorker, runUnpack } from '../../server/features/originals/unpack/run-unpack';
import { openRuntime } from '../../server/runtime';
import type { UnpackBenchRow } from './import-bench';
import { generateBenchPsds } from './psd-fixtures';
import { startStorageProcess } from './storage-process';

export type ImportBenchRow = {
  file: string; workerInProcess: boolean; wallMs: number; uploadMs: number; timings: ImportPhaseTimings;
  parentPeakRssMb: number; parentCpuMs: number; storageCpuMs: number; vsImageMagick: number | null; vsFloor: number;
};

// The whole import a user waits for — upload to storage, queue row, unpack in the child, S3 puts
// of masters and thumbnails, the DB commit — against the peers timed in the same run. Measured
// as `npm start` runs it (the worker in the web process, so the upload unpacks while it is
// stored), then with the worker in a process of its own (`npm run worker`: the job downloads the
// stored file first), both with a pre-started child. The fake storage runs in a process of its
// own, as under `npm start`.
export async function benchImportEndToEnd(peers: UnpackBenchRow[], log: (line: string) => void = console.log, only?: string[]): Promise<ImportBenchRow[]> {
  const bucket = process.env.S3_BUCKET ?? 'motifold-bench';
  const storageDir = path.resolve('storage/bench', `s3-${process.pid}`);
  const storageProcess = await startStorageProcess(storageDir, bucket);
  const runtime = await openRuntime(parseConfig({ ...process.env, NODE_ENV: 'test', S3_ENDPOINT: storageProcess.endpoint, S3_BUCKET: bucket }));
  const rows: ImportBenchRow[] = [];
  const cpus = availableParallelism();
  const earlyUnpacks = createEarlyUnpacks({ runUnpack, maxRunning: 1 });
  try {
    const db = runtime.db.db;
    const [user] = await db.insert(users).values({ name: 'Bench', email: `bench-${Date.now()}@saltmarsh.test`, passwordHash: 'x' }).returning();
    // one studio per way of running, so the second finds none of the first's pixels stored
    const studioFor = new Map<boolean, string>();
    for (const inProcess of [true, false]) {
      const [studio] = await db.insert(studios).values({ name: `Bench studio ${inProcess ? 'in-process' : 'worker'} ${Date.now()}` }).returning();
      await db.insert(memberships).values({ studioId: studio.id, userId: user.id, role: 'owner' });
      studioFor.set(inProcess, studio.id);
    }
    const repo = createOriginalsRepository(db);
    let timings: ImportPhaseTimings | undefined;
    // A worker keeps one child loaded between jobs, as `npm run worker` does.
    prewarmUnpackWorker(true);
    const all = await generateBenchPsds();
    const unknown = (only ?? []).filter((name) => !all.some((p) => p.name === name));
    if (unknown.length) throw new Error(`no bench file named ${unknown.join(', ')} (there are ${all.map((p) => p.name).join(', ')})`);
    const psds = all.filter((p) => !only || only.includes(p.name));
    for (const [workerInProcess, psd] of [true, false].flatMap((inProcess) => psds.map((p) => [inProcess, p] as const))) {
      const shared = workerInProcess ? { earlyUnpacks } : {};
      const service = createOriginalsService({ repo, storage: runtime.storage, queue: { enqueueImport: async () => {} }, cleanup: createOriginalsCleanup(db, runtime.storage), ...shared });
      const importOriginal = createOriginalImporter({ db, repo, storage: runtime.storage, runUnpack, onTimings: (t) => (timings = t), ...shared });
      await new Promise((r) => setTimeout(r, 2500));
      const peer = peers.find((p) => p.file === psd.name);
      let parentPeak = process.memoryUsage.rss();
      const sampler = setInterval(() => (parentPeak = Math.max(parentPeak, process.memoryUsage.rss())), 50);
      const storageCpuBefore = await storageProcess.cpuMs();
      const started = performance.now();
      const cpuBefore = process.cpuUsage();
      const upload = path.join(path.dirname(psd.file), `${psd.name}.upload`);
      await copyFile(psd.file, upload);
      const { id } = await service.upload({ studioId: studioFor.get(workerInProcess)!, userId: user.id, filePath: upload, fileName: path.basename(psd.file), byteSize: (await stat(upload)).size, cut: 'layers' });
      const uploadMs = performance.now() - started;
      const outcome = await importOriginal(id);
      const wallMs = Math.round(performance.now() - started);
      const cpu = process.cpuUsage(cpuBefore);
      const storageCpuMs = (await storageProcess.cpuMs()) - storageCpuBefore;
      clearInterval(sampler);
      if (outcome !== 'imported' || !timings) throw new Error(`bench import of ${psd.name} ended ${outcome}`);
      const row: ImportBenchRow = {
        file: psd.name,
        workerInProcess,
        wallMs,
        uploadMs: Math.round(uploadMs),
        timings,
        parentPeakRssMb: Math.round(parentPeak / 1048576),
        parentCpuMs: Math.round((cpu.user + cpu.system) / 1000),
        storageCpuMs,
        vsImageMagick: peer?.imageMagickMs ? wallMs / peer.imageMagickMs : null,
        vsFloor: peer ? wallMs / peer.floorMs : NaN,
      };
      rows.push(row);
      const t = row.timings;
      if (!workerInProcess && psd === psds[0]) log('with the worker in a process of its own (the job downloads the stored file):');
      log(`${workerInProcess ? '' : '  '}${psd.name}: whole import ${wallMs} ms = ${row.vsImageMagick?.toFixed(2) ?? 'n/a'}x ImageMagick, ${row.vsFloor.toFixed(2)}x floor`);
      const ms = (v: number) => `${Math.round(v)} ms`;
      log(`  phases: upload to storage ${ms(row.uploadMs)}${t.unpackedEarly ? ' (unpacking meanwhile)' : ''}, claim ${ms(t.claimMs)}, download ${ms(t.downloadMs)}, unpack ${t.unpackedEarly ? 'after the claim ' : ''}${ms(t.unpackMs)} (parse ${ms(t.unpack?.parseMs ?? 0)}, cut ${ms(t.unpack?.cutMs ?? 0)}, encode ${ms(t.unpack?.encodeMs ?? 0)}),`
        + ` storage after the unpack ${ms(t.storageMs)} (${t.storedDuringUnpack} of ${t.stored} motifs stored during the unpack), db ${ms(t.dbMs)}`);
      log(`  peak memory: unpack child ${Math.round((t.childPeakRssBytes ?? 0) / 1048576)} MB, worker process ${row.parentPeakRssMb} MB`);
      const cpuTotal = Math.round((t.childCpuMs ?? 0) + row.parentCpuMs + row.storageCpuMs);
      log(`  CPU: unpack child ${Math.round(t.childCpuMs ?? 0)} ms, worker process ${row.parentCpuMs} ms, fake storage process ${row.storageCpuMs} ms;`
        + ` ${cpuTotal} ms in all, which ${cpus} CPUs need at least ${Math.round(cpuTotal / cpus)} ms of wall time for`);
    }
  } finally {
    await earlyUnpacks.close();
    prewarmUnpackWorker(false);
    await runtime.close();
    await storageProcess.stop();
    await rm(storageDir, { recursive: true, force: true });
  }
  return rows;
}
