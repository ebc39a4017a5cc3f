import { z } from 'zod';
import { libraryMotifSchema, tagSchema } from './motifs';

// A calendar day, "2026-03-01".
const dayPattern = /^\d{4}-\d{2}-\d{2}$/;
export const calendarDaySchema = z
  .string()
  .regex(dayPattern, 'Write dates as YYYY-MM-DD')
  .refine((d) => !Number.isNaN(Date.parse(`${d}T00:00:00Z`)) && new Date(`${d}T00:00:00Z`).toISOString().startsWith(d), 'This is not a calendar date');

const collectionFields = z.object({
  name: z.string().trim().min(1, 'A collection needs a name').max(120),
  notes: z.string().max(5000),
  seasonStart: calendarDaySchema.nullable(),
  seasonEnd: calendarDaySchema.nullable(),
  launchDate: calendarDaySchema.nullable(),
});

const seasonInOrder = (v: { seasonStart?: string | null; seasonEnd?: string | null }) =>
  !v.seasonStart || !v.seasonEnd || v.seasonStart <= v.seasonEnd;
const seasonMessage = { message: 'The season ends before it starts', path: ['seasonEnd'] };

export const createCollectionRequestSchema = collectionFields
  .partial({ notes: true, seasonStart: true, seasonEnd: true, launchDate: true })
  .refine(seasonInOrder, seasonMessage);
export type CreateCollectionRequest = z.infer<typeof createCollectionRequestSchema>;

export const updateCollectionRequestSchema = collectionFields
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Send at least one field to change')
  .refine(seasonInOrder, seasonMessage);
export type UpdateCollectionRequest = z.infer<typeof updateCollectionRequestSchema>;

export const collectionSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  notes: z.string(),
  seasonStart: z.string().nullable(),
  seasonEnd: z.string().nullable(),
  launchDate: z.string().nullable(),
  motifCount: z.number(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type CollectionSummary = z.infer<typeof collectionSummarySchema>;

export const collectionsListSchema = z.object({ collections: z.array(collectionSummarySchema) });

// The first motifs as a preview; the full grid is `GET /api/motifs?collectionId=…`.
export const collectionDetailSchema = collectionSummarySchema.extend({ preview: z.array(libraryMotifSchema) });
export type CollectionDetail = z.infer<typeof collectionDetailSchema>;

export const collectionMembersRequestSchema = z.object({ ids: z.array(z.string().uuid()).min(1).max(10_000) });
export const collectionMembersResponseSchema = z.object({ matched: z.number(), changed: z.number(), motifCount: z.number() });

export const tagCountSchema = z.object({
  tag: z.string(),
  // Motifs in the library view carrying it, and archived ones.
  count: z.number(),
  archivedCount: z.number(),
});
export const tagsResponseSchema = z.object({ tags: z.array(tagCountSchema) });
export type TagCount = z.infer<typeof tagCountSchema>;

export const renameTagRequestSchema = z.object({ from: tagSchema, to: tagSchema });
export const mergeTagsRequestSchema = z.object({ from: z.array(tagSchema).min(1).max(100), into: tagSchema });
export const tagChangeResponseSchema = z.object({ changed: z.number(), tags: z.array(tagCountSchema) });
