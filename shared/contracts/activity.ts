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
