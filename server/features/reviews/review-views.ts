import { commentAnchorSchema, type Comment, type CommentThread, type ReviewDecision, type ReviewRequest } from '../../../shared/contracts/reviews';
import type { CommentRow, DecisionRow, ReviewRequestRow, ThreadRow } from './reviews.repository';

// A person who has left the studio (or deleted their account) still shows as someone.
const person = (id: string | null, name: string | null) => (id ? { id, name: name ?? 'Former member' } : null);

export function commentView(row: CommentRow): Comment {
  return { id: row.id, body: row.body, author: person(row.authorId, row.authorName), createdAt: row.createdAt.toISOString() };
}

export function threadView(row: ThreadRow, comments: CommentRow[]): CommentThread {
  return {
    id: row.id,
    productId: row.productId,
    // saved through the same schema; a pin of an unknown shape shows as a general thread
    anchor: commentAnchorSchema.safeParse(row.anchor).data ?? null,
    productRevision: row.productRevision,
    resolved: row.resolvedAt !== null,
    resolvedAt: row.resolvedAt?.toISOString() ?? null,
    resolvedBy: person(row.resolvedBy, row.resolvedByName),
    createdBy: person(row.createdBy, row.createdByName),
    createdAt: row.createdAt.toISOString(),
    comments: comments.map(commentView),
  };
}

export function requestView(row: ReviewRequestRow): ReviewRequest {
  return {
    id: row.id,
    requestedBy: person(row.requestedBy, row.requestedByName),
    reviewer: person(row.reviewerId, row.reviewerName),
    note: row.note,
    productRevision: row.productRevision,
    createdAt: row.createdAt.toISOString(),
  };
}

export function decisionView(row: DecisionRow): ReviewDecision {
  return { id: row.id, reviewer: person(row.reviewerId, row.reviewerName), decision: row.decision, note: row.note, productRevision: row.productRevision, createdAt: row.createdAt.toISOString() };
}
