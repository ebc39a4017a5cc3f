import { createHash, randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { open, rm } from 'node:fs/promises';
import { Transform } from 'node:stream';
import type { OriginalDetail, OriginalSummary } from '../../../shared/contracts/originals';
import { conflict, HttpError, notFound } from '../../lib/http-error';
import type { ObjectStorage } from '../../lib/storage';
import type { JobQueue } from '../../jobs/queue';
import { toMotifSummary } from './motif-dto';
import { originalFileKey } from './motif-keys';
import type { OriginalRow, OriginalsRepository } from './originals.repository';
import { SNIFF_BYTES, sniffFileType } from './unpack/sniff-file-type';
import type { EarlyUnpack, EarlyUnpacks } from './early-unpacks';
import type { OriginalsCleanup } from './originals-cleanup';

type Deps = {
  repo: OriginalsRepository;
  storage: ObjectStorage;
  queue: Pick<JobQueue, 'enqueueImport'>;
  cleanup: OriginalsCleanup;
  // set when this process also runs the import worker: uploads start unpacking while they are stored
  earlyUnpacks?: Pick<EarlyUnpacks, 'begin'>;
};

// SVG drawings are sanitised before they are drawn (unpack/sanitise-svg.ts)
const acceptedKinds = new Set(['psd', 'psb', 'png', 'jpeg', 'webp', 'svg'] as const);

// File names come from users' machines: keep them as plain text, without control characters.
export function cleanFileName(name: string): string {
  const cleaned = Array.from(name)
    .filter((ch) => ch.charCodeAt(0) >= 0x20 && ch.charCodeAt(0) !== 0x7f)
    .join('')
    .trim()
    .slice(0, 200);
  return cleaned || 'Untitled original';
}

async function readHead(filePath: string): Promise<Buffer> {
  const handle = await open(filePath, 'r');
  try {
    const buf = Buffer.alloc(SNIFF_BYTES);
    const { bytesRead } = await handle.read(buf, 0, SNIFF_BYTES, 0);
    return buf.subarray(0, bytesRead);
  } finally {
    await handle.close();
  }
}

export function toOriginalSummary(row: OriginalRow, motifCount: number, uploadedBy: string | null = null): OriginalSummary {
  return {
    id: row.id,
    name: row.name,
    fileKind: row.fileKind,
    byteSize: row.byteSize,
    status: row.status,
    phase: row.phase,
    percent: row.percent,
    cut: row.cut,
    width: row.width,
    height: row.height,
    layerCount: row.layerCount,
    motifCount,
    error: row.error ?? null,
    previousOriginalId: row.previousOriginalId,
    uploadedBy,
    createdAt: row.createdAt.toISOString(),
    importedAt: row.importedAt?.toISOString() ?? null,
  };
}

export function createOriginalsService({ repo, storage, queue, cleanup, earlyUnpacks }: Deps) {
  async function detail(studioId: string, id: string): Promise<OriginalDetail> {
    const row = await repo.find(studioId, id);
    if (!row) throw notFound('That original');
    const rows = await repo.motifsOf(id);
    return {
      ...toOriginalSummary(row, rows.length),
      // rows imported before SVG drawings were taken have no leftOut list
      report: row.report ? { ...row.report, leftOut: row.report.leftOut ?? [] } : null,
      // The path inside this file: a motif linked from several files keeps one name but many places.
      motifs: rows.map((r) => ({ ...toMotifSummary(r.motif, r.version), sourcePath: r.link.sourcePath, linkedExisting: r.link.linkedExisting })),
    };
  }

  return {
    detail,

    async list(studioId: string): Promise<OriginalSummary[]> {
      const rows = await repo.list(studioId);
      return rows.map((r) => toOriginalSummary(r.original, r.motifCount));
    },

    // The upload is already on local disk (multer); it goes to storage unchanged before its row
    // is written and queued. An early unpack may read the local file meanwhile; nothing of it
    // is stored or shown until the job claims it (early-unpacks.ts).
    async upload(input: { studioId: string; userId: string; filePath: string; fileName: string; byteSize: number; cut: 'groups' | 'layers'; previousOriginalId?: string }) {
      let early: EarlyUnpack | null = null;
      try {
        const sniffed = sniffFileType(await readHead(input.filePath));
        if (!acceptedKinds.has(sniffed.kind as 'psd')) {
          throw new HttpError(415, 'upload.unsupported_type', `This file is ${sniffed.label}, not a PSD or an image Motifold can read. Upload a layered PSD, a PNG, JPEG or WebP, or an SVG drawing.`);
        }
        let lineageId: string = randomUUID();
        if (input.previousOriginalId) {
          const previous = await repo.find(input.studioId, input.previousOriginalId);
          if (!previous) throw notFound('The original this replaces');
          lineageId = previous.lineageId;
        }
        const id = randomUUID();
        const key = originalFileKey(input.studioId, id);
        early = (await earlyUnpacks?.begin({ originalId: id, studioId: input.studioId, filePath: input.filePath, cut: input.cut, originalName: cleanFileName(input.fileName) })) ?? null;
        const hash = createHash('sha256');
        // Hashed as the bytes go up; a transform only passes data on as the upload reads it, so
        // no chunk flows past before the request is ready for it.
        const source = createReadStream(input.filePath);
        const body = source.pipe(
          new Transform({
            transform(chunk: Buffer, _encoding, done) {
              hash.update(chunk);
              done(null, chunk);
            },
          }),
        );
        source.on('error', (err) => body.destroy(err));
        await storage.put(key, body, 'application/octet-stream', { contentLength: input.byteSize });
        const fileSha256 = hash.digest('hex');
        early?.stored(fileSha256, input.byteSize);
        const row = await repo.insert({
          id,
          studioId: input.studioId,
          name: cleanFileName(input.fileName),
          fileKind: sniffed.kind === 'psb' ? 'psd' : (sniffed.kind as 'psd' | 'png' | 'jpeg' | 'webp' | 'svg'),
          byteSize: input.byteSize,
          fileSha256,
          storageKey: key,
          cut: input.cut,
          previousOriginalId: input.previousOriginalId ?? null,
          lineageId,
          uploadedBy: input.userId,
        });
        await queue.enqueueImport(row.id);
        return { id: row.id, status: row.status };
      } catch (err) {
        await early?.cancel();
        throw err;
      } finally {
        // a file an early unpack reads is removed by it, once it and the upload are done with it
        if (!early) await rm(input.filePath, { force: true });
      }
    },

    async retry(studioId: string, id: string) {
      const row = await repo.find(studioId, id);
      if (!row) throw notFound('That original');
      if (row.status !== 'failed') throw conflict('original.not_failed', 'Only a failed import can be retried.');
      await repo.setStatus(id, 'queued', { phase: 'queued', percent: 0, error: null });
      await queue.enqueueImport(id);
      return detail(studioId, id);
    },

    // A re-cut is a new import of the same stored file, matched against this one like a new version.
    async recut(studioId: string, userId: string, id: string, cut: 'groups' | 'layers') {
      const row = await repo.find(studioId, id);
      if (!row) throw notFound('That original');
      if (row.status !== 'ready') throw conflict('original.not_ready', 'Wait until this original has finished importing before re-cutting it.');
      const next = await repo.insert({
        studioId,
        name: row.name,
        fileKind: row.fileKind,
        byteSize: row.byteSize,
        fileSha256: row.fileSha256,
        storageKey: row.storageKey,
        cut,
        previousOriginalId: row.id,
        lineageId: row.lineageId,
        uploadedBy: userId,
      });
      await queue.enqueueImport(next.id);
      return { id: next.id, status: next.status };
    },

    async remove(studioId: string, id: string) {
      const row = await repo.find(studioId, id);
      if (!row) throw notFound('That original');
      if (row.status === 'importing') throw conflict('original.importing', 'This original is being imported right now; wait for it to finish, then delete it.');
      await cleanup.deleteOriginal(row);
    },
  };
}

export type OriginalsService = ReturnType<typeof createOriginalsService>;
