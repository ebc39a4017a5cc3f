import { hexToRgb } from '../../../shared/colour/srgb';
import { rgbToLab } from '../../../shared/colour/lab';
import { rightsStatuses, type ColourMatch, type MotifFacets, type MotifFilter, type MotifListQuery, type MotifSort } from '../../../shared/contracts/motifs';
import { bestColourMatch } from '../../../shared/library/colour-match';
import type { LibraryRecord } from './library-records';
import type { StudioLibrary } from './studio-library';

export type MotifHit = { record: LibraryRecord; score: number | null; colourMatch: ColourMatch | null; colourRank: number | null };

const FACET_LIMIT = 100;

function passesFilters(r: LibraryRecord, f: MotifFilter): boolean {
  const m = r.motif;
  if (f.tags?.length && !f.tags.every((t) => m.tags.includes(t))) return false;
  if (f.collectionId && !r.collectionIds.includes(f.collectionId)) return false;
  if (f.originalId && !r.originalIds.includes(f.originalId)) return false;
  if (f.rights?.length && !f.rights.includes(m.rightsStatus)) return false;
  if (f.usage === 'used' && r.usageCount === 0) return false;
  if (f.usage === 'unused' && r.usageCount > 0) return false;
  if (f.hiddenInOriginal !== undefined && m.hiddenInOriginal !== f.hiddenInOriginal) return false;
  return true;
}

// Words, then the cheap filters, then colour (the costly one) over what is left. Also counts the
// archived motifs that match everything else, so the "archived" filter can say how many it hides.
export function matchMotifs(library: StudioLibrary, f: MotifFilter): { hits: MotifHit[]; archivedMatching: number } {
  const textScores = f.q ? library.text.search(f.q) : null;
  const target = f.colour ? rgbToLab(hexToRgb(f.colour)) : null;
  const hits: MotifHit[] = [];
  let archivedMatching = 0;
  const consider = (r: LibraryRecord, score: number | null) => {
    if (!passesFilters(r, f)) return;
    let colourMatch: ColourMatch | null = null;
    let colourRank: number | null = null;
    if (target) {
      const match = bestColourMatch(target, r.palette, f.maxDistance);
      if (!match) return;
      colourMatch = { hex: match.hex, share: match.share, deltaE: Math.round(match.deltaE * 100) / 100 };
      colourRank = match.rank;
    }
    if (r.motif.archived) archivedMatching++;
    if (f.archived === 'exclude' && r.motif.archived) return;
    if (f.archived === 'only' && !r.motif.archived) return;
    hits.push({ record: r, score, colourMatch, colourRank });
  };
  if (textScores) {
    for (const [id, score] of textScores) {
      const r = library.records.get(id);
      if (r) consider(r, Math.round(score * 1000) / 1000);
    }
  } else {
    for (const r of library.records.values()) consider(r, null);
  }
  return { hits, archivedMatching };
}

const newest = (a: MotifHit, b: MotifHit) => b.record.createdMs - a.record.createdMs || (a.record.motif.id < b.record.motif.id ? -1 : 1);
const byName = (a: MotifHit, b: MotifHit) => (a.record.nameKey < b.record.nameKey ? -1 : a.record.nameKey > b.record.nameKey ? 1 : newest(a, b));

// "best": with words and a colour, relevance scaled by colour closeness; otherwise whichever was asked.
function bestValue(hit: MotifHit, maxDistance: number): number {
  const colourCloseness = hit.colourRank === null ? 1 : 1 - hit.colourRank / (2 * Math.max(maxDistance, 1e-6));
  return (hit.score ?? 1) * colourCloseness;
}

export function sortHits(hits: MotifHit[], sort: MotifSort, maxDistance: number): MotifHit[] {
  if (sort === 'newest') return hits.sort(newest);
  if (sort === 'name') return hits.sort(byName);
  if (sort === 'most_used') return hits.sort((a, b) => b.record.usageCount - a.record.usageCount || byName(a, b));
  const ranked = hits.some((h) => h.score !== null || h.colourRank !== null);
  if (!ranked) return hits.sort(newest);
  const value = new Map(hits.map((h) => [h, bestValue(h, maxDistance)]));
  return hits.sort((a, b) => value.get(b)! - value.get(a)! || newest(a, b));
}

function topCounts<K>(counts: Map<K, number>, limit = FACET_LIMIT): [K, number][] {
  return [...counts].sort((a, b) => b[1] - a[1] || String(a[0]).localeCompare(String(b[0]))).slice(0, limit);
}

// Counts within the results, for the filter controls.
export function facetsOf(library: StudioLibrary, hits: readonly MotifHit[], archivedMatching: number): MotifFacets {
  const tags = new Map<string, number>();
  const collections = new Map<string, number>();
  const originals = new Map<string, number>();
  const originalNames = new Map<string, string>();
  const rights = Object.fromEntries(rightsStatuses.map((s) => [s, 0])) as MotifFacets['rights'];
  let used = 0;
  let hidden = 0;
  for (const { record: r } of hits) {
    for (const t of r.motif.tags) tags.set(t, (tags.get(t) ?? 0) + 1);
    for (const c of r.collectionIds) collections.set(c, (collections.get(c) ?? 0) + 1);
    originals.set(r.motif.originalId, (originals.get(r.motif.originalId) ?? 0) + 1);
    originalNames.set(r.motif.originalId, r.originalName);
    rights[r.motif.rightsStatus]++;
    if (r.usageCount > 0) used++;
    if (r.motif.hiddenInOriginal) hidden++;
  }
  return {
    tags: topCounts(tags).map(([tag, count]) => ({ tag, count })),
    rights,
    collections: topCounts(collections).map(([id, count]) => ({ id, name: library.collectionNames.get(id) ?? '', count })),
    originals: topCounts(originals).map(([id, count]) => ({ id, name: originalNames.get(id) ?? '', count })),
    used,
    unused: hits.length - used,
    hiddenInOriginal: hidden,
    archived: archivedMatching,
  };
}

export function queryLibrary(library: StudioLibrary, query: MotifListQuery) {
  const { hits, archivedMatching } = matchMotifs(library, query);
  const facets = facetsOf(library, hits, archivedMatching);
  sortHits(hits, query.sort, query.maxDistance);
  const page = hits.slice(query.offset, query.offset + query.limit);
  const end = query.offset + page.length;
  return { page, total: hits.length, nextOffset: end < hits.length ? end : null, facets };
}
