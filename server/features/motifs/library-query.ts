import { rightsStatuses, type ColourMatch, type MotifFacets, type MotifFilter, type MotifListQuery } from '../../../shared/contracts/motifs';
import type { ColourMatchResult } from '../../../shared/library/colour-match';
import type { LibraryRecord } from './library-records';
import type { StudioLibrary } from './studio-library';

// Kept small: a query over 10,000 motifs makes one per match.
export type MotifHit = { record: LibraryRecord; score: number | null; colour: ColourMatchResult | null };

export function colourMatchOf(hit: MotifHit): ColourMatch | null {
  const c = hit.colour;
  return c ? { hex: c.hex, share: c.share, deltaE: Math.round(c.deltaE * 100) / 100 } : null;
}

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

// Walks the motifs in the given order and keeps those matching the words, the filters and the
// colour. Also counts the archived motifs that match everything else, so the "archived" filter
// can say how many it hides.
export function matchMotifs(
  library: StudioLibrary,
  f: MotifFilter,
  order = library.inOrder('newest'),
  textScores = f.q ? library.text.search(f.q) : null,
): { hits: MotifHit[]; archivedMatching: number } {
  const colours = f.colour ? library.colourMatches(f.colour, f.maxDistance) : null;
  const hits: MotifHit[] = [];
  let archivedMatching = 0;
  for (const r of order) {
    let score: number | null = null;
    if (textScores) {
      const found = textScores.get(r.motif.id);
      if (found === undefined) continue;
      score = found;
    }
    if (!passesFilters(r, f)) continue;
    let colour: ColourMatchResult | null = null;
    if (colours) {
      colour = colours.get(r.motif.id) ?? null;
      if (!colour) continue;
    }
    if (r.motif.archived) {
      archivedMatching++;
      if (f.archived === 'exclude') continue;
    } else if (f.archived === 'only') continue;
    hits.push({ record: r, score, colour });
  }
  return { hits, archivedMatching };
}

// "best": with words and a colour, relevance scaled by colour closeness; otherwise whichever was asked.
function bestValue(hit: MotifHit, maxDistance: number): number {
  const colourCloseness = hit.colour === null ? 1 : 1 - hit.colour.rank / (2 * Math.max(maxDistance, 1e-6));
  return (hit.score ?? 1) * colourCloseness;
}

// Hits arrive in the walk's order (newest, or by name for name and most used); sorts are stable,
// so that order breaks ties.
function rank(hits: MotifHit[], query: MotifListQuery, ranked: boolean): MotifHit[] {
  if (query.sort === 'most_used') return hits.sort((a, b) => b.record.usageCount - a.record.usageCount);
  if (!ranked) return hits;
  const values = new Float64Array(hits.length);
  const indexed = hits.map((hit, i) => {
    values[i] = bestValue(hit, query.maxDistance);
    return i;
  });
  indexed.sort((a, b) => values[b] - values[a] || a - b);
  return indexed.map((i) => hits[i]);
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
  const { offset, limit, ...question } = query;
  const { sorted, facets } = library.remember(JSON.stringify(question), () => {
    const textScores = query.q ? library.text.search(query.q) : null;
    const ranked = query.sort === 'best' && (Boolean(query.colour) || textScores !== null);
    const order = library.inOrder(query.sort === 'name' || query.sort === 'most_used' ? 'name' : 'newest');
    const { hits, archivedMatching } = matchMotifs(library, query, order, textScores);
    return { facets: facetsOf(library, hits, archivedMatching), sorted: rank(hits, query, ranked) };
  });
  const page = sorted.slice(offset, offset + limit);
  const end = offset + page.length;
  return { page, total: sorted.length, nextOffset: end < sorted.length ? end : null, facets };
}
