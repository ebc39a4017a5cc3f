import PgBoss from 'pg-boss';
import { defaultUnpackLimits } from '../features/originals/unpack/unpack-limits';

export const queueNames = { importOriginal: 'import-original', exportProduct: 'export-product' } as const;

export type ImportJobData = { originalId: string };
export type ExportJobData = { exportId: string };

export type JobQueue = {
  enqueueImport(originalId: string): Promise<void>;
  enqueueExport(exportId: string): Promise<void>;
  boss: PgBoss;
  stop(): Promise<void>;
};

// Two processes starting at once (a server and a worker, or two test files) may both create
// the same queue: Postgres then answers one of them with a deadlock or a duplicate. The
// creation is idempotent, so it is simply tried again.
const transientCodes = new Set(['40P01', '40001', '23505']);

export async function retryTransient<T>(work: () => Promise<T>, attempts = 5): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await work();
    } catch (err) {
      const code = (err as { code?: string }).code;
      if (attempt >= attempts || !code || !transientCodes.has(code)) throw err;
      await new Promise((resolve) => setTimeout(resolve, 50 * attempt + Math.random() * 50));
    }
  }
}

// A worker killed mid-import leaves its job active until the job expires; then it is retried from
// the stored file. The unpack child is killed at its own time limit; downloading a 1 GiB original
// and storing a few thousand objects take a few minutes at most besides, so an import still active
// six minutes past that limit has lost its worker (a live one re-claimed would unpack twice).
export const IMPORT_JOB_EXPIRE_SECONDS = Math.ceil(defaultUnpackLimits.timeoutMs / 1000) + 6 * 60;

// Postgres is the queue: jobs survive restarts and any number of worker processes share it.
export async function startQueue(databaseUrl: string): Promise<JobQueue> {
  const boss = new PgBoss({ connectionString: databaseUrl, max: 4 });
  boss.on('error', (err) => console.error('[queue]', err.message));
  await boss.start();
  const importPolicy = {
    name: queueNames.importOriginal,
    retryLimit: 3,
    retryDelay: 5,
    retryBackoff: true,
    expireInSeconds: IMPORT_JOB_EXPIRE_SECONDS,
  };
  await retryTransient(() => boss.createQueue(queueNames.importOriginal, importPolicy));
  // a queue made by an earlier version keeps its old policy unless told
  await retryTransient(() => boss.updateQueue(queueNames.importOriginal, importPolicy));
  await retryTransient(() => boss.createQueue(queueNames.exportProduct, {
    name: queueNames.exportProduct,
    // An export renders again from the product and its motifs, so a retry is always safe.
    retryLimit: 2,
    retryDelay: 5,
    expireInSeconds: 15 * 60,
  }));
  return {
    boss,
    async enqueueExport(exportId) {
      await boss.send(queueNames.exportProduct, { exportId } satisfies ExportJobData, { singletonKey: exportId });
    },
    async enqueueImport(originalId) {
      await boss.send(queueNames.importOriginal, { originalId } satisfies ImportJobData, { singletonKey: originalId });
    },
    async stop() {
      await boss.stop({ graceful: true, timeout: 10_000 });
    },
  };
}
