import {
  motifFilterSchema,
  motifSortSchema,
  rightsStatusSchema,
  type MotifFilter,
  type MotifSort,
  type RightsStatusDto,
} from '../contracts/motifs';

// What the library page shows, as it lives in the address bar: only what differs from the
// defaults is written, so a plain /library is the whole library, newest first.
export type LibraryQuery = {
  q: string;
  tags: string[];
  collectionId: string | null;
  originalId: string | null;
  colour: string | null;
  rights: RightsStatusDto[];
  usage: 'any' | 'used' | 'unused';
  hiddenInOriginal: boolean | null;
  archived: 'exclude' | 'include' | 'only';
  sort: MotifSort;
};

export const emptyLibraryQuery: LibraryQuery = {
  q: '',
  tags: [],
  collectionId: null,
  originalId: null,
  colour: null,
  rights: [],
  usage: 'any',
  hiddenInOriginal: null,
  archived: 'exclude',
  sort: 'best',
};

const shape = motifFilterSchema.shape;

// A hand-edited or stale address should narrow nothing rather than break the page: each
// value is checked on its own against the API's schema, and a bad one is dropped.
function parsed<T>(schema: { safeParse(v: unknown): { success: true; data: T } | { success: false } }, value: unknown): T | undefined {
  if (value === undefined || value === null || value === '') return undefined;
  const result = schema.safeParse(value);
  return result.success ? result.data : undefined;
}

const listOf = (params: URLSearchParams, key: string) => params.getAll(key).flatMap((v) => v.split(',')).map((v) => v.trim()).filter(Boolean);

export function readLibraryQuery(params: URLSearchParams): LibraryQuery {
  const tags = listOf(params, 'tags').flatMap((tag) => parsed(shape.tags, [tag]) ?? []);
  const rights = listOf(params, 'rights').filter((r): r is RightsStatusDto => rightsStatusSchema.safeParse(r).success);
  return {
    q: (params.get('q') ?? '').slice(0, 200),
    tags: [...new Set(tags)],
    collectionId: parsed(shape.collectionId, params.get('collection')) ?? null,
    originalId: parsed(shape.originalId, params.get('original')) ?? null,
    colour: parsed(shape.colour, params.get('colour')) ?? null,
    rights: [...new Set(rights)],
    usage: parsed(shape.usage, params.get('usage')) ?? 'any',
    hiddenInOriginal: parsed(shape.hiddenInOriginal, params.get('hidden')) ?? null,
    archived: parsed(shape.archived, params.get('archived')) ?? 'exclude',
    sort: parsed(motifSortSchema, params.get('sort')) ?? 'best',
  };
}

export function writeLibraryQuery(query: LibraryQuery): URLSearchParams {
  const params = new URLSearchParams();
  if (query.q.trim()) params.set('q', query.q);
  for (const tag of query.tags) params.append('tags', tag);
  if (query.collectionId) params.set('collection', query.collectionId);
  if (query.originalId) params.set('original', query.originalId);
  if (query.colour) params.set('colour', query.colour.replace(/^#/, ''));
  for (const status of query.rights) params.append('rights', status);
  if (query.usage !== 'any') params.set('usage', query.usage);
  if (query.hiddenInOriginal !== null) params.set('hidden', String(query.hiddenInOriginal));
  if (query.archived !== 'exclude') params.set('archived', query.archived);
  if (query.sort !== 'best') params.set('sort', query.sort);
  return params;
}

// The same selection as the API's filter object, for "everything this filter shows" in bulk edits.
export function toMotifFilter(query: LibraryQuery): MotifFilter {
  return {
    ...(query.q.trim() ? { q: query.q.trim() } : {}),
    ...(query.tags.length ? { tags: query.tags } : {}),
    ...(query.collectionId ? { collectionId: query.collectionId } : {}),
    ...(query.originalId ? { originalId: query.originalId } : {}),
    ...(query.colour ? { colour: query.colour } : {}),
    ...(query.rights.length ? { rights: query.rights } : {}),
    ...(query.hiddenInOriginal !== null ? { hiddenInOriginal: query.hiddenInOriginal } : {}),
    maxDistance: motifFilterSchema.shape.maxDistance.parse(undefined),
    usage: query.usage,
    archived: query.archived,
  };
}

// A page of the library grid. The grid asks for the pages its visible rows need, so scrolling
// (or dragging the scrollbar) to the middle of 10,000 motifs fetches that page alone.
export const MOTIF_PAGE_SIZE = 120;

// The query string of GET /api/motifs for one page of the grid. The client's fetch and the
// server's preload of the first screen both use it: a preload only helps for the very same URL.
export function motifPageSearch(query: LibraryQuery, pageIndex: number): string {
  return motifListSearch(query, pageIndex * MOTIF_PAGE_SIZE, MOTIF_PAGE_SIZE);
}

// The query string of GET /api/motifs for one page of results.
export function motifListSearch(query: LibraryQuery, offset: number, limit: number): string {
  const params = new URLSearchParams();
  if (query.q.trim()) params.set('q', query.q.trim());
  for (const tag of query.tags) params.append('tags', tag);
  if (query.collectionId) params.set('collectionId', query.collectionId);
  if (query.originalId) params.set('originalId', query.originalId);
  if (query.colour) params.set('colour', query.colour.replace(/^#/, ''));
  for (const status of query.rights) params.append('rights', status);
  if (query.usage !== 'any') params.set('usage', query.usage);
  if (query.hiddenInOriginal !== null) params.set('hiddenInOriginal', String(query.hiddenInOriginal));
  if (query.archived !== 'exclude') params.set('archived', query.archived);
  params.set('sort', query.sort);
  params.set('offset', String(offset));
  params.set('limit', String(limit));
  return params.toString();
}

export const isFiltered = (query: LibraryQuery) =>
  writeLibraryQuery({ ...query, sort: 'best' }).toString() !== '';
