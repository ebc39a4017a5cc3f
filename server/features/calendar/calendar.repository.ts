import { and, asc, eq, isNotNull } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { collections, products, studios } from '../../db/schema/index';

export function createCalendarRepository(db: Database) {
  return {
    async readyWeeks(studioId: string): Promise<number | null> {
      const [row] = await db.select({ weeks: studios.readyWeeksBeforeLaunch }).from(studios).where(eq(studios.id, studioId)).limit(1);
      return row?.weeks ?? null;
    },
    async collections(studioId: string) {
      return db
        .select({ id: collections.id, name: collections.name, seasonStart: collections.seasonStart, seasonEnd: collections.seasonEnd, launchDate: collections.launchDate })
        .from(collections)
        .where(eq(collections.studioId, studioId))
        .orderBy(asc(collections.name));
    },
    async productsInCollections(studioId: string) {
      return db
        .select({ id: products.id, name: products.name, stage: products.stage, templateId: products.templateId, collectionId: products.collectionId })
        .from(products)
        .where(and(eq(products.studioId, studioId), isNotNull(products.collectionId)))
        .orderBy(asc(products.name));
    },
  };
}

export type CalendarRepository = ReturnType<typeof createCalendarRepository>;
