import { fork, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { UnpackError, isUnpackErrorCode } from './unpack-error';
import { resolveUnpackLimits } from './unpack-limits';
import { childMessageSchema, type UnpackRequest } from './unpack-messages';
import type { UnpackInput } from './unpack-original';
import type { UnpackedMotif, UnpackProgress, UnpackResult } from './unpack-result';

export type { UnpackInput } from './unpack-original';

const ENTRY = fileURLToPath(new URL('./unpack-child-entry.ts', import.meta.url));
const TSX_LOADER = pathToFileURL(createRequire(import.meta.url).resolve('tsx')).href;
const MEMORY_POLL_MS = 50;
const STDERR_KEEP = 8192;
// the child handles hostile input: it gets no database, storage or session secrets
const CHILD_ENV_KEYS = ['PATH', 'NODE_ENV', 'TMPDIR', 'LANG', 'TZ', 'UV_THREADPOOL_SIZE', 'VIPS_CONCURRENCY'];

// Unpacks an uploaded original in a child process (tsx loader, capped V8 heap, resident
// memory watched, wall-clock limit), so a hostile file can never take the calling process down.
// Rejects with an UnpackError naming the problem. `onMotif` hears of each motif whose files are
// written, before the result (which lists every motif again). Aborting `signal` stops the child
// at once and rejects with an AbortError: not an UnpackError, as the file may well be fine.
export function runUnpack(
  input: UnpackInput,
  onProgress?: (progress: UnpackProgress) => void,
  onMotif?: (motif: UnpackedMotif) => void,
  signal?: AbortSignal,
): Promise<UnpackResult> {
  if (signal?.aborted) return Promise.reject(cancelled());
  const limits = resolveUnpackLimits(input.limits);
  const started = performance.now();
  const child = takeChild(Math.round(limits.maxHeapMb));
  return new Promise<UnpackResult>((resolve, reject) => {
    let settled = false;
    const onAbort = () => finish(cancelled());
    signal?.addEventListener('abort', onAbort, { once: true });
    let stderr = '';
    let peakRss = 0;
    const finish = (error: Error | null, result?: UnpackResult) => {
      if (settled) return;
      settled = true;
      signal?.removeEventListener('abort', onAbort);
      clearTimeout(timer);
      clearInterval(watch);
      if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
      // the next spare starts once this unpack is over, so it does not compete with it for CPU
      if (keepSpare) ensureSpare(resolveUnpackLimits().maxHeapMb);
      if (error) reject(error);
      else resolve(result!);
    };
    const timer = setTimeout(() => finish(new UnpackError('psd.timeout',
      `Unpacking took longer than ${Math.round(limits.timeoutMs / 1000)} s and was stopped; the file may be damaged or too complex`)), limits.timeoutMs);
    const watch = setInterval(() => {
      const rss = residentBytes(child);
      peakRss = Math.max(peakRss, rss);
      if (rss > limits.maxMemoryBytes) {
        finish(new UnpackError('psd.out_of_memory',
          `Unpacking needed more than ${Math.round(limits.maxMemoryBytes / 1048576)} MB of memory and was stopped; try a smaller or flatter file`));
      }
    }, MEMORY_POLL_MS);

    child.stderr?.on('data', (chunk: Buffer) => {
      stderr = (stderr + chunk.toString('utf8')).slice(-STDERR_KEEP);
    });
    child.on('message', (raw: unknown) => {
      // nothing after the answer or a stop: a late motif would be stored for an import that ended
      if (settled) return;
      const parsed = childMessageSchema.safeParse(raw);
      if (!parsed.success) return finish(new UnpackError('unpack.crashed', 'The unpack worker sent a malformed answer'));
      const message = parsed.data;
      if (message.type === 'ready') return;
      if (message.type === 'progress') {
        onProgress?.({ phase: message.phase, percent: message.percent });
      } else if (message.type === 'motif') {
        onMotif?.(message.motif);
      } else if (message.type === 'result') {
        const peakRssBytes = Math.max(peakRss, message.result.resources?.peakRssBytes ?? 0);
        const cpuMs = message.result.resources?.cpuMs;
        finish(null, { ...message.result, resources: { peakRssBytes, wallMs: Math.round(performance.now() - started), ...(cpuMs !== undefined ? { cpuMs } : {}) } });
      } else {
        finish(new UnpackError(isUnpackErrorCode(message.code) ? message.code : 'unpack.crashed', message.message));
      }
    });
    child.on('error', (error) => finish(new UnpackError('unpack.crashed', `The unpack worker could not start (${error.message})`)));
    child.on('exit', (code, signal) => {
      if (settled) return;
      if (stderr.trim()) console.error(`[unpack] child stderr (${signal ?? code}):\n${stderr.slice(-2000)}`);
      const outOfMemory = /heap out of memory|Allocation failed|Cannot allocate memory|Array buffer allocation failed/i.test(stderr);
      finish(outOfMemory
        ? new UnpackError('psd.out_of_memory', 'The file needs more memory to unpack than this server allows')
        : new UnpackError('unpack.crashed', `The unpack worker stopped unexpectedly (${signal ?? `exit code ${code}`})`));
    });
    const request: UnpackRequest = {
      type: 'unpack',
      input: { filePath: input.filePath, outDir: input.outDir, cut: input.cut, originalName: input.originalName, limits },
    };
    try {
      child.send(request);
    } catch {
      finish(new UnpackError('unpack.crashed', 'The unpack worker could not be reached'));
    }
  });
}

function cancelled(): Error {
  return new DOMException('The unpack was stopped before it finished', 'AbortError');
}

// Starting a child (tsx, sharp, ag-psd) takes most of a second. A long-running worker can keep
// one spare child loaded and idle; each child still unpacks exactly one file.
let keepSpare = false;
let spare: { child: ChildProcess; heapMb: number; ready: Promise<void> } | null = null;

// Resolves once the spare child has loaded and warmed up (or at once when switched off).
export function prewarmUnpackWorker(enabled = true): Promise<void> {
  keepSpare = enabled;
  if (enabled) return ensureSpare(resolveUnpackLimits().maxHeapMb);
  if (spare) {
    spare.child.kill('SIGKILL');
    spare = null;
  }
  return Promise.resolve();
}

function takeChild(heapMb: number): ChildProcess {
  let child: ChildProcess;
  if (spare && spare.heapMb === heapMb && spare.child.exitCode === null && spare.child.connected) {
    child = spare.child;
    child.ref();
    refChannel(child, true);
    spare = null;
  } else {
    child = spawnChild(heapMb);
  }
  return child;
}

function ensureSpare(heapMb: number): Promise<void> {
  if (spare && spare.child.exitCode === null && spare.child.connected && spare.heapMb === heapMb) return spare.ready;
  spare?.child.kill('SIGKILL');
  const child = spawnChild(heapMb, ['--warm-up']);
  const ready = new Promise<void>((resolve) => {
    const onMessage = (raw: unknown) => {
      if (childMessageSchema.safeParse(raw).data?.type !== 'ready') return;
      child.off('message', onMessage);
      // once loaded, an idle spare must not keep the parent process alive
      if (spare?.child === child) {
        child.unref();
        refChannel(child, false);
      }
      resolve();
    };
    child.on('message', onMessage);
    child.once('exit', () => resolve());
  });
  child.on('exit', () => {
    if (spare?.child === child) spare = null;
  });
  spare = { child, heapMb, ready };
  return ready;
}

function spawnChild(heapMb: number, args: string[] = []): ChildProcess {
  return fork(ENTRY, args, {
    execArgv: ['--import', TSX_LOADER, `--max-old-space-size=${heapMb}`],
    stdio: ['ignore', 'ignore', 'pipe', 'ipc'],
    env: childEnv(),
    serialization: 'json',
  });
}

function refChannel(child: ChildProcess, on: boolean): void {
  const channel = (child as ChildProcess & { channel?: { ref(): void; unref(): void } }).channel;
  if (on) channel?.ref();
  else channel?.unref();
  const stderr = child.stderr as (NodeJS.ReadableStream & { ref?: () => void; unref?: () => void }) | null;
  if (on) stderr?.ref?.();
  else stderr?.unref?.();
}

function residentBytes(child: ChildProcess): number {
  if (!child.pid) return 0;
  try {
    const status = readFileSync(`/proc/${child.pid}/status`, 'utf8');
    const kb = /VmRSS:\s+(\d+)\s+kB/.exec(status);
    return kb ? Number(kb[1]) * 1024 : 0;
  } catch {
    // no /proc (not Linux) or the child has exited
    return 0;
  }
}

function childEnv(): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = {};
  for (const key of CHILD_ENV_KEYS) if (process.env[key] !== undefined) env[key] = process.env[key];
  return env;
}
