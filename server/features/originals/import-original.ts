import { and, eq, inArray, ne } from 'drizzle-orm';
import { commitImport } from './commit-import';
import { createWriteStream } from 'node:fs';
import { mkdir, mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import type { Database } from '../../db/client';
import { motifs, motifVersions, originals, type ImportPhase, type ImportReport } from '../../db/schema/index';
import type { ObjectStorage } from '../../lib/storage';
import { matchIncomingMotifs, type KnownMotif } from './motif-matching';
import { createMotifUploads, type MotifUploads } from './motif-uploads';
import type { ClaimedEarlyUnpack, EarlyUnpacks } from './early-unpacks';
import { createOriginalsCleanup } from './originals-cleanup';
import type { OriginalRow, OriginalsRepository } from './originals.repository';
import type { UnpackedMotif, UnpackProgress, UnpackResult } from './unpack/unpack-result';
import { isUnpackError } from './unpack/unpack-error';

export type RunUnpack = (
  input: { filePath: string; outDir: string; cut: 'groups' | 'layers'; originalName?: string },
  onProgress?: (p: UnpackProgress) => void,
  // each motif whose files are written, before the result
  onMotif?: (m: UnpackedMotif) => void,
  // stops the unpack (an AbortError, not an UnpackError)
  signal?: AbortSignal,
) => Promise<UnpackResult>;

// claim: the row claimed and a temp dir made; storage: what is left to store after the unpack
// (most motifs go up while later layers decode); storedDuringUnpack: motifs stored by then;
// unpackedEarly: the upload's local file was unpacked while it was being stored (no download,
// and unpackMs is only what was left of that unpack when the job claimed it).
export type ImportPhaseTimings = {
  claimMs: number; downloadMs: number; unpackMs: number; storageMs: number; dbMs: number; unpackedEarly: boolean;
  storedDuringUnpack: number; stored: number; unpack?: UnpackResult['timings']; childPeakRssBytes?: number; childCpuMs?: number;
};

// Motifs stored at once, each as PNG and thumbnail (two requests). Each put waits mostly on the
// storage's latency, not on this process: against the local fake, 40 puts of 300 KB took 35 ms
// each 4 at a time and 10 ms each 8 at a time (measured, machine loaded). The SDK's agent keeps
// up to 50 sockets alive, so 16 requests in flight reuse their connections.
const UPLOAD_CONCURRENCY = 8;

type Deps = {
  db: Database;
  repo: OriginalsRepository;
  storage: ObjectStorage;
  runUnpack: RunUnpack;
  // uploads received by this process, already unpacking (see early-unpacks.ts)
  earlyUnpacks?: Pick<EarlyUnpacks, 'take'>;
  tmpRoot?: string;
  // Benches read where the time went; the product ignores it.
  onTimings?: (timings: ImportPhaseTimings) => void;
};

export type ImportOutcome = 'imported' | 'skipped' | 'failed';

// The unpacker reports its own 0–100 across its phases (reading, cutting while encodes run,
// finishing); that is the first 80 % of the whole import, storing 80–95 %, the commit the rest.
const UNPACK_SHARE = 80;
// A worker that fetches the stored file first shows that as the start of "reading", by bytes.
const DOWNLOAD_SHARE = 10;

function throttled(fn: (phase: UnpackProgress['phase'], percent: number) => void, ms = 250) {
  let last = 0;
  let lastPhase = '';
  return (p: UnpackProgress) => {
    const now = Date.now();
    if (p.phase === lastPhase && now - last < ms) return;
    last = now;
    lastPhase = p.phase;
    fn(p.phase, p.percent);
  };
}

// Progress rows written one at a time in the order given, never waited for by the import: a
// write still in flight holds back only the newest value after it, so the bar never steps back.
function progressWriter(write: (phase: ImportPhase, percent: number) => Promise<unknown>) {
  let busy = false;
  let pending: [ImportPhase, number] | null = null;
  const pump = () => {
    if (busy || !pending) return;
    const [phase, percent] = pending;
    pending = null;
    busy = true;
    void write(phase, percent).catch(() => {}).finally(() => {
      busy = false;
      pump();
    });
  };
  return (phase: ImportPhase, percent: number) => {
    pending = [phase, percent];
    pump();
  };
}

export function createOriginalImporter({ db, repo, storage, runUnpack, earlyUnpacks, tmpRoot, onTimings }: Deps) {
  const cleanup = createOriginalsCleanup(db, storage);
  async function knownMotifsOf(originalId: string): Promise<KnownMotif[]> {
    const rows = await repo.motifsOf(originalId);
    return rows.map((r) => ({ motifId: r.motif.id, name: r.motif.name, sourcePath: r.link.sourcePath, contentHash: r.version.contentHash, version: r.motif.currentVersion }));
  }

  async function studioMotifsByHash(studioId: string, hashes: string[]) {
    const map = new Map<string, KnownMotif>();
    if (hashes.length === 0) return map;
    const rows = await db
      .select({ motifId: motifs.id, name: motifs.name, sourcePath: motifs.sourcePath, contentHash: motifVersions.contentHash, version: motifVersions.version })
      .from(motifVersions)
      .innerJoin(motifs, eq(motifs.id, motifVersions.motifId))
      .where(and(eq(motifVersions.studioId, studioId), inArray(motifVersions.contentHash, hashes)));
    for (const r of rows) if (!map.has(r.contentHash)) map.set(r.contentHash, r);
    return map;
  }

  async function studioHasPixels(studioId: string, contentHash: string): Promise<boolean> {
    const [row] = await db
      .select({ id: motifVersions.id })
      .from(motifVersions)
      .where(and(eq(motifVersions.studioId, studioId), eq(motifVersions.contentHash, contentHash)))
      .limit(1);
    return Boolean(row);
  }

  // Objects this import put that no row refers to (the import failed, or its original went) are
  // removed; not while another import of the studio runs, which may be about to commit the same
  // pixels under the same keys (a retry or a later import stores them again anyway).
  async function discardUnreferenced(original: OriginalRow, uploads: MotifUploads): Promise<void> {
    const keys = await uploads.settledKeys();
    if (keys.length === 0) return;
    const [busy] = await db
      .select({ id: originals.id })
      .from(originals)
      .where(and(eq(originals.studioId, original.studioId), eq(originals.status, 'importing'), ne(originals.id, original.id)))
      .limit(1);
    if (busy) return;
    await storage.remove(await cleanup.unreferencedKeys(keys));
  }

  return async function importOriginal(originalId: string): Promise<ImportOutcome> {
    let mark = performance.now();
    const lap = () => {
      const now = performance.now();
      const ms = now - mark;
      mark = now;
      return ms;
    };
    const original = await repo.claimForImport(originalId);
    if (!original) return 'skipped';
    // Only the first delivery finds it; a retry or a duplicate unpacks the stored file.
    const early = earlyUnpacks?.take(original) ?? null;
    const workDir = early ? null : await mkdtemp(path.join(tmpRoot ?? os.tmpdir(), 'motifold-import-'));
    const outDir = early ? early.outDir : path.join(workDir!, 'out');
    const claimMs = lap();
    const writeProgress = progressWriter((phase, percent) => repo.setProgress(originalId, phase, percent));
    // the unpack's 0–100 fills what the download (when there is one) left of UNPACK_SHARE
    let unpackFrom = 0;
    const progress = throttled((phase, percent) => writeProgress(phase, unpackFrom + ((UNPACK_SHARE - unpackFrom) * Math.min(100, Math.max(0, percent))) / 100));
    const uploads = createMotifUploads({
      storage, studioId: original.studioId, outDir, concurrency: UPLOAD_CONCURRENCY,
      studioHasPixels: (hash) => studioHasPixels(original.studioId, hash),
    });
    try {
      // read while the file unpacks; awaited (and its failure seen) after the unpack
      const previousMotifs = settledLater(original.previousOriginalId ? knownMotifsOf(original.previousOriginalId) : Promise.resolve([]));
      let downloadMs = 0;
      let result: UnpackResult;
      if (early) {
        result = await early.follow(progress, (m) => uploads.early(m));
      } else {
        const filePath = path.join(workDir!, 'original');
        await downloadOriginal(original.storageKey, filePath, outDir, throttled((_, percent) => writeProgress('reading', (DOWNLOAD_SHARE * percent) / 100)));
        downloadMs = lap();
        unpackFrom = DOWNLOAD_SHARE;
        result = await runUnpack({ filePath, outDir, cut: original.cut, originalName: original.name }, progress, (m) => uploads.early(m));
      }
      const unpackMs = lap();
      const storedDuringUnpack = uploads.completed;

      const previous = await previousMotifs();
      const studioByHash = await studioMotifsByHash(original.studioId, result.motifs.map((m) => m.contentHash));
      const { decisions, removed } = matchIncomingMotifs(result.motifs, previous, studioByHash);

      // Identical pixels twice in one file become one motif, linked from both paths.
      const firstNewIndex = new Map<string, number>();
      const toStore: UnpackedMotif[] = [];
      result.motifs.forEach((m, i) => {
        const d = decisions[i];
        if ((d.kind === 'new' && !firstNewIndex.has(m.contentHash)) || d.kind === 'new-version') {
          if (d.kind === 'new') firstNewIndex.set(m.contentHash, i);
          toStore.push(m);
        }
      });
      // progress writes are not waited for (they only apply while the row is importing), so
      // they cost the import no round trip
      writeProgress('storing', 80);
      const pngBytes = await uploads.store(toStore, (n) => {
        if (n % 4 === 0) writeProgress('storing', 80 + (15 * n) / toStore.length);
      });
      // every early upload has ended before the temp files go
      await uploads.settledKeys();
      const storageMs = lap();
      writeProgress('finishing', 95);

      const report: ImportReport = {
        ...result.report,
        linkedExisting: [],
        newVersions: [],
        unchanged: [],
        removed: removed.map((m) => ({ sourcePath: m.sourcePath, motifId: m.motifId, motifName: m.name })),
        created: 0,
      };

      const committed = await commitImport(db, { original, result, decisions, firstNewIndex, pngBytes, report });
      onTimings?.({
        claimMs, downloadMs, unpackMs, storageMs, dbMs: lap(), unpackedEarly: early !== null, storedDuringUnpack, stored: toStore.length,
        unpack: result.timings, childPeakRssBytes: result.resources?.peakRssBytes, childCpuMs: result.resources?.cpuMs,
      });
      if (!committed) await discardUnreferenced(original, uploads).catch(() => {});
      return committed ? 'imported' : 'skipped';
    } catch (err) {
      if (isUnpackError(err)) {
        // A file we cannot read fails the same way every time: no retry, a clear message.
        await repo.setStatus(originalId, 'failed', { phase: 'done', error: err.toValue() });
        await discardUnreferenced(original, uploads).catch(() => {});
        return 'failed';
      }
      // Storage or database trouble: back to the queue; the job is retried from the stored file.
      // What this attempt stored goes first, so a retry cannot be storing the same keys meanwhile.
      await discardUnreferenced(original, uploads).catch(() => {});
      await repo
        .setStatus(originalId, 'queued', { phase: 'queued', percent: 0, error: { code: 'import.retrying', message: `The import was interrupted (${(err as Error).message}); it will be retried.` } })
        .catch(() => {});
      throw err;
    } finally {
      await removeWork(early, workDir);
    }
  };

  async function downloadOriginal(key: string, filePath: string, outDir: string, onProgress: (p: UnpackProgress) => void): Promise<void> {
    const [stored] = await Promise.all([storage.get(key), mkdir(outDir)]);
    const total = stored.contentLength;
    let received = 0;
    await pipeline(stored.body, async function* counted(source: AsyncIterable<Buffer>) {
      for await (const chunk of source) {
        received += chunk.length;
        if (total) onProgress({ phase: 'reading', percent: Math.min(100, (100 * received) / total) });
        yield chunk;
      }
    }, createWriteStream(filePath));
  }
}

async function removeWork(early: ClaimedEarlyUnpack | null, workDir: string | null): Promise<void> {
  if (early) await early.dispose();
  if (workDir) await rm(workDir, { recursive: true, force: true });
}

// A promise awaited later: its rejection is seen then, not reported as unhandled meanwhile.
function settledLater<T>(promise: Promise<T>): () => Promise<T> {
  promise.catch(() => {});
  return () => promise;
}

export type OriginalImporter = ReturnType<typeof createOriginalImporter>;
