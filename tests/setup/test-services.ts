import { existsSync } from 'node:fs';
import { mkdir, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { hasMigrations, migrateDatabase } from '../../scripts/services/app-steps';
import { startFakeMail } from '../../scripts/services/fake-mail';
import { startFakeS3 } from '../../scripts/services/fake-s3';
import { freePort } from '../../scripts/services/free-port';
import { ensurePostgres } from '../../scripts/services/postgres';
import { findPostgresBin, runPgTool } from '../../scripts/services/postgres-tools';
import { storageRoot } from '../../scripts/services/repo-paths';

export const testStorageRoot = path.join(storageRoot, 'test');
const bucket = 'motifold-test';

export interface TestServices {
  /** The service half of the server's environment, as `npm start` would set it. */
  env: Record<string, string>;
  runDir: string;
  stop(): Promise<void>;
}

export interface StartTestServicesOptions {
  /** Names the run folder (storage/test/<label>-<time>-<pid>). */
  label: string;
  log?: (line: string) => void;
}

/**
 * A throwaway Postgres (crash safety off, random port, migrated), object storage and a mail
 * catcher on random ports, all under one folder that stop() deletes.
 */
export async function startTestServices({ label, log = () => {} }: StartTestServicesOptions): Promise<TestServices> {
  await removeAbandonedRuns();
  const runDir = path.join(testStorageRoot, `${label}-${Date.now()}-${process.pid}`);
  await mkdir(runDir, { recursive: true });
  await writeFile(path.join(runDir, 'owner.pid'), String(process.pid));
  const stops: Array<() => Promise<void>> = [];
  const stop = async () => {
    for (const step of stops.reverse()) await step().catch((error) => console.error(error));
    await rm(runDir, { recursive: true, force: true });
  };

  try {
    let startedAt = performance.now();
    const postgres = await ensurePostgres({
      dataDir: path.join(runDir, 'pg'),
      port: await freePort(),
      database: 'motifold_test',
      throwaway: true,
    });
    stops.push(postgres.stop);
    log(`test database ready in ${Math.round(performance.now() - startedAt)} ms`);

    startedAt = performance.now();
    if (hasMigrations()) await migrateDatabase(postgres.url);
    else console.warn('server/db/migrate.ts is missing: the test database has no tables');
    log(`migrations applied in ${Math.round(performance.now() - startedAt)} ms`);

    const s3 = await startFakeS3({ directory: path.join(runDir, 's3'), port: 0, bucket });
    stops.push(s3.stop);
    const mail = await startFakeMail({ smtpPort: 0, webPort: 0, mailDirectory: path.join(runDir, 'mail') });
    stops.push(mail.stop);

    const env = {
      DATABASE_URL: postgres.url,
      S3_ENDPOINT: s3.endpoint,
      S3_BUCKET: bucket,
      S3_REGION: 'us-east-1',
      S3_ACCESS_KEY_ID: 'S3RVER',
      S3_SECRET_ACCESS_KEY: 'S3RVER',
      SMTP_URL: mail.smtpUrl,
      MAIL_INBOX_URL: mail.inboxUrl,
      STORAGE_DIR: path.join(runDir, 'files'),
      AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
    };
    return { env, runDir, stop };
  } catch (error) {
    await stop();
    throw error;
  }
}

// A run whose vitest process died (killed, crashed) leaves its database running; later runs
// clean it up. Runs of other live processes (a colleague's test run) are left alone.
async function removeAbandonedRuns(): Promise<void> {
  if (!existsSync(testStorageRoot)) return;
  for (const entry of await readdir(testStorageRoot)) {
    const runDir = path.join(testStorageRoot, entry);
    const owner = Number(await readFile(path.join(runDir, 'owner.pid'), 'utf8').catch(() => ''));
    if (!owner || isAlive(owner)) continue;
    const dataDir = path.join(runDir, 'pg', 'data');
    if (existsSync(path.join(dataDir, 'postmaster.pid'))) {
      await runPgTool(findPostgresBin(), 'pg_ctl', ['-D', dataDir, '-m', 'immediate', '-w', 'stop']).catch(() => {});
    }
    await rm(runDir, { recursive: true, force: true });
  }
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}
