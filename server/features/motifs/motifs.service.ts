import { and, eq } from 'drizzle-orm';
import type {
  BulkMotifsRequest,
  BulkMotifsResponse,
  LibraryMotif,
  LooksLikeResponse,
  MotifDetail,
  MotifFilter,
  MotifListQuery,
  MotifListResponse,
  MotifVersion,
  UpdateMotifRequest,
} from '../../../shared/contracts/motifs';
import { LOOKS_LIKE_MAX_BITS } from '../../../shared/library/near-duplicates';
import { printSizesOf } from '../../../shared/library/print-size';
import type { Database } from '../../db/client';
import { collections } from '../../db/schema/index';
import { conflict, notFound } from '../../lib/http-error';
import type { ObjectStorage } from '../../lib/storage';
import { toMotifSummary } from '../originals/motif-dto';
import { createOriginalsCleanup } from '../originals/originals-cleanup';
import { runBulkAction } from './bulk-edit';
import type { LibraryCache } from './library-cache';
import { colourMatchOf, matchMotifs, queryLibrary, type MotifHit } from './library-query';
import type { LibraryRecord } from './library-records';
import { motifUsage } from './motif-usage';
import type { MotifsRepository } from './motifs.repository';

type Deps = { db: Database; repo: MotifsRepository; cache: LibraryCache; storage: ObjectStorage };

// Records are replaced whenever their motif changes, so the summary can be kept on them.
const summaries = new WeakMap<LibraryRecord, Omit<LibraryMotif, 'score' | 'colourMatch'>>();

export function toLibraryMotif(r: LibraryRecord, hit?: MotifHit): LibraryMotif {
  let summary = summaries.get(r);
  if (!summary) {
    summary = { ...toMotifSummary(r.motif, r.version), originalName: r.originalName, collectionIds: r.collectionIds, usageCount: r.usageCount };
    summaries.set(r, summary);
  }
  return {
    ...summary,
    score: hit?.score == null ? null : Math.round(hit.score * 1000) / 1000,
    colourMatch: hit ? colourMatchOf(hit) : null,
  };
}

type VersionWithOriginal = Awaited<ReturnType<MotifsRepository['versionsOf']>>[number];

function toVersions(rows: VersionWithOriginal[], current: number): MotifVersion[] {
  const firstWithHash = new Map<string, number>();
  for (const { version: v } of [...rows].sort((a, b) => a.version.version - b.version.version)) {
    if (!firstWithHash.has(v.contentHash)) firstWithHash.set(v.contentHash, v.version);
  }
  return rows.map(({ version: v, originalName }) => {
    const first = firstWithHash.get(v.contentHash)!;
    return {
      version: v.version,
      current: v.version === current,
      width: v.width,
      height: v.height,
      pngBytes: v.pngBytes,
      colours: v.colours,
      originalId: v.originalId,
      originalName,
      samePixelsAs: first < v.version ? first : null,
      imageUrl: `/api/motifs/${v.motifId}/image?version=${v.version}`,
      thumbUrl: `/api/motifs/${v.motifId}/image?size=thumb&version=${v.version}`,
      createdAt: v.createdAt.toISOString(),
    };
  });
}

