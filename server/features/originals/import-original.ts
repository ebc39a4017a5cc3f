import { and, eq, inArray } from 'drizzle-orm';
import { commitImport } from './commit-import';
import { createWriteStream } from 'node:fs';
import { mkdir, mkdtemp, readFile, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import type { Database } from '../../db/client';
import { motifs, motifVersions, type ImportReport } from '../../db/schema/index';
import type { ObjectStorage } from '../../lib/storage';
import { matchIncomingMotifs, type KnownMotif } from './motif-matching';
import { motifPngKey, motifThumbKey } from './motif-keys';
import type { OriginalsRepository } from './originals.repository';
import type { UnpackedMotif, UnpackProgress, UnpackResult } from './unpack/unpack-result';
import { isUnpackError } from './unpack/unpack-error';

export type RunUnpack = (
  input: { filePath: string; outDir: string; cut: 'groups' | 'layers'; originalName?: string },
  onProgress?: (p: UnpackProgress) => void,
) => Promise<UnpackResult>;

export type ImportPhaseTimings = { downloadMs: number; unpackMs: number; storageMs: number; dbMs: number; unpack?: UnpackResult['timings']; childPeakRssBytes?: number };

type Deps = {
  db: Database;
  repo: OriginalsRepository;
  storage: ObjectStorage;
  runUnpack: RunUnpack;
  tmpRoot?: string;
  // Benches read where the time went; the product ignores it.
  onTimings?: (timings: ImportPhaseTimings) => void;
};

export type ImportOutcome = 'imported' | 'skipped' | 'failed';

// Unpack shares 0–80 %, storing 80–95 %, the commit the rest.
const unpackWeight: Record<UnpackProgress['phase'], [number, number]> = {
  reading: [0, 20],
  cutting: [20, 40],
  encoding: [40, 78],
  finishing: [78, 80],
};

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

async function mapLimit<T>(items: T[], limit: number, fn: (item: T) => Promise<void>) {
  let next = 0;
  const workers = Array.from({ length: Math.min(limit, items.length) }, async () => {
    while (next < items.length) await fn(items[next++]);
  });
  await Promise.all(workers);
}

export function createOriginalImporter({ db, repo, storage, runUnpack, tmpRoot, onTimings }: Deps) {
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

  // Returns each stored PNG's size in bytes, by content hash.
  async function storeMotifFiles(studioId: string, outDir: string, toStore: UnpackedMotif[], onDone: (n: number) => void) {
    let done = 0;
    const sizes = new Map<string, number>();
    await mapLimit(toStore, 4, async (m) => {
      const [png, thumb] = await Promise.all([readFile(path.join(outDir, m.pngFile)), readFile(path.join(outDir, m.thumbFile))]);
      await Promise.all([
        storage.put(motifPngKey(studioId, m.contentHash), png, 'image/png'),
        storage.put(motifThumbKey(studioId, m.contentHash), thumb, 'image/webp'),
      ]);
      sizes.set(m.contentHash, png.byteLength);
      onDone(++done);
    });
    return sizes;
  }

  return async function importOriginal(originalId: string): Promise<ImportOutcome> {
    const original = await repo.claimForImport(originalId);
    if (!original) return 'skipped';
    const workDir = await mkdtemp(path.join(tmpRoot ?? os.tmpdir(), 'motifold-import-'));
    const progress = throttled((phase, percent) => {
      const [from, to] = unpackWeight[phase];
      void repo.setProgress(originalId, phase, from + ((to - from) * percent) / 100).catch(() => {});
    });
    try {
      let mark = performance.now();
      const lap = () => {
        const now = performance.now();
        const ms = now - mark;
        mark = now;
        return ms;
      };
      const filePath = path.join(workDir, 'original');
      const stored = await storage.get(original.storageKey);
      await pipeline(stored.body, createWriteStream(filePath));
      const outDir = path.join(workDir, 'out');
      await mkdir(outDir, { recursive: true });
      const downloadMs = lap();
      const result = await runUnpack({ filePath, outDir, cut: original.cut, originalName: original.name }, progress);
      const unpackMs = lap();

      const previous = original.previousOriginalId ? await knownMotifsOf(original.previousOriginalId) : [];
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
      await repo.setProgress(originalId, 'storing', 80);
      const pngBytes = await storeMotifFiles(original.studioId, outDir, toStore, (n) => {
        if (n % 4 === 0) void repo.setProgress(originalId, 'storing', 80 + (15 * n) / toStore.length).catch(() => {});
      });
      const storageMs = lap();
      await repo.setProgress(originalId, 'finishing', 95);

      const report: ImportReport = {
        ...result.report,
        linkedExisting: [],
        newVersions: [],
        unchanged: [],
        removed: removed.map((m) => ({ sourcePath: m.sourcePath, motifId: m.motifId, motifName: m.name })),
        created: 0,
      };

      const committed = await commitImport(db, { original, result, decisions, firstNewIndex, pngBytes, report });
      onTimings?.({ downloadMs, unpackMs, storageMs, dbMs: lap(), unpack: result.timings, childPeakRssBytes: result.resources?.peakRssBytes });
      return committed ? 'imported' : 'skipped';
    } catch (err) {
      if (isUnpackError(err)) {
        // A file we cannot read fails the same way every time: no retry, a clear message.
        await repo.setStatus(originalId, 'failed', { phase: 'done', error: err.toValue() });
        return 'failed';
      }
      // Storage or database trouble: back to the queue; the job is retried from the stored file.
      await repo
        .setStatus(originalId, 'queued', { phase: 'queued', percent: 0, error: { code: 'import.retrying', message: `The import was interrupted (${(err as Error).message}); it will be retried.` } })
        .catch(() => {});
      throw err;
    } finally {
      await rm(workDir, { recursive: true, force: true });
    }
  };
}

export type OriginalImporter = ReturnType<typeof createOriginalImporter>;
