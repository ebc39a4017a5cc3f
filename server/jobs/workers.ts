import type PgBoss from 'pg-boss';
import type { EarlyUnpacks } from '../features/originals/early-unpacks';
import { createOriginalImporter } from '../features/originals/import-original';
import { createOriginalsRepository } from '../features/originals/originals.repository';
import { prewarmUnpackWorker, runUnpack } from '../features/originals/unpack/run-unpack';
import type { Runtime } from '../runtime';
import { startExportWorkers } from './export-workers';
import { queueNames, type ImportJobData } from './queue';

// Runs import jobs (and, through startExportWorkers, export jobs): in the web process in
// development, in `npm run worker` processes in production. In the web process, `earlyUnpacks`
// (shared with the originals service) hands the jobs the uploads this process already unpacks.
export async function startImportWorkers(runtime: Runtime, options: { earlyUnpacks?: EarlyUnpacks } = {}): Promise<() => Promise<void>> {
  const stopExports = await startExportWorkers(runtime);
  const repo = createOriginalsRepository(runtime.db.db);
  const importOriginal = createOriginalImporter({ db: runtime.db.db, repo, storage: runtime.storage, runUnpack, earlyUnpacks: options.earlyUnpacks });
  // A loaded spare child saves about a second per import; tests start cold to spare the CPU.
  if (runtime.config.NODE_ENV !== 'test') void prewarmUnpackWorker(true);
  const ids: string[] = [];
  for (let i = 0; i < runtime.config.IMPORT_CONCURRENCY; i++) {
    const id = await runtime.queue.boss.work<ImportJobData>(
      queueNames.importOriginal,
      { includeMetadata: true, pollingIntervalSeconds: 0.5, batchSize: 1 },
      async (jobs: PgBoss.JobWithMetadata<ImportJobData>[]) => {
        for (const job of jobs) {
          try {
            await importOriginal(job.data.originalId);
          } catch (err) {
            if (job.retryCount >= job.retryLimit) {
              await repo.setStatus(job.data.originalId, 'failed', {
                phase: 'done',
                error: { code: 'import.failed', message: `The import could not be completed (${(err as Error).message}). The file is kept: retry it later, or delete it.` },
              });
            }
            throw err;
          }
        }
      },
    );
    ids.push(id);
  }
  return async () => {
    void prewarmUnpackWorker(false);
    await stopExports();
    for (const id of ids) await runtime.queue.boss.offWork({ id } as PgBoss.OffWorkOptions).catch(() => {});
  };
}
