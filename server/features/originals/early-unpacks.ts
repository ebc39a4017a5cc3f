import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { RunUnpack } from './import-original';
import type { OriginalRow } from './originals.repository';
import type { UnpackCut, UnpackedMotif, UnpackProgress, UnpackResult } from './unpack/unpack-result';

// When the import worker runs in the process that received the upload, the upload's file is
// already on local disk: it is unpacked (into a private folder, nothing stored, nothing in the
// database) while the same file goes up to storage, instead of being downloaded back by the job
// and unpacked only then. The job claims the result by the original's id, and only when its row
// names the bytes that were stored: the sha256 and size the upload measured while storing them,
// the same cut and studio. Everything an import makes visible still happens in the job, after
// the claim; an early unpack nobody claims (the job went to another process, the upload failed,
// the process stops) is thrown away, and the job then unpacks the stored file as before.

export type EarlyUnpackInput = { originalId: string; studioId: string; filePath: string; cut: UnpackCut; originalName?: string };

// The uploading side's hold on an early unpack.
export type EarlyUnpack = {
  // The upload's bytes are stored unchanged (its row is about to be written): the job may claim it.
  stored(fileSha256: string, byteSize: number): void;
  // The upload failed: stop and throw away.
  cancel(): Promise<void>;
};

// The job's hold on an early unpack it claimed.
export type ClaimedEarlyUnpack = {
  // where the motifs' files are written
  outDir: string;
  // Hears the motifs announced so far at once, then the rest as they come; the unpack's result.
  follow(onProgress: (p: UnpackProgress) => void, onMotif: (m: UnpackedMotif) => void): Promise<UnpackResult>;
  // Stops the unpack if it still runs and removes its files.
  dispose(): Promise<void>;
};

type Options = {
  runUnpack: RunUnpack;
  tmpRoot?: string;
  // early unpacks running at once (each is a child process); more uploads wait for their job
  maxRunning: number;
  // an early unpack whose job has not claimed it by then is thrown away
  unclaimedMs?: number;
};

type Entry = EarlyUnpackInput & {
  workDir: string;
  outDir: string;
  fileSha256: string | null;
  byteSize: number | null;
  motifs: UnpackedMotif[];
  lastProgress: UnpackProgress | null;
  onProgress: ((p: UnpackProgress) => void) | null;
  onMotif: ((m: UnpackedMotif) => void) | null;
  result: Promise<UnpackResult>;
  abort: AbortController;
  expiry: NodeJS.Timeout | null;
  disposed: Promise<void> | null;
  // the upload's file, removed once the unpack and the upload to storage are both done with it
  fileGone: Promise<void> | null;
};

const DEFAULT_UNCLAIMED_MS = 10 * 60_000;

export function createEarlyUnpacks({ runUnpack, tmpRoot, maxRunning, unclaimedMs = DEFAULT_UNCLAIMED_MS }: Options) {
  const claimable = new Map<string, Entry>();
  const live = new Set<Entry>();
  let running = 0;

  function dispose(entry: Entry): Promise<void> {
    entry.disposed ??= (async () => {
      if (claimable.get(entry.originalId) === entry) claimable.delete(entry.originalId);
      if (entry.expiry) clearTimeout(entry.expiry);
      entry.abort.abort();
      await entry.result.catch(() => undefined);
      await Promise.all([rm(entry.workDir, { recursive: true, force: true }), entry.fileGone]);
      live.delete(entry);
    })();
    return entry.disposed;
  }

  // A claim is honoured only for the very bytes the row says were stored.
  function matches(entry: Entry, original: OriginalRow): boolean {
    return entry.fileSha256 === original.fileSha256 && entry.byteSize === original.byteSize
      && entry.cut === original.cut && entry.studioId === original.studioId;
  }

  return {
    // Starts unpacking an upload's local file, or null when enough early unpacks run already.
    // The file then belongs to the early unpack, which removes it once both the unpack and the
    // upload to storage are done with it.
    async begin(input: EarlyUnpackInput): Promise<EarlyUnpack | null> {
      if (running >= maxRunning) return null;
      running++;
      let workDir: string;
      try {
        workDir = await mkdtemp(path.join(tmpRoot ?? os.tmpdir(), 'motifold-early-'));
      } catch {
        running--;
        return null;
      }
      const entry: Entry = {
        ...input, workDir, outDir: path.join(workDir, 'out'), fileSha256: null, byteSize: null, motifs: [], lastProgress: null,
        onProgress: null, onMotif: null, result: Promise.resolve(null as unknown as UnpackResult), abort: new AbortController(),
        expiry: null, disposed: null, fileGone: null,
      };
      let holders = 2;
      const release = () => {
        if (--holders === 0) entry.fileGone = rm(input.filePath, { force: true }).catch(() => undefined);
      };
      entry.result = runUnpack(
        { filePath: input.filePath, outDir: entry.outDir, cut: input.cut, originalName: input.originalName },
        (p) => {
          entry.lastProgress = p;
          entry.onProgress?.(p);
        },
        (m) => {
          entry.motifs.push(m);
          entry.onMotif?.(m);
        },
        entry.abort.signal,
      ).finally(() => {
        running--;
        release();
      });
      // seen by the job that claims it, or by nobody when the upload fails
      entry.result.catch(() => undefined);
      live.add(entry);
      let uploadDone = false;
      return {
        stored(fileSha256, byteSize) {
          if (uploadDone || entry.disposed) return;
          uploadDone = true;
          release();
          entry.fileSha256 = fileSha256;
          entry.byteSize = byteSize;
          claimable.set(entry.originalId, entry);
          entry.expiry = setTimeout(() => void dispose(entry), unclaimedMs);
          entry.expiry.unref();
        },
        async cancel() {
          if (!uploadDone) {
            uploadDone = true;
            release();
          }
          await dispose(entry);
        },
      };
    },

    // The job's claim on the early unpack of this original; null when there is none (or it is
    // not of these stored bytes), and the job unpacks the stored file itself.
    take(original: OriginalRow): ClaimedEarlyUnpack | null {
      const entry = claimable.get(original.id);
      if (!entry) return null;
      claimable.delete(original.id);
      if (entry.expiry) clearTimeout(entry.expiry);
      if (!matches(entry, original)) {
        void dispose(entry);
        return null;
      }
      return {
        outDir: entry.outDir,
        follow(onProgress, onMotif) {
          entry.onProgress = onProgress;
          entry.onMotif = onMotif;
          if (entry.lastProgress) onProgress(entry.lastProgress);
          for (const m of entry.motifs) onMotif(m);
          return entry.result;
        },
        dispose: () => dispose(entry),
      };
    },

    // early unpacks not yet done with (running, or waiting for their job)
    get pending(): number {
      return live.size;
    },

    async close(): Promise<void> {
      await Promise.all([...live].map(dispose));
    },
  };
}

export type EarlyUnpacks = ReturnType<typeof createEarlyUnpacks>;
