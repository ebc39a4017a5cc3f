import type { AppConfig } from './config';
import { createDb, type DbHandle } from './db/client';
import type { JobQueue } from './jobs/queue';
import { startQueue } from './jobs/queue';
import { createMailer, type Mailer } from './lib/mail';
import { createS3Client, createStorage, type ObjectStorage } from './lib/storage';

export type Runtime = {
  config: AppConfig;
  db: DbHandle;
  storage: ObjectStorage;
  mailer: Mailer;
  queue: JobQueue;
  close(): Promise<void>;
};

// The long-lived connections a web or worker process holds, opened and closed in one place.
export async function openRuntime(config: AppConfig): Promise<Runtime> {
  const db = createDb(config.DATABASE_URL);
  const storage = createStorage(createS3Client(config), config.S3_BUCKET);
  await storage.ensureBucket();
  const mailer = createMailer(config);
  const queue = await startQueue(config.DATABASE_URL);
  return {
    config,
    db,
    storage,
    mailer,
    queue,
    async close() {
      await queue.stop();
      await db.close();
    },
  };
}
