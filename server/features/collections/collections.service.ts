import type { CollectionDetail, CollectionSummary, CreateCollectionRequest, UpdateCollectionRequest } from '../../../shared/contracts/collections';
import type { Database } from '../../db/client';
import { badRequest, conflict, notFound } from '../../lib/http-error';
import { runBulkAction } from '../motifs/bulk-edit';
import type { LibraryCache } from '../motifs/library-cache';
import { toLibraryMotif } from '../motifs/motifs.service';
import { isNameTaken, type CollectionRow, type CollectionsRepository } from './collections.repository';

type Deps = { db: Database; repo: CollectionsRepository; cache: LibraryCache };

const PREVIEW_SIZE = 12;

export function toCollectionSummary(row: CollectionRow, motifCount: number): CollectionSummary {
  return {
    id: row.id,
    name: row.name,
    notes: row.notes,
    seasonStart: row.seasonStart,
    seasonEnd: row.seasonEnd,
    launchDate: row.launchDate,
    motifCount,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

const nameTaken = (name: string) => conflict('collection.name_taken', `There is already a collection called "${name}".`);

export function createCollectionsService({ db, repo, cache }: Deps) {
  async function detail(studioId: string, id: string): Promise<CollectionDetail> {
    const row = await repo.find(studioId, id);
    if (!row) throw notFound('That collection');
    const [ids, library] = await Promise.all([repo.firstMotifIds(id, PREVIEW_SIZE), cache.get(studioId)]);
    const preview = ids.flatMap((motifId) => {
      const record = library.records.get(motifId);
      return record ? [toLibraryMotif(record)] : [];
    });
    return { ...toCollectionSummary(row.collection, row.motifCount), preview };
  }

  async function changeMembers(studioId: string, id: string, ids: string[], add: boolean) {
    if (!(await repo.find(studioId, id))) throw notFound('That collection');
    const outcome = await db.transaction((tx) => runBulkAction(tx, studioId, ids, { type: add ? 'add-to-collection' : 'remove-from-collection', collectionId: id }));
    return { matched: outcome.matched, changed: outcome.changed, motifCount: await repo.countMotifs(id) };
  }

  return {
    detail,

    async list(studioId: string) {
      return (await repo.list(studioId)).map((r) => toCollectionSummary(r.collection, r.motifCount));
    },

    async create(studioId: string, input: CreateCollectionRequest) {
      try {
        const row = await repo.insert(studioId, input);
        return toCollectionSummary(row, 0);
      } catch (err) {
        if (isNameTaken(err)) throw nameTaken(input.name);
        throw err;
      }
    },

    async update(studioId: string, id: string, input: UpdateCollectionRequest) {
      const existing = await repo.find(studioId, id);
      if (!existing) throw notFound('That collection');
      // A change to one end of the season is checked against the other end as stored.
      const start = input.seasonStart !== undefined ? input.seasonStart : existing.collection.seasonStart;
      const end = input.seasonEnd !== undefined ? input.seasonEnd : existing.collection.seasonEnd;
      if (start && end && start > end) throw badRequest('validation.failed', 'Please check the form: The season ends before it starts', { seasonEnd: 'The season ends before it starts' });
      try {
        const row = await repo.update(studioId, id, input);
        if (!row) throw notFound('That collection');
        return toCollectionSummary(row, existing.motifCount);
      } catch (err) {
        if (isNameTaken(err)) throw nameTaken(input.name ?? '');
        throw err;
      }
    },

    async remove(studioId: string, id: string) {
      if (!(await repo.delete(studioId, id))) throw notFound('That collection');
    },

    addMotifs: (studioId: string, id: string, ids: string[]) => changeMembers(studioId, id, ids, true),
    removeMotifs: (studioId: string, id: string, ids: string[]) => changeMembers(studioId, id, ids, false),
  };
}

export type CollectionsService = ReturnType<typeof createCollectionsService>;
