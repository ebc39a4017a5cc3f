import { z } from 'zod';
import { calendarDaySchema } from './collections';
import { productStageSchema } from './products';

export const readyFlagSchema = z.enum(['late', 'at_risk', 'on_track', 'ready', 'retired', 'no_launch_date']);

// A span of calendar days, both ends included; at most about three years, so a page stays small.
export const calendarQuerySchema = z
  .object({ from: calendarDaySchema.optional(), to: calendarDaySchema.optional() })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'The end comes before the start', path: ['to'] })
  .refine((q) => !q.from || !q.to || Date.parse(q.to) - Date.parse(q.from) <= 1100 * 86_400_000, {
    message: 'Ask for at most three years at a time',
    path: ['to'],
  });
export type CalendarQuery = z.infer<typeof calendarQuerySchema>;

export const calendarProductSchema = z.object({
  id: z.string(),
  name: z.string(),
  stage: productStageSchema,
  templateId: z.string(),
  flag: readyFlagSchema,
  // negative once the ready-by date has passed; null without a launch date
  daysUntilReadyBy: z.number().nullable(),
});
export type CalendarProduct = z.infer<typeof calendarProductSchema>;

export const calendarCollectionSchema = z.object({
  id: z.string(),
  name: z.string(),
  seasonStart: z.string().nullable(),
  seasonEnd: z.string().nullable(),
  launchDate: z.string().nullable(),
  readyBy: z.string().nullable(),
  lateCount: z.number(),
  atRiskCount: z.number(),
  // in stage order (idea first), then by name
  products: z.array(calendarProductSchema),
});
export type CalendarCollection = z.infer<typeof calendarCollectionSchema>;

export const calendarResponseSchema = z.object({
  today: z.string(),
  from: z.string(),
  to: z.string(),
  readyWeeksBeforeLaunch: z.number(),
  atRiskDays: z.number(),
  // collections whose season, launch or ready-by date falls in the span, earliest first
  collections: z.array(calendarCollectionSchema),
  // collections with no dates at all, so the page can say they are missing
  undated: z.array(z.object({ id: z.string(), name: z.string(), productCount: z.number() })),
});
export type CalendarResponse = z.infer<typeof calendarResponseSchema>;

export const calendarFlagSchema = calendarProductSchema.extend({
  flag: z.enum(['late', 'at_risk']),
  collectionId: z.string(),
  collectionName: z.string(),
  launchDate: z.string(),
  readyBy: z.string(),
});
export type CalendarFlag = z.infer<typeof calendarFlagSchema>;

export const calendarFlagsResponseSchema = z.object({
  today: z.string(),
  readyWeeksBeforeLaunch: z.number(),
  // late first (longest overdue first), then at risk (soonest first)
  flags: z.array(calendarFlagSchema),
});
export type CalendarFlagsResponse = z.infer<typeof calendarFlagsResponseSchema>;
