import { and, asc, eq, gt, lt, sql } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { libraryChanges, libraryState } from '../../db/schema/index';

// Any drizzle handle: the pool's or a transaction's.
type Queryable = Pick<Database, 'select' | 'insert' | 'delete' | 'execute'>;

// How web processes keep their in-memory search index of a studio fresh without rebuilding it
// per request, with any number of processes:
// - every transaction that changes what the library shows (motifs, their versions, tags,
//   rights, collections, later products' usage) ends with `recordLibraryChange`, which bumps
//   the studio's counter in `library_state` and writes which motifs changed;
// - the counter row is locked by that bump until commit, so bumps of one studio commit in
//   version order: a reader that sees version N has every change up to N committed and visible
//   (a sequence or max(updated_at) would not promise that: a transaction that started earlier
//   can commit later, and deletes leave no row to see);
// - it is the transaction's last statement, so it holds the lock for a moment and never waits
//   for another lock while holding it: writers of one studio queue briefly, and cannot deadlock;
// - each search first reads the counter (one primary-key lookup); when it moved, the process
//   re-reads just the listed motifs, or everything when a change says null or the journal no
//   longer reaches back to its version.
export async function recordLibraryChange(tx: Queryable, studioId: string, motifIds: readonly string[] | null): Promise<number> {
  const [row] = await tx
    .insert(libraryState)
    .values({ studioId, version: 1 })
    .onConflictDoUpdate({ target: libraryState.studioId, set: { version: sql`${libraryState.version} + 1` } })
    .returning({ version: libraryState.version });
  // Past this many motifs a full re-read is cheaper than the list.
  const ids = motifIds && motifIds.length <= MAX_LISTED ? [...new Set(motifIds)] : null;
  await tx.insert(libraryChanges).values({ studioId, version: row.version, motifIds: ids });
  // The journal only needs to reach back as far as a process can lag; older entries go.
  if (row.version % 50 === 0) {
    await tx.delete(libraryChanges).where(and(eq(libraryChanges.studioId, studioId), lt(libraryChanges.version, row.version - KEEP_VERSIONS)));
  }
  return row.version;
}

const MAX_LISTED = 2000;
const KEEP_VERSIONS = 500;

export async function currentLibraryVersion(db: Queryable, studioId: string): Promise<number> {
  const [row] = await db.select({ version: libraryState.version }).from(libraryState).where(eq(libraryState.studioId, studioId));
  return row?.version ?? 0;
}

export type ChangesSince = { kind: 'motifs'; motifIds: string[] } | { kind: 'everything' };

// The motifs changed after `since` up to `upTo`, or "everything" when that cannot be told.
export async function changesSince(db: Queryable, studioId: string, since: number, upTo: number): Promise<ChangesSince> {
  const rows = await db
    .select({ version: libraryChanges.version, motifIds: libraryChanges.motifIds })
    .from(libraryChanges)
    .where(and(eq(libraryChanges.studioId, studioId), gt(libraryChanges.version, since), sql`${libraryChanges.version} <= ${upTo}`))
    .orderBy(asc(libraryChanges.version));
  if (rows.length !== upTo - since) return { kind: 'everything' };
  const ids = new Set<string>();
  for (const row of rows) {
    if (!row.motifIds) return { kind: 'everything' };
    for (const id of row.motifIds) ids.add(id);
  }
  if (ids.size > MAX_LISTED) return { kind: 'everything' };
  return { kind: 'motifs', motifIds: [...ids] };
}
