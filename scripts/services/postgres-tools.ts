import { execFile } from 'node:child_process';
import { chmod, chown, mkdir, readFile, readdir, stat } from 'node:fs/promises';
import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';
import { ServiceError } from './service-error';

const execFileAsync = promisify(execFile);

// The server refuses to run as root, so when we are root every tool runs as Debian's `postgres` user.
export const runningAsRoot = process.getuid?.() === 0;

export function findPostgresBin(): string {
  const root = '/usr/lib/postgresql';
  const versions = existsSync(root)
    ? readdirSync(root)
        .filter((name) => existsSync(path.join(root, name, 'bin', 'initdb')))
        .sort((a, b) => Number(b) - Number(a))
    : [];
  if (versions.length === 0) {
    throw new ServiceError(
      'postgres.not_installed',
      'PostgreSQL server binaries were not found under /usr/lib/postgresql/*/bin; run `bash scripts/ensure-system-packages.sh postgres` (or set DATABASE_URL to an existing database)',
    );
  }
  return path.join(root, versions[0], 'bin');
}

// pg_ctl start puts the server in a session of its own (setsid), so a terminal Ctrl-C reaches
// our shutdown code and not the database, which we then stop last.
export async function runPgTool(bin: string, tool: string, args: string[]): Promise<string> {
  const executable = path.join(bin, tool);
  const [command, commandArgs] = runningAsRoot
    ? ['runuser', ['-u', 'postgres', '--', executable, ...args]]
    : [executable, args];
  try {
    // cwd '/': the postgres user may not be allowed to enter our working directory
    const { stdout } = await execFileAsync(command, commandArgs, { cwd: '/', timeout: 60_000 });
    return stdout;
  } catch (error) {
    const failure = error as { stderr?: string; stdout?: string; message: string };
    const detail = (failure.stderr || failure.stdout || failure.message).trim();
    throw new ServiceError(`postgres.${tool}_failed`, `${tool} ${args.join(' ')} failed: ${detail}`);
  }
}

// Gives the postgres user the data folder, and the right to pass through (not list) every parent.
export async function prepareClusterFolder(clusterDir: string, dataDir: string): Promise<void> {
  await mkdir(dataDir, { recursive: true });
  if (!runningAsRoot) {
    await chmod(dataDir, 0o700);
    return;
  }
  const { uid, gid } = await postgresUserIds();
  for (let dir = path.dirname(clusterDir); ; dir = path.dirname(dir)) {
    const { mode } = await stat(dir);
    if ((mode & 0o001) === 0) await chmod(dir, (mode & 0o7777) | 0o001);
    if (dir === path.dirname(dir)) break;
  }
  // a cluster folder we prepared before is already theirs; re-walking a live cluster is wasted time
  if ((await stat(clusterDir)).uid !== uid || (await stat(dataDir)).uid !== uid) {
    await chownTree(clusterDir, uid, gid);
  }
  await chmod(dataDir, 0o700);
}

async function chownTree(target: string, uid: number, gid: number): Promise<void> {
  await chown(target, uid, gid);
  const info = await stat(target);
  if (!info.isDirectory()) return;
  for (const entry of await readdir(target)) await chownTree(path.join(target, entry), uid, gid);
}

async function postgresUserIds(): Promise<{ uid: number; gid: number }> {
  const passwd = await readFile('/etc/passwd', 'utf8');
  const line = passwd.split('\n').find((entry) => entry.startsWith('postgres:'));
  const fields = line?.split(':');
  if (!fields || fields.length < 4) {
    throw new ServiceError(
      'postgres.no_system_user',
      'there is no `postgres` system user; install PostgreSQL with `bash scripts/ensure-system-packages.sh postgres`',
    );
  }
  return { uid: Number(fields[2]), gid: Number(fields[3]) };
}

// postmaster.pid, line 4 holds the port the running cluster listens on.
export async function readClusterPort(dataDir: string): Promise<number | null> {
  try {
    const lines = (await readFile(path.join(dataDir, 'postmaster.pid'), 'utf8')).split('\n');
    const port = Number(lines[3]);
    return Number.isInteger(port) && port > 0 ? port : null;
  } catch {
    return null;
  }
}
