import { randomBytes } from 'node:crypto';
import { existsSync } from 'node:fs';
import { readFile, writeFile, mkdir } from 'node:fs/promises';
import path from 'node:path';
import { startFakeMail } from './fake-mail';
import { startFakeS3 } from './fake-s3';
import { ensurePostgres } from './postgres';
import { storageRoot } from './repo-paths';

export interface LocalServicePorts {
  postgres: number;
  s3: number;
  smtp: number;
  inbox: number;
}

export const localServicePorts: LocalServicePorts = { postgres: 54329, s3: 4568, smtp: 1025, inbox: 1080 };

export interface LocalServices {
  /** The service half of the server's environment (database, storage, mail). */
  env: Record<string, string>;
  /** One line per service, for people. */
  summary: string[];
  stop(): Promise<void>;
}

type Stop = () => Promise<void>;

/**
 * Starts what the app needs on this machine: Postgres, object storage and a mail catcher,
 * each skipped when its variable (DATABASE_URL, S3_ENDPOINT, SMTP_URL) already points elsewhere.
 */
export async function startLocalServices(ports: LocalServicePorts = localServicePorts): Promise<LocalServices> {
  const given = process.env;
  const stops: Stop[] = [];
  const summary: string[] = [];
  const env: Record<string, string> = {
    S3_BUCKET: given.S3_BUCKET ?? 'motifold',
    S3_REGION: given.S3_REGION ?? 'us-east-1',
    S3_ACCESS_KEY_ID: given.S3_ACCESS_KEY_ID ?? 'S3RVER',
    S3_SECRET_ACCESS_KEY: given.S3_SECRET_ACCESS_KEY ?? 'S3RVER',
    STORAGE_DIR: given.STORAGE_DIR ?? storageRoot,
    AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
  };
  const stopAll = async () => {
    for (const stop of stops.reverse()) await stop().catch((error) => console.error(error));
  };

  try {
    if (given.DATABASE_URL) {
      env.DATABASE_URL = given.DATABASE_URL;
      summary.push('database: DATABASE_URL from the environment');
    } else {
      const postgres = await ensurePostgres({
        dataDir: path.join(storageRoot, 'postgres'),
        port: ports.postgres,
        database: 'motifold',
      });
      stops.push(postgres.stop);
      env.DATABASE_URL = postgres.url;
      summary.push(`database: ${postgres.url} (${postgres.startedByUs ? 'started' : 'already running, reused'})`);
    }

    if (given.S3_ENDPOINT) {
      env.S3_ENDPOINT = given.S3_ENDPOINT;
      summary.push(`object storage: ${given.S3_ENDPOINT} from the environment`);
    } else {
      const s3 = await startFakeS3({ directory: path.join(storageRoot, 's3'), port: ports.s3, bucket: env.S3_BUCKET });
      stops.push(s3.stop);
      env.S3_ENDPOINT = s3.endpoint;
      summary.push(`object storage: ${s3.endpoint} (local, files in storage/s3)`);
    }

    if (given.SMTP_URL) {
      env.SMTP_URL = given.SMTP_URL;
      if (given.MAIL_INBOX_URL) env.MAIL_INBOX_URL = given.MAIL_INBOX_URL;
      summary.push(`mail: ${given.SMTP_URL} from the environment`);
    } else {
      const mail = await startFakeMail({
        smtpPort: ports.smtp,
        webPort: ports.inbox,
        mailDirectory: path.join(storageRoot, 'mail'),
      });
      stops.push(mail.stop);
      env.SMTP_URL = mail.smtpUrl;
      env.MAIL_INBOX_URL = mail.inboxUrl;
      summary.push(`mail: ${mail.smtpUrl}, inbox ${mail.inboxUrl} (local, nothing leaves this machine)`);
    }
  } catch (error) {
    await stopAll();
    throw error;
  }

  let stopped = false;
  return {
    env,
    summary,
    async stop() {
      if (stopped) return;
      stopped = true;
      await stopAll();
    },
  };
}

/** A per-machine session secret kept in storage/, so local sign-ins survive restarts. */
export async function localSessionSecret(): Promise<string> {
  if (process.env.SESSION_SECRET) return process.env.SESSION_SECRET;
  const file = path.join(storageRoot, 'session-secret');
  if (existsSync(file)) return (await readFile(file, 'utf8')).trim();
  await mkdir(storageRoot, { recursive: true });
  const secret = randomBytes(32).toString('hex');
  await writeFile(file, secret, { mode: 0o600 });
  return secret;
}
