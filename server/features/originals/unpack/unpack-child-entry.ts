import { isUnpackError } from './unpack-error';
import type { ChildMessage, UnpackRequest } from './unpack-messages';
import { unpackOriginal } from './unpack-original';
import { warmUpUnpacker } from './unpack-warm-up';
import type { UnpackedMotif, UnpackProgress } from './unpack-result';

// Entry of the unpack child process (forked by runUnpack): one request, one answer, exit.
const PROGRESS_INTERVAL_MS = 200;

function send(message: ChildMessage): Promise<void> {
  return new Promise((resolve) => {
    if (!process.send) return resolve();
    process.send(message, undefined, {}, () => resolve());
  });
}

async function handle(raw: unknown): Promise<void> {
  const started = performance.now();
  const cpuBefore = process.cpuUsage();
  const request = asRequest(raw);
  if (!request) {
    await send({ type: 'error', code: 'unpack.crashed', message: 'The unpack worker received a malformed request' });
    return;
  }
  let lastSent = 0;
  const onProgress = (progress: UnpackProgress) => {
    const now = performance.now();
    if (now - lastSent < PROGRESS_INTERVAL_MS && progress.percent < 99) return;
    lastSent = now;
    void send({ type: 'progress', ...progress });
  };
  try {
    // each finished motif goes to the parent at once, so it can store it during the next decode
    const onMotif = (motif: UnpackedMotif) => void send({ type: 'motif', motif });
    const result = await unpackOriginal(request.input, onProgress, onMotif);
    const cpu = process.cpuUsage(cpuBefore);
    result.resources = {
      peakRssBytes: process.resourceUsage().maxRSS * 1024,
      wallMs: Math.round(performance.now() - started),
      cpuMs: Math.round((cpu.user + cpu.system) / 1000),
    };
    await send({ type: 'result', result });
  } catch (error) {
    if (isUnpackError(error)) {
      await send({ type: 'error', code: error.code, message: error.message });
    } else {
      const detail = error instanceof Error ? error.message.replace(/[^\x20-\x7e]/g, '?').slice(0, 160) : 'unknown error';
      const outOfMemory = error instanceof RangeError && /allocation|array buffer|memory/i.test(detail);
      await send(outOfMemory
        ? { type: 'error', code: 'psd.out_of_memory', message: 'The file needs more memory to unpack than this server allows' }
        : { type: 'error', code: 'unpack.crashed', message: `The file could not be unpacked (${detail})` });
    }
  }
}

// The request comes from our own parent; a structural check is enough (zod stays out of the
// child to keep its start-up short).
function asRequest(raw: unknown): UnpackRequest | null {
  const request = raw as UnpackRequest | null;
  const input = request?.input;
  if (request?.type !== 'unpack' || typeof input !== 'object' || input === null) return null;
  if (typeof input.filePath !== 'string' || typeof input.outDir !== 'string') return null;
  if (input.cut !== 'groups' && input.cut !== 'layers') return null;
  return request;
}

// a spare child whose parent went away has nothing left to do
process.on('disconnect', () => process.exit(0));

// a spare child warms up first, then says it is ready; requests that arrive meanwhile wait
if (process.argv.includes('--warm-up')) {
  try {
    await warmUpUnpacker();
  } catch {
    // a failed warm-up only costs speed
  }
}
process.once('message', (raw: unknown) => {
  handle(raw).finally(() => process.exit(0));
});
void send({ type: 'ready' });
