import { param, sql } from 'drizzle-orm';
import type { TagCount } from '../../../shared/contracts/collections';
import type { Database } from '../../db/client';
import { recordLibraryChange } from '../motifs/library-changes';

export function createTagsRepository(db: Database) {
  return {
    async list(studioId: string): Promise<TagCount[]> {
      const result = await db.execute<TagCount>(sql`
        select t as tag, (count(*) filter (where not archived))::int as count, (count(*) filter (where archived))::int as "archivedCount"
        from motifs, unnest(tags) as t
        where studio_id = ${studioId}::uuid
        group by t
        order by count(*) filter (where not archived) desc, t`);
      return result.rows;
    },

    // Renaming is merging one tag into another: every motif carrying any of `from` carries
    // `into` instead, once, where the first of them stood. One statement for the whole studio.
    async merge(studioId: string, from: readonly string[], into: string): Promise<number> {
      return db.transaction(async (tx) => {
        const fromTags = sql`${param(from)}::text[]`;
        const result = await tx.execute<{ id: string }>(sql`
          update motifs m
          set tags = (
            select coalesce(array_agg(t order by n), '{}'::text[]) from (
              select t, min(n) as n
              from unnest(m.tags) with ordinality as u(tag, n), lateral (select case when tag = any(${fromTags}) then ${into}::text else tag end as t) as r
              group by t
            ) as d
          ),
          updated_at = now()
          where m.studio_id = ${studioId}::uuid and m.tags && ${fromTags}
          returning m.id`);
        const ids = result.rows.map((r) => r.id);
        if (ids.length) await recordLibraryChange(tx, studioId, ids);
        return ids.length;
      });
    },
  };
}

export type TagsRepository = ReturnType<typeof createTagsRepository>;
