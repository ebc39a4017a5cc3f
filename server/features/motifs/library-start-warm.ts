import { sql } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { sessions } from '../../db/schema/index';
import type { LibraryCache } from './library-cache';

// Studios whose people are still signed in (their sessions outlive a restart in Postgres) come
// back to a just-started server: their search libraries are built at start, newest session
// first, one at a time so the start does not crowd out the first requests. At most `limit`,
// well inside the cache's own size. Never throws: a studio that fails is built on first use.
export async function warmSignedInStudios(db: Database, cache: Pick<LibraryCache, 'get'>, limit = 8): Promise<string[]> {
  let studioIds: string[];
  try {
    const rows = await db.execute<{ studio_id: string }>(sql`
      select sess->>'studioId' as studio_id
      from ${sessions}
      where expire > now() and sess->>'studioId' is not null
      group by 1
      order by max(expire) desc
      limit ${limit}`);
    studioIds = rows.rows.map((r) => r.studio_id);
  } catch {
    return [];
  }
  const warmed: string[] = [];
  for (const studioId of studioIds) {
    try {
      await cache.get(studioId);
      warmed.push(studioId);
    } catch {
      // e.g. a studio deleted since the session was written: nothing to build
    }
  }
  return warmed;
}
