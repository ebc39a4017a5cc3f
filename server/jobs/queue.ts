import PgBoss from 'pg-boss';

export const queueNames = { importOriginal: 'import-original', exportProduct: 'export-product' } as const;

export type ImportJobData = { originalId: string };
export type ExportJobData = { exportId: string };

export type JobQueue = {
  enqueueImport(originalId: string): Promise<void>;
  enqueueExport(exportId: string): Promise<void>;
  boss: PgBoss;
  stop(): Promise<void>;
};

// Postgres is the queue: jobs survive restarts and any number of worker processes share it.
export async function startQueue(databaseUrl: string): Promise<JobQueue> {
  const boss = new PgBoss({ connectionString: databaseUrl, max: 4 });
  boss.on('error', (err) => console.error('[queue]', err.message));
  await boss.start();
  await boss.createQueue(queueNames.importOriginal, {
    name: queueNames.importOriginal,
    // A worker killed mid-import leaves the job active; it expires and is retried from the stored file.
    retryLimit: 3,
    retryDelay: 5,
    retryBackoff: true,
    expireInSeconds: 15 * 60,
  });
  await boss.createQueue(queueNames.exportProduct, {
    name: queueNames.exportProduct,
    // An export renders again from the product and its motifs, so a retry is always safe.
    retryLimit: 2,
    retryDelay: 5,
    expireInSeconds: 15 * 60,
  });
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
