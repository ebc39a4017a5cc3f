import { and, desc, eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { motifs, motifVersions } from '../../db/schema/index';

export function createMotifsRepository(db: Database) {
  return {
    async findWithVersion(studioId: string, id: string, version?: number) {
      const [row] = await db
        .select({ motif: motifs, version: motifVersions })
        .from(motifs)
        .innerJoin(motifVersions, eq(motifVersions.motifId, motifs.id))
        .where(and(eq(motifs.id, id), eq(motifs.studioId, studioId), version ? eq(motifVersions.version, version) : eq(motifVersions.version, motifs.currentVersion)))
        .limit(1);
      return row ?? null;
    },
    async listCurrent(studioId: string, includeArchived = false) {
      return db
        .select({ motif: motifs, version: motifVersions })
        .from(motifs)
        .innerJoin(motifVersions, and(eq(motifVersions.motifId, motifs.id), eq(motifVersions.version, motifs.currentVersion)))
        .where(includeArchived ? eq(motifs.studioId, studioId) : and(eq(motifs.studioId, studioId), eq(motifs.archived, false)))
        .orderBy(desc(motifs.createdAt));
    },
  };
}

export type MotifsRepository = ReturnType<typeof createMotifsRepository>;
