import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { motifs, motifVersions, originalMotifs, originals, type ImportPhase, type OriginalStatus } from '../../db/schema/index';

export type OriginalRow = typeof originals.$inferSelect;
export type NewOriginal = typeof originals.$inferInsert;

export function createOriginalsRepository(db: Database) {
  return {
    async insert(values: NewOriginal) {
      const [row] = await db.insert(originals).values(values).returning();
      return row;
    },
    async find(studioId: string, id: string) {
      const [row] = await db.select().from(originals).where(and(eq(originals.id, id), eq(originals.studioId, studioId))).limit(1);
      return row ?? null;
    },
    async findById(id: string) {
      const [row] = await db.select().from(originals).where(eq(originals.id, id)).limit(1);
      return row ?? null;
    },
    async list(studioId: string) {
      const counts = db
        .select({ originalId: originalMotifs.originalId, n: sql<number>`count(*)::int`.as('n') })
        .from(originalMotifs)
        .groupBy(originalMotifs.originalId)
        .as('counts');
      return db
        .select({ original: originals, motifCount: sql<number>`coalesce(${counts.n}, 0)::int` })
        .from(originals)
        .leftJoin(counts, eq(counts.originalId, originals.id))
        .where(eq(originals.studioId, studioId))
        .orderBy(desc(originals.createdAt));
    },
    async countMotifs(originalId: string) {
      const [row] = await db.select({ n: sql<number>`count(*)::int` }).from(originalMotifs).where(eq(originalMotifs.originalId, originalId));
      return row?.n ?? 0;
    },
    // Only while importing: a late progress write must never overwrite the committed 'done'.
    async setProgress(id: string, phase: ImportPhase, percent: number) {
      await db.update(originals).set({ phase, percent: Math.round(percent) }).where(and(eq(originals.id, id), eq(originals.status, 'importing')));
    },
    async setStatus(id: string, status: OriginalStatus, extra: Partial<NewOriginal> = {}) {
      await db.update(originals).set({ status, ...extra }).where(eq(originals.id, id));
    },
    // Claims a queued (or retried) original for import; null when another worker has it or it is done.
    async claimForImport(id: string) {
      const [row] = await db
        .update(originals)
        .set({ status: 'importing', phase: 'reading', percent: 0, attempts: sql`${originals.attempts} + 1`, error: null })
        .where(and(eq(originals.id, id), inArray(originals.status, ['queued', 'importing'])))
        .returning();
      return row ?? null;
    },
    // The motifs an original yielded, with the version it yielded.
    async motifsOf(originalId: string) {
      return db
        .select({ link: originalMotifs, motif: motifs, version: motifVersions })
        .from(originalMotifs)
        .innerJoin(motifs, eq(motifs.id, originalMotifs.motifId))
        .innerJoin(motifVersions, and(eq(motifVersions.motifId, originalMotifs.motifId), eq(motifVersions.version, originalMotifs.version)))
        .where(eq(originalMotifs.originalId, originalId))
        .orderBy(originalMotifs.position);
    },
    async delete(id: string) {
      await db.delete(originals).where(eq(originals.id, id));
    },
  };
}

export type OriginalsRepository = ReturnType<typeof createOriginalsRepository>;
