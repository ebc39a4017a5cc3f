import { existsSync } from 'node:fs';
import { mkdir, readdir, rm } from 'node:fs/promises';
import path from 'node:path';
import pg from 'pg';
import { isPortTaken } from './free-port';
import { findPostgresBin, prepareClusterFolder, readClusterPort, runPgTool } from './postgres-tools';
import { ServiceError } from './service-error';

export interface PostgresOptions {
  /** Cluster folder (e.g. storage/postgres); the cluster lives in <dataDir>/data, its log in <dataDir>/log. */
  dataDir: string;
  port: number;
  database: string;
  /** Tests only: trades crash safety for speed. */
  throwaway?: boolean;
}

export interface RunningPostgres {
  url: string;
  stop(): Promise<void>;
  startedByUs: boolean;
}

// Crash safety off: a throwaway test cluster is deleted afterwards anyway.
const throwawaySettings = ['-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off'];

export async function ensurePostgres(options: PostgresOptions): Promise<RunningPostgres> {
  const clusterDir = path.resolve(options.dataDir);
  const dataDir = path.join(clusterDir, 'data');
  const logFile = path.join(clusterDir, 'log', 'server.log');
  const bin = findPostgresBin();

  await mkdir(path.dirname(logFile), { recursive: true });
  await prepareClusterFolder(clusterDir, dataDir);
  if (!existsSync(path.join(dataDir, 'PG_VERSION'))) await initCluster(bin, dataDir, options.throwaway ?? false);

  const runningPort = (await isClusterRunning(bin, dataDir)) ? await readClusterPort(dataDir) : null;
  const port = runningPort ?? options.port;
  let startedByUs = false;
  if (runningPort === null) {
    if (await isPortTaken(port)) {
      throw new ServiceError(
        'postgres.port_taken',
        `port ${port} is already in use by another program, so the database in ${clusterDir} cannot start; stop that program or set DATABASE_URL`,
      );
    }
    await startCluster(bin, dataDir, logFile, port, options.throwaway ?? false);
    startedByUs = true;
  }

  await createDatabaseIfMissing(port, options.database);
  let stopped = false;
  return {
    url: `postgres://postgres@127.0.0.1:${port}/${options.database}`,
    startedByUs,
    async stop() {
      if (!startedByUs || stopped) return;
      stopped = true;
      await runPgTool(bin, 'pg_ctl', ['-D', dataDir, '-m', 'fast', '-w', '-t', '30', 'stop']);
    },
  };
}

async function initCluster(bin: string, dataDir: string, throwaway: boolean): Promise<void> {
  // A half-made cluster (initdb interrupted) would make initdb refuse; it holds nothing worth keeping.
  for (const entry of await readdir(dataDir)) await rm(path.join(dataDir, entry), { recursive: true, force: true });
  const args = ['-D', dataDir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'];
  await runPgTool(bin, 'initdb', throwaway ? [...args, '--no-sync'] : args);
}

async function isClusterRunning(bin: string, dataDir: string): Promise<boolean> {
  try {
    await runPgTool(bin, 'pg_ctl', ['-D', dataDir, 'status']);
    return true;
  } catch {
    return false;
  }
}

async function startCluster(bin: string, dataDir: string, logFile: string, port: number, throwaway: boolean) {
  // TCP on loopback only; `-k ''` turns off the unix socket (no socket path length or permission traps).
  const serverOptions = [`-p ${port}`, "-k ''", '-c listen_addresses=127.0.0.1', ...(throwaway ? throwawaySettings : [])];
  try {
    await runPgTool(bin, 'pg_ctl', ['-D', dataDir, '-l', logFile, '-w', '-t', '30', '-o', serverOptions.join(' '), 'start']);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    throw new ServiceError('postgres.start_failed', `${message}\n(see ${logFile})`);
  }
}

async function createDatabaseIfMissing(port: number, database: string): Promise<void> {
  if (!/^[a-z_][a-z0-9_-]*$/i.test(database)) {
    throw new ServiceError('postgres.bad_database_name', `database name "${database}" must be letters, digits, _ or -`);
  }
  const client = new pg.Client({ host: '127.0.0.1', port, user: 'postgres', database: 'postgres' });
  await client.connect();
  try {
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [database]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE "${database}"`);
  } finally {
    await client.end();
  }
}
