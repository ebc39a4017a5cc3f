import { z } from 'zod';

// What the studio's activity feed can list; the feed filters by these.
export const activityKinds = [
  'original.imported',
  'product.created',
  'product.stage_moved',
  'product.variants_changed',
  'sample.recorded',
  'sample.verdict',
  'review.requested',
  'review.approved',
  'review.changes_requested',
  'comment.added',
  'comment.resolved',
  'sales.imported',
  'studio.data_imported',
] as const;
export const activityKindSchema = z.enum(activityKinds);
export type ActivityKind = z.infer<typeof activityKindSchema>;

export const activitySubjectTypes = ['original', 'product', 'sample', 'thread', 'sales_import', 'studio'] as const;
export type ActivitySubjectType = (typeof activitySubjectTypes)[number];

export const activityEventSchema = z.object({
  id: z.string(),
  kind: activityKindSchema,
  subjectType: z.enum(activitySubjectTypes),
  subjectId: z.string().nullable(),
  summary: z.string(),
  actor: z.object({ id: z.string(), name: z.string() }).nullable(),
  data: z.record(z.string(), z.unknown()),
  createdAt: z.string(),
});
export type ActivityEvent = z.infer<typeof activityEventSchema>;

// A page cursor: the last event's time in microseconds since 1970 and its id, or an ISO date-time.
const activityCursorSchema = z.union([
  z.string().regex(/^\d{1,17}\.[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i, 'Use the nextBefore value of the previous page'),
  z.string().datetime({ offset: true, message: 'Use the nextBefore value of the previous page or a date-time' }),
]);

export const activityQuerySchema = z.object({
  actor: z.string().uuid('Choose a member of this studio').optional(),
  kind: z.enum(activityKinds, { error: 'Choose one of the listed kinds' }).optional(),
  before: activityCursorSchema.optional(),
  limit: z.coerce.number().int().min(1).max(100).default(30),
});
export type ActivityQuery = z.input<typeof activityQuerySchema>;

export const activityPageSchema = z.object({
  events: z.array(activityEventSchema),
  // pass as `before` for the next (older) page; null on the last page
  nextBefore: z.string().nullable(),
});
export type ActivityPage = z.infer<typeof activityPageSchema>;
