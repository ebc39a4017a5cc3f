import { and, asc, eq, isNull } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { memberships, passwordResets, studios, users } from '../../db/schema/index';
import type { StudioRole } from '../../../shared/auth/permissions';

export function createAuthRepository(db: Database) {
  return {
    async findUserByEmail(email: string) {
      const [row] = await db.select().from(users).where(eq(users.email, email)).limit(1);
      return row ?? null;
    },
    async findUserById(id: string) {
      const [row] = await db.select().from(users).where(eq(users.id, id)).limit(1);
      return row ?? null;
    },
    async studiosOfUser(userId: string) {
      return db
        .select({ id: studios.id, name: studios.name, role: memberships.role })
        .from(memberships)
        .innerJoin(studios, eq(studios.id, memberships.studioId))
        .where(eq(memberships.userId, userId))
        .orderBy(asc(memberships.createdAt));
    },
    async createUserWithStudio(input: { name: string; email: string; passwordHash: string; studioName: string }) {
      return db.transaction(async (tx) => {
        const [user] = await tx.insert(users).values({ name: input.name, email: input.email, passwordHash: input.passwordHash }).returning();
        const [studio] = await tx.insert(studios).values({ name: input.studioName }).returning();
        await tx.insert(memberships).values({ studioId: studio.id, userId: user.id, role: 'owner' satisfies StudioRole });
        return { user, studio };
      });
    },
    async createPasswordReset(userId: string, tokenHash: string, expiresAt: Date) {
      await db.insert(passwordResets).values({ userId, tokenHash, expiresAt });
    },
    async findPasswordReset(tokenHash: string) {
      const [row] = await db.select().from(passwordResets).where(eq(passwordResets.tokenHash, tokenHash)).limit(1);
      return row ?? null;
    },
    // Marks the token used and sets the password in one step; false when it was used meanwhile.
    async consumePasswordReset(resetId: string, userId: string, passwordHash: string): Promise<boolean> {
      return db.transaction(async (tx) => {
        const used = await tx
          .update(passwordResets)
          .set({ usedAt: new Date() })
          .where(and(eq(passwordResets.id, resetId), isNull(passwordResets.usedAt)))
          .returning({ id: passwordResets.id });
        if (used.length === 0) return false;
        await tx.update(users).set({ passwordHash }).where(eq(users.id, userId));
        return true;
      });
    },
  };
}

export type AuthRepository = ReturnType<typeof createAuthRepository>;
