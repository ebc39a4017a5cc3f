import { readFile } from 'node:fs/promises';
import path from 'node:path';
import type { ObjectStorage } from '../../lib/storage';
import { motifPngKey, motifThumbKey } from './motif-keys';
import type { UnpackedMotif } from './unpack/unpack-result';

type Options = {
  storage: ObjectStorage;
  studioId: string;
  outDir: string;
  // motifs stored at once; each holds its PNG and thumbnail in memory while it goes up
  concurrency: number;
  // true when the studio already has these pixels, so their objects are stored already
  studioHasPixels: (contentHash: string) => Promise<boolean>;
};

// Stores motif masters and thumbnails under their content-hash keys while the unpack goes on:
// `early` takes each motif the unpack announces (skipping pixels the studio already has),
// `store` then makes sure a given list is stored and answers each PNG's size by content hash.
// Nothing here is visible to users: rows refer to the objects only when the import commits.
export function createMotifUploads({ storage, studioId, outDir, concurrency, studioHasPixels }: Options) {
  // content hash -> the PNG's size in bytes, or -1 when skipped because the studio has the pixels
  const uploads = new Map<string, Promise<number>>();
  // content hashes whose objects this import has (begun to) put
  const written = new Set<string>();
  const waiting: (() => void)[] = [];
  let running = 0;
  let completed = 0;
  let firstError: unknown = null;

  async function slot<T>(task: () => Promise<T>): Promise<T> {
    // a finished task hands its place straight to the next waiting one
    if (running >= concurrency) await new Promise<void>((resolve) => waiting.push(resolve));
    else running++;
    try {
      return await task();
    } finally {
      const next = waiting.shift();
      if (next) next();
      else running--;
    }
  }

  async function put(m: UnpackedMotif): Promise<number> {
    // after one failure the import fails anyway: put nothing more
    if (firstError) throw firstError;
    written.add(m.contentHash);
    const [png, thumb] = await Promise.all([readFile(fileIn(outDir, m.pngFile)), readFile(fileIn(outDir, m.thumbFile))]);
    // both puts end before this upload counts as settled: were one to fail while the other is in
    // flight, a clean-up after the failure could run before the other lands and leave it behind
    const ends = await Promise.allSettled([
      storage.put(motifPngKey(studioId, m.contentHash), png, 'image/png'),
      storage.put(motifThumbKey(studioId, m.contentHash), thumb, 'image/webp'),
    ]);
    const failed = ends.find((e) => e.status === 'rejected');
    if (failed) throw failed.reason;
    completed++;
    return png.byteLength;
  }

  function start(m: UnpackedMotif, task: () => Promise<number>): Promise<number> {
    const upload = slot(task);
    upload.catch((error: unknown) => (firstError ??= error));
    uploads.set(m.contentHash, upload);
    return upload;
  }

  return {
    // An announced motif: stored now unless the studio has its pixels (then the import links to
    // them, or a later `store` call overwrites the same key with the same pixels).
    early(m: UnpackedMotif): void {
      if (uploads.has(m.contentHash) || firstError) return;
      start(m, async () => ((await studioHasPixels(m.contentHash)) ? -1 : put(m)));
    },

    // Stores what is not stored yet; throws the first storage error of any upload.
    async store(toStore: UnpackedMotif[], onStored?: (done: number) => void): Promise<Map<string, number>> {
      const sizes = new Map<string, number>();
      let done = 0;
      await Promise.all(toStore.map(async (m) => {
        const early = uploads.get(m.contentHash);
        let bytes = early ? await early : -1;
        // skipped early because the studio had the pixels: stored again, as before the overlap
        if (bytes < 0) bytes = await start(m, () => put(m));
        sizes.set(m.contentHash, bytes);
        onStored?.(++done);
      }));
      if (firstError) throw firstError;
      return sizes;
    },

    // motifs stored so far
    get completed(): number {
      return completed;
    },

    // Every key this import may have written, once no upload is in flight any more.
    async settledKeys(): Promise<string[]> {
      await Promise.allSettled([...uploads.values()]);
      return [...written].flatMap((hash) => [motifPngKey(studioId, hash), motifThumbKey(studioId, hash)]);
    },
  };
}

// File names come from the unpack child, which handles hostile files: only plain names in outDir.
function fileIn(outDir: string, name: string): string {
  if (path.basename(name) !== name || name.startsWith('.')) throw new Error(`unexpected motif file name from the unpack: ${JSON.stringify(name)}`);
  return path.join(outDir, name);
}

export type MotifUploads = ReturnType<typeof createMotifUploads>;
