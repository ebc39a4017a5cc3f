import { aliasedTable, and, asc, desc, eq, inArray } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { products, samplePhotos, samples, users, type SampleVerdict } from '../../db/schema/index';

export type SampleRow = typeof samples.$inferSelect;
export type NewSample = typeof samples.$inferInsert;
export type SamplePhotoRow = typeof samplePhotos.$inferSelect;
export type NewSamplePhoto = typeof samplePhotos.$inferInsert;
export type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];
export type Person = { id: string; name: string } | null;
export type SampleWithPeople = { sample: SampleRow; createdBy: Person; verdictBy: Person };

// The order that decides which sample counts: the latest ordered, then the latest recorded.
const latestFirst = [desc(samples.orderedOn), desc(samples.createdAt), desc(samples.id)] as const;

// For the stage gate: the verdict of the product's latest sample, or null when none was ordered.
export async function latestSampleVerdict(db: Database | Tx, productId: string): Promise<{ sampleId: string; verdict: SampleVerdict } | null> {
  const [row] = await db
    .select({ sampleId: samples.id, verdict: samples.verdict })
    .from(samples)
    .where(eq(samples.productId, productId))
    .orderBy(...latestFirst)
    .limit(1);
  return row ?? null;
}

const creator = aliasedTable(users, 'sample_creator');
const judge = aliasedTable(users, 'sample_judge');

const person = (id: string | null, name: string | null): Person => (id && name !== null ? { id, name } : null);

export function createSamplesRepository(db: Database) {
  const withPeople = (where: ReturnType<typeof and>) =>
    db
      .select({ sample: samples, creatorId: creator.id, creatorName: creator.name, judgeId: judge.id, judgeName: judge.name })
      .from(samples)
      .leftJoin(creator, eq(creator.id, samples.createdBy))
      .leftJoin(judge, eq(judge.id, samples.verdictBy))
      .where(where)
      .orderBy(...latestFirst);

  const toWithPeople = (r: { sample: SampleRow; creatorId: string | null; creatorName: string | null; judgeId: string | null; judgeName: string | null }): SampleWithPeople => ({
    sample: r.sample,
    createdBy: person(r.creatorId, r.creatorName),
    verdictBy: person(r.judgeId, r.judgeName),
  });

  return {
    db,

    async productExists(studioId: string, productId: string): Promise<{ id: string; name: string } | null> {
      const [row] = await db
        .select({ id: products.id, name: products.name })
        .from(products)
        .where(and(eq(products.id, productId), eq(products.studioId, studioId)))
        .limit(1);
      return row ?? null;
    },

    async productName(productId: string): Promise<string> {
      const [row] = await db.select({ name: products.name }).from(products).where(eq(products.id, productId)).limit(1);
      return row?.name ?? 'a product';
    },

    // Newest first, the same order that picks the latest sample.
    async listForProduct(studioId: string, productId: string): Promise<SampleWithPeople[]> {
      const rows = await withPeople(and(eq(samples.studioId, studioId), eq(samples.productId, productId)));
      return rows.map(toWithPeople);
    },

    async findWithPeople(studioId: string, id: string): Promise<SampleWithPeople | null> {
      const [row] = await withPeople(and(eq(samples.studioId, studioId), eq(samples.id, id)));
      return row ? toWithPeople(row) : null;
    },

    async find(studioId: string, id: string): Promise<SampleRow | null> {
      const [row] = await db.select().from(samples).where(and(eq(samples.id, id), eq(samples.studioId, studioId))).limit(1);
      return row ?? null;
    },

    async insert(tx: Tx, values: NewSample): Promise<SampleRow> {
      const [row] = await tx.insert(samples).values(values).returning();
      return row;
    },

    async update(tx: Tx, studioId: string, id: string, values: Partial<NewSample>): Promise<SampleRow | null> {
      const [row] = await tx
        .update(samples)
        .set({ ...values, updatedAt: new Date() })
        .where(and(eq(samples.id, id), eq(samples.studioId, studioId)))
        .returning();
      return row ?? null;
    },

    async remove(studioId: string, id: string): Promise<void> {
      await db.delete(samples).where(and(eq(samples.id, id), eq(samples.studioId, studioId)));
    },

    async photosOf(sampleIds: string[]): Promise<SamplePhotoRow[]> {
      if (sampleIds.length === 0) return [];
      return db.select().from(samplePhotos).where(inArray(samplePhotos.sampleId, sampleIds)).orderBy(asc(samplePhotos.createdAt), asc(samplePhotos.id));
    },

    async insertPhoto(values: NewSamplePhoto): Promise<SamplePhotoRow> {
      const [row] = await db.insert(samplePhotos).values(values).returning();
      return row;
    },

    async findPhoto(studioId: string, id: string): Promise<SamplePhotoRow | null> {
      const [row] = await db.select().from(samplePhotos).where(and(eq(samplePhotos.id, id), eq(samplePhotos.studioId, studioId))).limit(1);
      return row ?? null;
    },

    async removePhoto(studioId: string, id: string): Promise<void> {
      await db.delete(samplePhotos).where(and(eq(samplePhotos.id, id), eq(samplePhotos.studioId, studioId)));
    },
  };
}

export type SamplesRepository = ReturnType<typeof createSamplesRepository>;
