import { hexToRgb } from '../../../shared/colour/srgb';
import { rgbToLab } from '../../../shared/colour/lab';
import { bestColourMatch, type ColourMatchResult } from '../../../shared/library/colour-match';
import { nearDuplicates } from '../../../shared/library/near-duplicates';
import type { LibraryRecord } from './library-records';
import { TextIndex } from './text-index';

// One studio's library in a web process's memory: every motif's current state, the word index
// over it, and the library version (library_state) it reflects.
export class StudioLibrary {
  readonly records = new Map<string, LibraryRecord>();
  readonly text = new TextIndex();
  collectionNames = new Map<string, string>();
  // Derived views, dropped whenever a motif changes.
  private orders: Partial<Record<'newest' | 'name', LibraryRecord[]>> = {};
  private colourResults = new Map<string, Map<string, ColourMatchResult>>();
  private answers = new Map<string, unknown>();

  constructor(
    readonly studioId: string,
    public version: number,
  ) {}

  // Replaces the given motifs with their fresh rows; ids without a row were deleted.
  apply(ids: readonly string[], fresh: readonly LibraryRecord[]) {
    // Even without motifs (a collection renamed), remembered answers carry facet names.
    this.changed();
    const seen = new Set<string>();
    for (const record of fresh) {
      seen.add(record.motif.id);
      this.upsert(record);
    }
    for (const id of ids) {
      if (seen.has(id)) continue;
      this.records.delete(id);
      this.text.remove(id);
      this.changed();
    }
  }

  private changed() {
    this.orders = {};
    this.colourResults.clear();
    this.answers.clear();
  }

  // The last few answers to whole queries, until the next change: scrolling a grid asks the same
  // query again for every page.
  remember<T>(key: string, compute: () => T): T {
    if (this.answers.has(key)) return this.answers.get(key) as T;
    const value = compute();
    if (this.answers.size >= 16) this.answers.delete(this.answers.keys().next().value!);
    this.answers.set(key, value);
    return value;
  }

  upsert(record: LibraryRecord) {
    this.changed();
    const m = record.motif;
    this.records.set(m.id, record);
    this.text.set(m.id, { name: m.name, tags: m.tags, originalName: record.originalName, sourcePath: m.sourcePath, notes: m.notes });
  }

  // Every motif, newest first or by name; kept until the next change, so listing walks a ready order.
  inOrder(order: 'newest' | 'name'): readonly LibraryRecord[] {
    const cached = this.orders[order];
    if (cached) return cached;
    const all = [...this.records.values()];
    const newest = (a: LibraryRecord, b: LibraryRecord) => b.createdMs - a.createdMs || (a.motif.id < b.motif.id ? -1 : 1);
    all.sort(order === 'newest' ? newest : (a, b) => (a.nameKey < b.nameKey ? -1 : a.nameKey > b.nameKey ? 1 : newest(a, b)));
    this.orders[order] = all;
    return all;
  }

  // Each motif's best match for a colour. Paging through or narrowing a colour search asks the
  // same question again, so the last few answers are kept until the library changes.
  colourMatches(hex: string, maxDistance: number): Map<string, ColourMatchResult> {
    const key = `${hex}/${maxDistance}`;
    const cached = this.colourResults.get(key);
    if (cached) return cached;
    const target = rgbToLab(hexToRgb(hex));
    const matches = new Map<string, ColourMatchResult>();
    for (const [id, r] of this.records) {
      const match = bestColourMatch(target, r.palette, maxDistance);
      if (match) matches.set(id, match);
    }
    if (this.colourResults.size >= 8) this.colourResults.delete(this.colourResults.keys().next().value!);
    this.colourResults.set(key, matches);
    return matches;
  }

  looksLike(motifId: string, maxBits?: number) {
    const target = this.records.get(motifId);
    if (!target) return [];
    const candidates = [...this.records.values()].filter((r) => !r.motif.archived).map((r) => ({ id: r.motif.id, dhash: r.version.dhash, record: r }));
    return nearDuplicates({ id: motifId, dhash: target.version.dhash }, candidates, maxBits).map((f) => ({ record: f.motif.record, distance: f.distance }));
  }
}
