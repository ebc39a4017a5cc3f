import { productStages } from '../../../shared/contracts/products';
import type { CalendarCollection, CalendarFlag, CalendarFlagsResponse, CalendarProduct, CalendarQuery, CalendarResponse } from '../../../shared/contracts/calendar';
import { monthStart, todayUtc, addDays } from '../../../shared/calendar/calendar-days';
import { AT_RISK_DAYS, readyByDate, readyByVerdict } from '../../../shared/calendar/ready-by';
import { notFound } from '../../lib/http-error';
import type { CalendarRepository } from './calendar.repository';

type CollectionRow = Awaited<ReturnType<CalendarRepository['collections']>>[number];
type ProductRow = Awaited<ReturnType<CalendarRepository['productsInCollections']>>[number];

const stageOrder = (s: ProductRow['stage']) => productStages.indexOf(s);

// Every date the collection carries, to decide whether it shows in a span.
function datesOf(c: CollectionRow, readyBy: string | null): string[] {
  return [c.seasonStart, c.seasonEnd, c.launchDate, readyBy].filter((d): d is string => d !== null);
}

function overlaps(dates: string[], from: string, to: string): boolean {
  if (dates.length === 0) return false;
  const first = dates.reduce((a, b) => (a < b ? a : b));
  const last = dates.reduce((a, b) => (a > b ? a : b));
  return first <= to && last >= from;
}

export function createCalendarService(repo: CalendarRepository, clock: () => Date = () => new Date()) {
  async function load(studioId: string) {
    const weeks = await repo.readyWeeks(studioId);
    if (weeks === null) throw notFound('That studio');
    const [collections, products] = await Promise.all([repo.collections(studioId), repo.productsInCollections(studioId)]);
    const today = todayUtc(clock());
    const byCollection = new Map<string, ProductRow[]>();
    for (const p of products) byCollection.set(p.collectionId!, [...(byCollection.get(p.collectionId!) ?? []), p]);
    const built = collections.map((c) => {
      const readyBy = c.launchDate ? readyByDate(c.launchDate, weeks) : null;
      const rows = (byCollection.get(c.id) ?? []).slice().sort((a, b) => stageOrder(a.stage) - stageOrder(b.stage) || a.name.localeCompare(b.name));
      const items: CalendarProduct[] = rows.map((p) => {
        const v = readyByVerdict({ launchDate: c.launchDate, readyWeeksBeforeLaunch: weeks, today, stage: p.stage });
        return { id: p.id, name: p.name, stage: p.stage, templateId: p.templateId, flag: v.flag, daysUntilReadyBy: v.daysUntilReadyBy };
      });
      const collection: CalendarCollection = {
        ...c,
        readyBy,
        lateCount: items.filter((p) => p.flag === 'late').length,
        atRiskCount: items.filter((p) => p.flag === 'at_risk').length,
        products: items,
      };
      return collection;
    });
    return { weeks, today, collections: built };
  }

  return {
    async calendar(studioId: string, query: CalendarQuery): Promise<CalendarResponse> {
      const { weeks, today, collections } = await load(studioId);
      // Default span: two months back to a year ahead, the range a studio plans in.
      const from = query.from ?? monthStart(today, -2);
      const to = query.to ?? addDays(monthStart(today, 13), -1);
      const shown = collections
        .filter((c) => overlaps(datesOf(c, c.readyBy), from, to))
        .sort((a, b) => (datesOf(a, a.readyBy).sort()[0] ?? '').localeCompare(datesOf(b, b.readyBy).sort()[0] ?? '') || a.name.localeCompare(b.name));
      const undated = collections.filter((c) => datesOf(c, c.readyBy).length === 0).map((c) => ({ id: c.id, name: c.name, productCount: c.products.length }));
      return { today, from, to, readyWeeksBeforeLaunch: weeks, atRiskDays: AT_RISK_DAYS, collections: shown, undated };
    },

    async flags(studioId: string): Promise<CalendarFlagsResponse> {
      const { weeks, today, collections } = await load(studioId);
      const flags: CalendarFlag[] = collections.flatMap((c) =>
        c.products.flatMap((p) =>
          (p.flag === 'late' || p.flag === 'at_risk') && c.launchDate && c.readyBy
            ? [{ ...p, flag: p.flag, collectionId: c.id, collectionName: c.name, launchDate: c.launchDate, readyBy: c.readyBy }]
            : [],
        ),
      );
      flags.sort((a, b) => (a.flag === b.flag ? (a.daysUntilReadyBy ?? 0) - (b.daysUntilReadyBy ?? 0) || a.name.localeCompare(b.name) : a.flag === 'late' ? -1 : 1));
      return { today, readyWeeksBeforeLaunch: weeks, flags };
    },
  };
}

export type CalendarService = ReturnType<typeof createCalendarService>;
