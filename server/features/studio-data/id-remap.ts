import { randomUUID } from 'node:crypto';

const uuidInText = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/gi;

/**
 * New ids for old ones. The new ids are handed out in the old ids' sort order, so anything
 * ordered by id (ties between records made in one transaction) keeps its order after an import.
 */
export function createIdMap(oldIds: Iterable<string>): Map<string, string> {
  const olds = [...new Set([...oldIds].map((id) => id.toLowerCase()))].sort();
  const news = olds.map(() => randomUUID()).sort();
  return new Map(olds.map((old, i) => [old, news[i]]));
}

/** Every id of the map inside a string (a storage key, a link) replaced by its new id. */
export function remapText(text: string, map: ReadonlyMap<string, string>): string {
  return text.replace(uuidInText, (found) => map.get(found.toLowerCase()) ?? found);
}

/** A JSON value with every id of the map replaced, at any depth (a layout's motif ids, a report's). */
export function remapJson(value: unknown, map: ReadonlyMap<string, string>): unknown {
  if (typeof value === 'string') return remapText(value, map);
  if (Array.isArray(value)) return value.map((v) => remapJson(v, map));
  if (value && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value as Record<string, unknown>).map(([k, v]) => [remapText(k, map), remapJson(v, map)]));
  }
  return value;
}
