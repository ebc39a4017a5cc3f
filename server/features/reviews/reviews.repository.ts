import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { CommentAnchor } from '../../../shared/contracts/reviews';
import type { Database } from '../../db/client';
import { commentThreads, comments, memberships, products, reviewDecisions, reviewRequests, studioTemplates, users } from '../../db/schema/index';

export type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];
type Db = Database | Tx;

const resolver = alias(users, 'resolver');
const opener = alias(users, 'opener');
const requester = alias(users, 'requester');
const reviewer = alias(users, 'reviewer');

export type ThreadRow = typeof commentThreads.$inferSelect & { createdByName: string | null; resolvedByName: string | null };
export type CommentRow = typeof comments.$inferSelect & { authorName: string | null };
export type ReviewRequestRow = typeof reviewRequests.$inferSelect & { requestedByName: string | null; reviewerName: string | null };
export type DecisionRow = typeof reviewDecisions.$inferSelect & { reviewerName: string | null };

// Queries of comment threads and reviews, always scoped by studio. Writes take the caller's
// transaction, so the change, its activity record and its in-app notifications commit together.
export const reviewsRepository = {
  async product(db: Db, studioId: string, productId: string, lock = false) {
    const q = db
      .select({ id: products.id, name: products.name, revision: products.revision, createdBy: products.createdBy, templateId: products.templateId })
      .from(products)
      .where(and(eq(products.studioId, studioId), eq(products.id, productId)));
    const [row] = lock ? await q.for('share') : await q;
    return row ?? null;
  },

  // A studio template's spec (built-in templates live in shared/templates).
  async studioTemplate(db: Db, studioId: string, templateId: string) {
    if (!/^[0-9a-f-]{36}$/i.test(templateId)) return null;
    const [row] = await db.select({ spec: studioTemplates.spec }).from(studioTemplates).where(and(eq(studioTemplates.studioId, studioId), eq(studioTemplates.id, templateId)));
    return row?.spec ?? null;
  },

  async threads(db: Db, studioId: string, productId: string): Promise<ThreadRow[]> {
    const rows = await db
      .select({ thread: commentThreads, createdByName: opener.name, resolvedByName: resolver.name })
      .from(commentThreads)
      .leftJoin(opener, eq(opener.id, commentThreads.createdBy))
      .leftJoin(resolver, eq(resolver.id, commentThreads.resolvedBy))
      .where(and(eq(commentThreads.studioId, studioId), eq(commentThreads.productId, productId)))
      .orderBy(asc(commentThreads.createdAt), asc(commentThreads.id));
    return rows.map((r) => ({ ...r.thread, createdByName: r.createdByName, resolvedByName: r.resolvedByName }));
  },

  async thread(db: Db, studioId: string, threadId: string): Promise<ThreadRow | null> {
    const [row] = await db
      .select({ thread: commentThreads, createdByName: opener.name, resolvedByName: resolver.name })
      .from(commentThreads)
      .leftJoin(opener, eq(opener.id, commentThreads.createdBy))
      .leftJoin(resolver, eq(resolver.id, commentThreads.resolvedBy))
      .where(and(eq(commentThreads.studioId, studioId), eq(commentThreads.id, threadId)));
    return row ? { ...row.thread, createdByName: row.createdByName, resolvedByName: row.resolvedByName } : null;
  },

  async comments(db: Db, studioId: string, threadIds: string[]): Promise<CommentRow[]> {
    if (!threadIds.length) return [];
    const rows = await db
      .select({ comment: comments, authorName: users.name })
      .from(comments)
      .leftJoin(users, eq(users.id, comments.authorId))
      .where(and(eq(comments.studioId, studioId), inArray(comments.threadId, threadIds)))
      .orderBy(asc(comments.createdAt), asc(comments.id));
    return rows.map((r) => ({ ...r.comment, authorName: r.authorName }));
  },

  async insertThread(tx: Tx, input: { studioId: string; productId: string; anchor: CommentAnchor | null; productRevision: number; createdBy: string }) {
    const [row] = await tx.insert(commentThreads).values(input).returning();
    return row!;
  },

  async insertComment(tx: Tx, input: { studioId: string; threadId: string; authorId: string; body: string }) {
    const [row] = await tx.insert(comments).values(input).returning();
    return row!;
  },

  // The thread row is locked so two resolves at once record one change.
  async lockThread(tx: Tx, studioId: string, threadId: string) {
    const [row] = await tx
      .select({ id: commentThreads.id, productId: commentThreads.productId, resolvedAt: commentThreads.resolvedAt, createdBy: commentThreads.createdBy })
      .from(commentThreads)
      .where(and(eq(commentThreads.studioId, studioId), eq(commentThreads.id, threadId)))
      .for('update');
    return row ?? null;
  },

  async setResolved(tx: Tx, threadId: string, by: string | null) {
    await tx.update(commentThreads).set({ resolvedAt: by ? new Date() : null, resolvedBy: by }).where(eq(commentThreads.id, threadId));
  },

  // Everyone who wrote in the thread, and who opened it.
  async participants(db: Db, studioId: string, threadId: string): Promise<string[]> {
    const rows = await db.selectDistinct({ id: comments.authorId }).from(comments).where(and(eq(comments.studioId, studioId), eq(comments.threadId, threadId)));
    return rows.map((r) => r.id).filter((id): id is string => id !== null);
  },

  async requesters(db: Db, studioId: string, productId: string): Promise<string[]> {
    const rows = await db
      .selectDistinct({ id: reviewRequests.requestedBy })
      .from(reviewRequests)
      .where(and(eq(reviewRequests.studioId, studioId), eq(reviewRequests.productId, productId)));
    return rows.map((r) => r.id).filter((id): id is string => id !== null);
  },

  async members(db: Db, studioId: string) {
    return db
      .select({ id: users.id, name: users.name, role: memberships.role })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(eq(memberships.studioId, studioId))
      .orderBy(asc(users.name));
  },

  async insertRequest(tx: Tx, input: typeof reviewRequests.$inferInsert) {
    const [row] = await tx.insert(reviewRequests).values(input).returning();
    return row!;
  },

  async insertDecision(tx: Tx, input: typeof reviewDecisions.$inferInsert) {
    const [row] = await tx.insert(reviewDecisions).values(input).returning();
    return row!;
  },

  async requests(db: Db, studioId: string, productId: string): Promise<ReviewRequestRow[]> {
    const rows = await db
      .select({ request: reviewRequests, requestedByName: requester.name, reviewerName: reviewer.name })
      .from(reviewRequests)
      .leftJoin(requester, eq(requester.id, reviewRequests.requestedBy))
      .leftJoin(reviewer, eq(reviewer.id, reviewRequests.reviewerId))
      .where(and(eq(reviewRequests.studioId, studioId), eq(reviewRequests.productId, productId)))
      .orderBy(desc(reviewRequests.createdAt), desc(reviewRequests.id));
    return rows.map((r) => ({ ...r.request, requestedByName: r.requestedByName, reviewerName: r.reviewerName }));
  },

  async decisions(db: Db, studioId: string, productId: string): Promise<DecisionRow[]> {
    const rows = await db
      .select({ decision: reviewDecisions, reviewerName: users.name })
      .from(reviewDecisions)
      .leftJoin(users, eq(users.id, reviewDecisions.reviewerId))
      .where(and(eq(reviewDecisions.studioId, studioId), eq(reviewDecisions.productId, productId)))
      .orderBy(desc(reviewDecisions.createdAt), desc(reviewDecisions.id));
    return rows.map((r) => ({ ...r.decision, reviewerName: r.reviewerName }));
  },
};

export type ReviewsRepository = typeof reviewsRepository;