export function createMotifsService({ db, repo, cache, storage }: Deps) {
  const cleanup = createOriginalsCleanup(db, storage);

  async function detail(studioId: string, id: string): Promise<MotifDetail> {
    const row = await repo.findWithVersion(studioId, id);
    if (!row) throw notFound('That motif');
    const { motif, version } = row;
    const [versions, original, memberOf, usage] = await Promise.all([
      repo.versionsOf(id),
      repo.originalOf(id, motif.originalId),
      repo.collectionsOf(id),
      motifUsage(db, studioId, id),
    ]);
    return {
      ...toMotifSummary(motif, version),
      originalName: original?.name ?? '',
      collectionIds: memberOf.map((c) => c.id),
      usageCount: usage.length,
      notes: motif.notes,
      rights: { status: motif.rightsStatus, source: motif.rightsSource, licence: motif.rightsLicence, attributionRequired: motif.attributionRequired },
      collections: memberOf,
      versions: toVersions(versions, motif.currentVersion),
      original: {
        id: motif.originalId,
        name: original?.name ?? '',
        width: original?.width ?? null,
        height: original?.height ?? null,
        position: original?.position ?? null,
        sourcePath: original?.sourcePath ?? motif.sourcePath,
        offsetX: version.offsetX,
        offsetY: version.offsetY,
      },
      printSizes: printSizesOf(version.width, version.height),
      usage,
    };
  }

  async function selectedIds(studioId: string, request: BulkMotifsRequest): Promise<string[]> {
    if (request.ids) return request.ids;
    // "Select all" of a filter means what the library shows for it, found the same way.
    const library = await cache.get(studioId);
    return matchMotifs(library, request.filter as MotifFilter).hits.map((h) => h.record.motif.id);
  }

  return {
    detail,

    async list(studioId: string, query: MotifListQuery): Promise<MotifListResponse> {
      const library = await cache.get(studioId);
      const result = queryLibrary(library, query);
      return {
        motifs: result.page.map((hit) => toLibraryMotif(hit.record, hit)),
        total: result.total,
        offset: query.offset,
        limit: query.limit,
        nextOffset: result.nextOffset,
        facets: result.facets,
      };
    },

    async looksLike(studioId: string, id: string): Promise<LooksLikeResponse> {
      const library = await cache.get(studioId);
      if (!library.records.has(id)) throw notFound('That motif');
      return {
        maxDistance: LOOKS_LIKE_MAX_BITS,
        motifs: library.looksLike(id).map(({ record, distance }) => ({ ...toLibraryMotif(record), distance })),
      };
    },

    async versions(studioId: string, id: string) {
      const row = await repo.findWithVersion(studioId, id);
      if (!row) throw notFound('That motif');
      return { versions: toVersions(await repo.versionsOf(id), row.motif.currentVersion) };
    },

    async update(studioId: string, id: string, changes: UpdateMotifRequest) {
      if (!(await repo.update(studioId, id, changes))) throw notFound('That motif');
      return detail(studioId, id);
    },

    async restore(studioId: string, id: string, version: number) {
      const result = await repo.restoreVersion(studioId, id, version);
      if (result.kind === 'not-found') throw notFound('That motif version');
      if (result.kind === 'already-current') throw conflict('motif.version_current', `Version ${version} is already the current version.`);
      return detail(studioId, id);
    },

    // Deleting is for mistakes; archive is the everyday "delete". A used motif stays.
    async remove(studioId: string, id: string) {
      const row = await repo.findWithVersion(studioId, id);
      if (!row) throw notFound('That motif');
      const usage = await motifUsage(db, studioId, id);
      if (usage.length) {
        throw conflict('motif.in_use', `This motif is used in ${usage.length} placement${usage.length === 1 ? '' : 's'}; archive it instead, or remove it from those products first.`);
      }
      const keys = await repo.delete(studioId, id);
      if (!keys) throw notFound('That motif');
      // Pixels are stored once per studio by content: only objects no other version uses go.
      await storage.remove(await cleanup.unreferencedKeys(keys));
    },

    async bulk(studioId: string, request: BulkMotifsRequest): Promise<BulkMotifsResponse> {
      const action = request.action;
      if (action.type === 'add-to-collection' || action.type === 'remove-from-collection') {
        const [own] = await db.select({ id: collections.id }).from(collections).where(and(eq(collections.id, action.collectionId), eq(collections.studioId, studioId)));
        if (!own) throw notFound('That collection');
      }
      const ids = await selectedIds(studioId, request);
      if (ids.length === 0) return { matched: 0, changed: 0 };
      const outcome = await db.transaction((tx) => runBulkAction(tx, studioId, ids, action));
      return { matched: outcome.matched, changed: outcome.changed };
    },
  };
}

export type MotifsService = ReturnType<typeof createMotifsService>;
