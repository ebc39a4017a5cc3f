import { and, count, desc, eq, isNull } from 'drizzle-orm';
import type { NotificationSettings } from '../../../shared/contracts/notifications';
import type { Database } from '../../db/client';
import { memberships, notifications } from '../../db/schema/index';

// Every query is scoped to one member of one studio: people only ever see their own.
export function createNotificationsRepository(db: Database) {
  const mine = (studioId: string, userId: string) => and(eq(notifications.studioId, studioId), eq(notifications.userId, userId));
  return {
    async latest(studioId: string, userId: string, limit: number) {
      return db.select().from(notifications).where(mine(studioId, userId)).orderBy(desc(notifications.createdAt), desc(notifications.id)).limit(limit);
    },
    async unreadCount(studioId: string, userId: string) {
      const [row] = await db.select({ n: count() }).from(notifications).where(and(mine(studioId, userId), isNull(notifications.readAt)));
      return row?.n ?? 0;
    },
    // False when the notification is not this member's (or does not exist).
    async markRead(studioId: string, userId: string, id: string) {
      const [own] = await db.select({ readAt: notifications.readAt }).from(notifications).where(and(mine(studioId, userId), eq(notifications.id, id)));
      if (!own) return false;
      if (!own.readAt) await db.update(notifications).set({ readAt: new Date() }).where(eq(notifications.id, id));
      return true;
    },
    async markAllRead(studioId: string, userId: string) {
      const rows = await db.update(notifications).set({ readAt: new Date() }).where(and(mine(studioId, userId), isNull(notifications.readAt))).returning({ id: notifications.id });
      return rows.length;
    },
    async settings(studioId: string, userId: string): Promise<NotificationSettings | null> {
      const [row] = await db
        .select({ notifyByEmail: memberships.notifyByEmail, notifyInApp: memberships.notifyInApp })
        .from(memberships)
        .where(and(eq(memberships.studioId, studioId), eq(memberships.userId, userId)));
      return row ?? null;
    },
    async updateSettings(studioId: string, userId: string, patch: Partial<NotificationSettings>): Promise<NotificationSettings | null> {
      const [row] = await db
        .update(memberships)
        .set(patch)
        .where(and(eq(memberships.studioId, studioId), eq(memberships.userId, userId)))
        .returning({ notifyByEmail: memberships.notifyByEmail, notifyInApp: memberships.notifyInApp });
      return row ?? null;
    },
  };
}

export type NotificationsRepository = ReturnType<typeof createNotificationsRepository>;
