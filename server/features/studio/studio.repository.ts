import { and, asc, eq, gt, isNull, sql } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { invitations, memberships, studios, users } from '../../db/schema/index';
import type { StudioRole } from '../../../shared/auth/permissions';

export function createStudioRepository(db: Database) {
  return {
    async findStudio(studioId: string) {
      const [row] = await db.select().from(studios).where(eq(studios.id, studioId)).limit(1);
      return row ?? null;
    },
    async updateStudio(studioId: string, patch: Partial<{ name: string; paletteLimit: number; readyWeeksBeforeLaunch: number }>) {
      const [row] = await db.update(studios).set(patch).where(eq(studios.id, studioId)).returning();
      return row ?? null;
    },
    async listMembers(studioId: string) {
      return db
        .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role, joinedAt: memberships.createdAt })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(eq(memberships.studioId, studioId))
        .orderBy(asc(memberships.createdAt));
    },
    async findMembership(studioId: string, userId: string) {
      const [row] = await db
        .select()
        .from(memberships)
        .where(and(eq(memberships.studioId, studioId), eq(memberships.userId, userId)))
        .limit(1);
      return row ?? null;
    },
    async findMemberByEmail(studioId: string, email: string) {
      const [row] = await db
        .select({ userId: users.id })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.studioId, studioId), eq(users.email, email)))
        .limit(1);
      return row ?? null;
    },
    async countOwners(studioId: string) {
      const [row] = await db
        .select({ n: sql<number>`count(*)::int` })
        .from(memberships)
        .where(and(eq(memberships.studioId, studioId), eq(memberships.role, 'owner')));
      return row?.n ?? 0;
    },
    async setRole(studioId: string, userId: string, role: StudioRole) {
      await db.update(memberships).set({ role }).where(and(eq(memberships.studioId, studioId), eq(memberships.userId, userId)));
    },
    async removeMember(studioId: string, userId: string) {
      await db.delete(memberships).where(and(eq(memberships.studioId, studioId), eq(memberships.userId, userId)));
    },
    async pendingInvitations(studioId: string) {
      return db
        .select({
          id: invitations.id,
          email: invitations.email,
          role: invitations.role,
          invitedBy: users.name,
          createdAt: invitations.createdAt,
          expiresAt: invitations.expiresAt,
        })
        .from(invitations)
        .innerJoin(users, eq(users.id, invitations.invitedBy))
        .where(
          and(
            eq(invitations.studioId, studioId),
            isNull(invitations.acceptedAt),
            isNull(invitations.revokedAt),
            gt(invitations.expiresAt, new Date()),
          ),
        )
        .orderBy(asc(invitations.createdAt));
    },
  };
}

export type StudioRepository = ReturnType<typeof createStudioRepository>;
