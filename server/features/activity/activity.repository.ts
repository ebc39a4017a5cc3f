import { and, desc, eq, sql, type SQL } from 'drizzle-orm';
import type { ActivityKind } from '../../../shared/contracts/activity';
import type { Database } from '../../db/client';
import { activityEvents, users } from '../../db/schema/index';

// A position in the feed: strictly older than this time (microseconds since 1970), then by id.
export type FeedCursor = { micros: string; id: string | null };

export function createActivityRepository(db: Database) {
  return {
    // Newest first. Microseconds (not the Date's milliseconds) keep events of one transaction apart.
    async page(studioId: string, filter: { actorId?: string; kind?: ActivityKind; before?: FeedCursor; limit: number }) {
      const where: SQL[] = [eq(activityEvents.studioId, studioId)];
      if (filter.actorId) where.push(eq(activityEvents.actorId, filter.actorId));
      if (filter.kind) where.push(eq(activityEvents.kind, filter.kind));
      if (filter.before) {
        const at = sql`('epoch'::timestamptz + ${filter.before.micros}::bigint * interval '1 microsecond')`;
        where.push(filter.before.id ? sql`(${activityEvents.createdAt}, ${activityEvents.id}) < (${at}, ${filter.before.id}::uuid)` : sql`${activityEvents.createdAt} < ${at}`);
      }
      return db
        .select({
          event: activityEvents,
          actorName: users.name,
          micros: sql<string>`(extract(epoch from ${activityEvents.createdAt}) * 1000000)::bigint::text`,
        })
        .from(activityEvents)
        .leftJoin(users, eq(users.id, activityEvents.actorId))
        .where(and(...where))
        .orderBy(desc(activityEvents.createdAt), desc(activityEvents.id))
        .limit(filter.limit);
    },
  };
}

export type ActivityRepository = ReturnType<typeof createActivityRepository>;
