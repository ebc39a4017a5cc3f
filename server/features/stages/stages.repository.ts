import { and, asc, eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { products, stageMoves, users } from '../../db/schema/index';
import type { ProductStage } from '../../db/schema/products';
import type { SampleVerdict } from '../../db/schema/product-life';
import { recordActivity } from '../activity/record-activity';
import { latestSampleVerdict } from '../products/product-extras';

export type StageMoveRow = typeof stageMoves.$inferSelect & { movedByName: string | null };
type Decide = (from: ProductStage, verdict: SampleVerdict | null) => { override: boolean };

export function createStagesRepository(db: Database) {
  return {
    async productStage(studioId: string, productId: string) {
      const [row] = await db.select({ stage: products.stage }).from(products).where(and(eq(products.studioId, studioId), eq(products.id, productId))).limit(1);
      return row?.stage ?? null;
    },
    // The product row is locked while the gate is checked, so two moves at once cannot both
    // pass a check made against the same old stage. Returns null for a missing product.
    async move(input: { studioId: string; productId: string; to: ProductStage; note: string; userId: string }, decide: Decide) {
      return db.transaction(async (tx) => {
        const [product] = await tx
          .select({ stage: products.stage, name: products.name })
          .from(products)
          .where(and(eq(products.studioId, input.studioId), eq(products.id, input.productId)))
          .for('update');
        if (!product) return null;
        const { override } = decide(product.stage, await latestSampleVerdict(tx, input.studioId, input.productId));
        await tx.update(products).set({ stage: input.to, updatedAt: new Date() }).where(eq(products.id, input.productId));
        const [move] = await tx
          .insert(stageMoves)
          .values({ studioId: input.studioId, productId: input.productId, fromStage: product.stage, toStage: input.to, movedBy: input.userId, note: input.note, override })
          .returning();
        await recordActivity(tx, {
          studioId: input.studioId,
          actorId: input.userId,
          kind: 'product.stage_moved',
          subjectType: 'product',
          subjectId: input.productId,
          summary: `moved “${product.name}” to ${input.to}${override ? ' without an approved sample' : ''}`,
          data: { from: product.stage, to: input.to, override, note: input.note },
        });
        const [mover] = await tx.select({ name: users.name }).from(users).where(eq(users.id, input.userId));
        return { ...move, movedByName: mover?.name ?? null } satisfies StageMoveRow;
      });
    },
    async history(studioId: string, productId: string): Promise<StageMoveRow[]> {
      const rows = await db
        .select({ move: stageMoves, movedByName: users.name })
        .from(stageMoves)
        .leftJoin(users, eq(users.id, stageMoves.movedBy))
        .where(and(eq(stageMoves.studioId, studioId), eq(stageMoves.productId, productId)))
        .orderBy(asc(stageMoves.createdAt), asc(stageMoves.id));
      return rows.map((r) => ({ ...r.move, movedByName: r.movedByName }));
    },
  };
}

export type StagesRepository = ReturnType<typeof createStagesRepository>;
