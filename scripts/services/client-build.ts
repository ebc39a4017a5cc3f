import { existsSync } from 'node:fs';
import { readdir, stat } from 'node:fs/promises';
import path from 'node:path';
import { runChild, type ChildOptions } from './child-process';
import { repoRoot, viteCli } from './repo-paths';

export const clientOutDir = path.join(repoRoot, 'dist', 'client');

// Everything that changes what `vite build` writes.
const clientInputs = ['src', 'shared', 'public', 'index.html', 'vite.config.ts', 'tailwind.config.ts', 'tsconfig.json', 'package-lock.json', 'scripts/services/client-build.ts'];

async function newestChange(target: string): Promise<number> {
  if (!existsSync(target)) return 0;
  const info = await stat(target);
  if (!info.isDirectory()) return info.mtimeMs;
  let newest = info.mtimeMs; // a deleted file only shows as its folder's change
  for (const entry of await readdir(target)) {
    newest = Math.max(newest, await newestChange(path.join(target, entry)));
  }
  return newest;
}

/** The built client is current when its index.html is newer than every input file. */
export async function isClientBuildFresh(outDir = clientOutDir): Promise<boolean> {
  const builtIndex = path.join(outDir, 'index.html');
  if (!existsSync(builtIndex)) return false;
  const builtAt = (await stat(builtIndex)).mtimeMs;
  for (const input of clientInputs) {
    if ((await newestChange(path.join(repoRoot, input))) >= builtAt) return false;
  }
  return true;
}

/** Builds the client with vite unless the last build is still current; returns whether it built. */
export async function ensureClientBuild(options: ChildOptions = {}): Promise<boolean> {
  if (await isClientBuildFresh()) return false;
  await runChild('vite build', process.execPath, [viteCli, 'build', '--logLevel', 'warn'], {
    ...options,
    // Always React's production build: under NODE_ENV=test (tests, benches) vite would otherwise
    // bundle the development runtime, several times slower and not what users get.
    env: { ...(options.env ?? process.env), NODE_ENV: 'production' },
    errorCode: 'client.build_failed',
  });
  return true;
}
