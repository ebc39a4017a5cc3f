import { and, eq, isNull } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { invitations, memberships, studios, users } from '../../db/schema/index';
import type { StudioRole } from '../../../shared/auth/permissions';

export function createInvitationsRepository(db: Database) {
  return {
    async create(input: { studioId: string; email: string; role: StudioRole; tokenHash: string; invitedBy: string; expiresAt: Date }) {
      return db.transaction(async (tx) => {
        // A fresh invitation replaces an open one to the same address.
        await tx
          .update(invitations)
          .set({ revokedAt: new Date() })
          .where(and(eq(invitations.studioId, input.studioId), eq(invitations.email, input.email), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)));
        const [row] = await tx.insert(invitations).values(input).returning();
        return row;
      });
    },
    async findByTokenHash(tokenHash: string) {
      const [row] = await db
        .select({
          invitation: invitations,
          studioName: studios.name,
          invitedBy: users.name,
        })
        .from(invitations)
        .innerJoin(studios, eq(studios.id, invitations.studioId))
        .innerJoin(users, eq(users.id, invitations.invitedBy))
        .where(eq(invitations.tokenHash, tokenHash))
        .limit(1);
      return row ?? null;
    },
    async revoke(studioId: string, id: string) {
      const rows = await db
        .update(invitations)
        .set({ revokedAt: new Date() })
        .where(and(eq(invitations.id, id), eq(invitations.studioId, studioId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
        .returning({ id: invitations.id });
      return rows.length > 0;
    },
    // Joins the studio and closes the invitation together; false if it was taken meanwhile.
    async accept(invitationId: string, studioId: string, userId: string, role: StudioRole, newUser?: { name: string; email: string; passwordHash: string }) {
      return db.transaction(async (tx) => {
        const closed = await tx
          .update(invitations)
          .set({ acceptedAt: new Date() })
          .where(and(eq(invitations.id, invitationId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
          .returning({ id: invitations.id });
        if (closed.length === 0) return null;
        let id = userId;
        if (newUser) {
          const [created] = await tx.insert(users).values(newUser).returning({ id: users.id });
          id = created.id;
        }
        await tx.insert(memberships).values({ studioId, userId: id, role }).onConflictDoNothing();
        return id;
      });
    },
  };
}

export type InvitationsRepository = ReturnType<typeof createInvitationsRepository>;
