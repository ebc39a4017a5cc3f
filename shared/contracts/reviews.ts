import { z } from 'zod';
import { previewViewSchema } from './exports';

const personSchema = z.object({ id: z.string(), name: z.string() });

// Template pixels: a pin may sit in the bleed, so allow a margin beyond the template's size.
const layoutCoordinate = z.number().finite().min(-100_000).max(100_000);
// A point of the preview image, as a share of its width and height.
const previewCoordinate = z.number().finite().min(0, 'Pins sit on the preview image').max(1, 'Pins sit on the preview image');

// Where a comment thread is pinned: a point of the layout, or of one preview view. None: a general thread.
export const commentAnchorSchema = z.discriminatedUnion('surface', [
  z.object({ surface: z.literal('layout'), x: layoutCoordinate, y: layoutCoordinate, placementId: z.string().min(1).max(80).optional() }),
  z.object({ surface: z.literal('preview'), view: previewViewSchema, x: previewCoordinate, y: previewCoordinate }),
]);
export type CommentAnchor = z.infer<typeof commentAnchorSchema>;

export const COMMENT_BODY_MAX = 4000;
export const commentBodySchema = z
  .string({ error: 'Write a comment' })
  .trim()
  .min(1, 'Write a comment')
  .max(COMMENT_BODY_MAX, `Keep a comment under ${COMMENT_BODY_MAX.toLocaleString('en')} characters`);

export const createThreadRequestSchema = z.object({ anchor: commentAnchorSchema.nullable().optional(), body: commentBodySchema });
export type CreateThreadRequest = z.input<typeof createThreadRequestSchema>;
export const addCommentRequestSchema = z.object({ body: commentBodySchema });

export const commentSchema = z.object({
  id: z.string(),
  body: z.string(),
  author: personSchema.nullable(),
  createdAt: z.string(),
});
export type Comment = z.infer<typeof commentSchema>;

export const commentThreadSchema = z.object({
  id: z.string(),
  productId: z.string(),
  anchor: commentAnchorSchema.nullable(),
  // the product revision the thread was opened on
  productRevision: z.number(),
  resolved: z.boolean(),
  resolvedAt: z.string().nullable(),
  resolvedBy: personSchema.nullable(),
  createdBy: personSchema.nullable(),
  createdAt: z.string(),
  comments: z.array(commentSchema),
});
export type CommentThread = z.infer<typeof commentThreadSchema>;
export const threadsListSchema = z.object({ threads: z.array(commentThreadSchema) });

const REVIEW_NOTE_MAX = 2000;
const reviewNoteSchema = z.string().trim().max(REVIEW_NOTE_MAX, `Keep the note under ${REVIEW_NOTE_MAX.toLocaleString('en')} characters`);

export const createReviewRequestSchema = z.object({
  // none: every reviewer of the studio is asked
  reviewerId: z.string().uuid('Choose a reviewer of this studio').nullable().optional(),
  note: reviewNoteSchema.default(''),
});
export type CreateReviewRequest = z.input<typeof createReviewRequestSchema>;

export const reviewDecisions = ['approved', 'changes_requested'] as const;
export const reviewDecisionKindSchema = z.enum(reviewDecisions, { error: 'Choose “approved” or “changes_requested”' });
export type ReviewDecisionKind = z.infer<typeof reviewDecisionKindSchema>;

export const createDecisionRequestSchema = z
  .object({ decision: reviewDecisionKindSchema, note: reviewNoteSchema.default('') })
  .refine((v) => v.decision !== 'changes_requested' || v.note.length > 0, { path: ['note'], message: 'Say what should change' });
export type CreateDecisionRequest = z.input<typeof createDecisionRequestSchema>;

export const reviewRequestSchema = z.object({
  id: z.string(),
  requestedBy: personSchema.nullable(),
  reviewer: personSchema.nullable(),
  note: z.string(),
  productRevision: z.number(),
  createdAt: z.string(),
});
export type ReviewRequest = z.infer<typeof reviewRequestSchema>;

export const reviewDecisionSchema = z.object({
  id: z.string(),
  reviewer: personSchema.nullable(),
  decision: reviewDecisionKindSchema,
  note: z.string(),
  productRevision: z.number(),
  createdAt: z.string(),
});
export type ReviewDecision = z.infer<typeof reviewDecisionSchema>;

export const reviewStatuses = ['none', 'requested', 'approved', 'changes_requested'] as const;
export const productReviewSchema = z.object({
  // the product's current revision
  revision: z.number(),
  state: z.object({
    // the latest decision on the current revision; else "requested" when a request came after the last decision
    status: z.enum(reviewStatuses),
    decision: reviewDecisionSchema.nullable(),
    openRequest: reviewRequestSchema.nullable(),
  }),
  requests: z.array(reviewRequestSchema),
  decisions: z.array(reviewDecisionSchema),
  // members who may decide, to choose from when asking for a review
  reviewers: z.array(personSchema),
});
export type ProductReview = z.infer<typeof productReviewSchema>;
