import { nearDuplicates } from '../../../shared/library/near-duplicates';
import type { LibraryRecord } from './library-records';
import { TextIndex } from './text-index';

// One studio's library in a web process's memory: every motif's current state, the word index
// over it, and the library version (library_state) it reflects.
export class StudioLibrary {
  readonly records = new Map<string, LibraryRecord>();
  readonly text = new TextIndex();
  collectionNames = new Map<string, string>();

  constructor(
    readonly studioId: string,
    public version: number,
  ) {}

  // Replaces the given motifs with their fresh rows; ids without a row were deleted.
  apply(ids: readonly string[], fresh: readonly LibraryRecord[]) {
    const seen = new Set<string>();
    for (const record of fresh) {
      seen.add(record.motif.id);
      this.upsert(record);
    }
    for (const id of ids) {
      if (seen.has(id)) continue;
      this.records.delete(id);
      this.text.remove(id);
    }
  }

  upsert(record: LibraryRecord) {
    const m = record.motif;
    this.records.set(m.id, record);
    this.text.set(m.id, { name: m.name, tags: m.tags, originalName: record.originalName, sourcePath: m.sourcePath, notes: m.notes });
  }

  looksLike(motifId: string, maxBits?: number) {
    const target = this.records.get(motifId);
    if (!target) return [];
    const candidates = [...this.records.values()].filter((r) => !r.motif.archived).map((r) => ({ id: r.motif.id, dhash: r.version.dhash, record: r }));
    return nearDuplicates({ id: motifId, dhash: target.version.dhash }, candidates, maxBits).map((f) => ({ record: f.motif.record, distance: f.distance }));
  }
}
