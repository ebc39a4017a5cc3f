import type { Database } from '../../db/client';
import { changesSince, currentLibraryVersion } from './library-changes';
import { loadCollectionNames, loadLibraryRecords } from './library-records';
import { StudioLibrary } from './studio-library';

type Entry = { library: StudioLibrary | null; refreshing: Promise<void> | null };

export type LibraryCacheStats = { builds: number; incremental: number; studios: number };

// Per-studio libraries of this process, built from Postgres on first use and brought up to the
// studio's library version before every answer (see library-changes.ts for why that is safe
// with several processes). Least recently used studios are dropped past `maxStudios`.
export function createLibraryCache(db: Database, options: { maxStudios?: number } = {}) {
  const maxStudios = options.maxStudios ?? 32;
  const entries = new Map<string, Entry>();
  const stats = { builds: 0, incremental: 0 };

  async function build(studioId: string, version: number): Promise<StudioLibrary> {
    const library = new StudioLibrary(studioId, version);
    const [records, names] = await Promise.all([loadLibraryRecords(db, studioId), loadCollectionNames(db, studioId)]);
    for (const record of records) library.upsert(record);
    library.collectionNames = names;
    stats.builds++;
    return library;
  }

  // The version is read before the rows: rows newer than it are fine, they are re-read later.
  async function refresh(entry: Entry, studioId: string, version: number) {
    const library = entry.library;
    if (!library) {
      entry.library = await build(studioId, version);
      return;
    }
    const changes = await changesSince(db, studioId, library.version, version);
    if (changes.kind === 'everything') {
      entry.library = await build(studioId, version);
      return;
    }
    const [records, names] = await Promise.all([
      changes.motifIds.length ? loadLibraryRecords(db, studioId, changes.motifIds) : Promise.resolve([]),
      loadCollectionNames(db, studioId),
    ]);
    library.apply(changes.motifIds, records);
    library.collectionNames = names;
    library.version = version;
    stats.incremental++;
  }

  function touch(studioId: string, entry: Entry) {
    entries.delete(studioId);
    entries.set(studioId, entry);
    for (const [id, e] of entries) {
      if (entries.size <= maxStudios) break;
      if (!e.refreshing) entries.delete(id);
    }
  }

  const cache = {
    // The studio's library, at least as new as every change committed before this call.
    async get(studioId: string): Promise<StudioLibrary> {
      // the entry is there before the first await, so requests arriving together share one build
      const entry = entries.get(studioId) ?? { library: null, refreshing: null };
      touch(studioId, entry);
      const version = await currentLibraryVersion(db, studioId);
      // Another request may be refreshing to an older version: wait, then look again.
      while (!entry.library || entry.library.version < version) {
        if (!entry.refreshing) {
          const e = entry;
          e.refreshing = refresh(e, studioId, version).finally(() => {
            e.refreshing = null;
          });
        }
        await entry.refreshing;
      }
      return entry.library;
    },
    // Starts building a studio's library that this process does not hold yet, without waiting:
    // a studio's first search after a server start then finds it built or half-way there.
    warm(studioId: string): void {
      if (entries.has(studioId)) return;
      cache.get(studioId).catch(() => entries.delete(studioId));
    },
    stats: (): LibraryCacheStats => ({ ...stats, studios: entries.size }),
    forget(studioId: string) {
      entries.delete(studioId);
    },
  };
  return cache;
}

export type LibraryCache = ReturnType<typeof createLibraryCache>;
