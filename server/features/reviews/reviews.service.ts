import { can, type StudioRole } from '../../../shared/auth/permissions';
import type { CommentAnchor, CommentThread, ProductReview, ReviewDecisionKind } from '../../../shared/contracts/reviews';
import { previewViewsFor } from '../../../shared/reviews/pins';
import { reviewStateOf } from '../../../shared/reviews/review-state';
import { findBuiltInTemplate } from '../../../shared/templates';
import type { AppConfig } from '../../config';
import type { Database } from '../../db/client';
import { badRequest, notFound } from '../../lib/http-error';
import type { Mailer } from '../../lib/mail';
import { recordActivity } from '../activity/record-activity';
import { prepareNotifications, sendNotificationMails } from '../notifications/notify';
import { commentMail, reviewDecidedMail, reviewRequestedMail } from './review-mails';
import type { ReviewsRepository, Tx } from './reviews.repository';
import { commentView, decisionView, requestView, threadView } from './review-views';

export type Actor = { studioId: string; userId: string; name: string; role: StudioRole };
type Deps = { db: Database; repo: ReviewsRepository; mailer: Mailer; config: Pick<AppConfig, 'appUrl'> };

const excerpt = (text: string, max = 140) => (text.length > max ? `${text.slice(0, max - 1)}…` : text);

export function createReviewsService({ db, repo, mailer, config }: Deps) {
  const productPath = (productId: string) => `/products/${productId}`;
  const threadPath = (productId: string, threadId: string) => `${productPath(productId)}?thread=${threadId}`;
  const full = (path: string) => `${config.appUrl}${path}`;

  async function productOrThrow(tx: Database | Tx, studioId: string, productId: string) {
    const product = await repo.product(tx, studioId, productId, tx !== db);
    if (!product) throw notFound('That product');
    return product;
  }

  async function checkAnchor(studioId: string, templateId: string, anchor: CommentAnchor) {
    if (anchor.surface !== 'preview') return;
    const template = findBuiltInTemplate(templateId) ?? (await repo.studioTemplate(db, studioId, templateId));
    const views = template ? previewViewsFor(template) : [];
    if (!views.includes(anchor.view)) {
      throw badRequest('review.unknown_view', `This product is previewed from ${views.join(', ') || 'no view'}; pin the comment on one of those.`, { 'anchor.view': 'Choose a view of this product' });
    }
  }

  async function loadThread(studioId: string, threadId: string): Promise<CommentThread> {
    const thread = await repo.thread(db, studioId, threadId);
    if (!thread) throw notFound('That thread');
    return threadView(thread, await repo.comments(db, studioId, [threadId]));
  }

  async function review(studioId: string, productId: string): Promise<ProductReview> {
    const product = await productOrThrow(db, studioId, productId);
    const [requests, decisions, members] = await Promise.all([repo.requests(db, studioId, productId), repo.decisions(db, studioId, productId), repo.members(db, studioId)]);
    const state = reviewStateOf({ revision: product.revision, requests, decisions });
    return {
      revision: product.revision,
      state: { status: state.status, decision: state.decision && decisionView(state.decision), openRequest: state.openRequest && requestView(state.openRequest) },
      requests: requests.map(requestView),
      decisions: decisions.map(decisionView),
      reviewers: members.filter((m) => can(m.role, 'reviews.decide')).map((m) => ({ id: m.id, name: m.name })),
    };
  }

  return {
    async threads(studioId: string, productId: string) {
      await productOrThrow(db, studioId, productId);
      const threads = await repo.threads(db, studioId, productId);
      const comments = await repo.comments(db, studioId, threads.map((t) => t.id));
      return { threads: threads.map((t) => threadView(t, comments.filter((c) => c.threadId === t.id))) };
    },

    async openThread(actor: Actor, productId: string, input: { anchor?: CommentAnchor | null; body: string }) {
      const anchor = input.anchor ?? null;
      const peek = await productOrThrow(db, actor.studioId, productId);
      if (anchor) await checkAnchor(actor.studioId, peek.templateId, anchor);
      const { threadId, mails } = await db.transaction(async (tx) => {
        const product = await productOrThrow(tx, actor.studioId, productId);
        const thread = await repo.insertThread(tx, { studioId: actor.studioId, productId, anchor, productRevision: product.revision, createdBy: actor.userId });
        await repo.insertComment(tx, { studioId: actor.studioId, threadId: thread.id, authorId: actor.userId, body: input.body });
        await recordActivity(tx, {
          studioId: actor.studioId, actorId: actor.userId, kind: 'comment.added', subjectType: 'thread', subjectId: thread.id,
          summary: `commented on “${product.name}”: ${excerpt(input.body, 80)}`, data: { productId, threadId: thread.id, reply: false },
        });
        const link = threadPath(productId, thread.id);
        const recipients = [...(product.createdBy ? [product.createdBy] : []), ...(await repo.requesters(tx, actor.studioId, productId))];
        const mails = await prepareNotifications(tx, {
          studioId: actor.studioId, recipientIds: recipients, exceptUserId: actor.userId,
          message: {
            kind: 'comment.added', title: `${actor.name} commented on “${product.name}”`, body: excerpt(input.body), link,
            mail: (to) => commentMail(to, { authorName: actor.name, productName: product.name, body: input.body, reply: false, link: full(link) }),
          },
        });
        return { threadId: thread.id, mails };
      });
      await sendNotificationMails(mailer, mails);
      return loadThread(actor.studioId, threadId);
    },

    async reply(actor: Actor, threadId: string, body: string) {
      const { comment, mails } = await db.transaction(async (tx) => {
        const thread = await repo.lockThread(tx, actor.studioId, threadId);
        if (!thread) throw notFound('That thread');
        const product = await productOrThrow(tx, actor.studioId, thread.productId);
        const participants = await repo.participants(tx, actor.studioId, threadId);
        const comment = await repo.insertComment(tx, { studioId: actor.studioId, threadId, authorId: actor.userId, body });
        await recordActivity(tx, {
          studioId: actor.studioId, actorId: actor.userId, kind: 'comment.added', subjectType: 'thread', subjectId: threadId,
          summary: `replied on “${product.name}”: ${excerpt(body, 80)}`, data: { productId: product.id, threadId, reply: true },
        });
        const link = threadPath(product.id, threadId);
        const mails = await prepareNotifications(tx, {
          studioId: actor.studioId, recipientIds: [...participants, ...(thread.createdBy ? [thread.createdBy] : [])], exceptUserId: actor.userId,
          message: {
            kind: 'comment.added', title: `${actor.name} replied on “${product.name}”`, body: excerpt(body), link,
            mail: (to) => commentMail(to, { authorName: actor.name, productName: product.name, body, reply: true, link: full(link) }),
          },
        });
        return { comment, mails };
      });
      await sendNotificationMails(mailer, mails);
      return commentView({ ...comment, authorName: actor.name });
    },

    async setResolved(actor: Actor, threadId: string, resolved: boolean) {
      await db.transaction(async (tx) => {
        const thread = await repo.lockThread(tx, actor.studioId, threadId);
        if (!thread) throw notFound('That thread');
        if ((thread.resolvedAt !== null) === resolved) return;
        const product = await productOrThrow(tx, actor.studioId, thread.productId);
        await repo.setResolved(tx, threadId, resolved ? actor.userId : null);
        // Only resolving is a kind of its own in the feed; a reopened thread shows up through its next comment.
        if (resolved) {
          await recordActivity(tx, {
            studioId: actor.studioId, actorId: actor.userId, kind: 'comment.resolved', subjectType: 'thread', subjectId: threadId,
            summary: `resolved a comment on “${product.name}”`, data: { productId: product.id, threadId },
          });
        }
      });
      return loadThread(actor.studioId, threadId);
    },

    review,

    async requestReview(actor: Actor, productId: string, input: { reviewerId?: string | null; note: string }) {
      const members = await repo.members(db, actor.studioId);
      const chosen = input.reviewerId ? members.find((m) => m.id === input.reviewerId) : null;
      if (input.reviewerId && (!chosen || !can(chosen.role, 'reviews.decide'))) {
        throw badRequest('review.not_a_reviewer', 'That person cannot approve products in this studio; choose a reviewer or the owner.', { reviewerId: 'Choose a reviewer of this studio' });
      }
      if (chosen && chosen.id === actor.userId) throw badRequest('review.self', 'Ask someone else to review your product.', { reviewerId: 'Choose someone else' });
      // Nobody chosen: every reviewer; a studio without reviewers asks whoever may decide.
      const reviewers = members.filter((m) => m.role === 'reviewer');
      const recipients = chosen ? [chosen.id] : (reviewers.length ? reviewers : members.filter((m) => can(m.role, 'reviews.decide'))).map((m) => m.id);
      const { mails } = await db.transaction(async (tx) => {
        const product = await productOrThrow(tx, actor.studioId, productId);
        await repo.insertRequest(tx, { studioId: actor.studioId, productId, requestedBy: actor.userId, reviewerId: chosen?.id ?? null, note: input.note, productRevision: product.revision });
        await recordActivity(tx, {
          studioId: actor.studioId, actorId: actor.userId, kind: 'review.requested', subjectType: 'product', subjectId: productId,
          summary: `asked ${chosen ? chosen.name : 'the reviewers'} to review “${product.name}”`, data: { reviewerId: chosen?.id ?? null, revision: product.revision },
        });
        const link = `${productPath(productId)}#review`;
        const mails = await prepareNotifications(tx, {
          studioId: actor.studioId, recipientIds: recipients, exceptUserId: actor.userId,
          message: {
            kind: 'review.requested', title: `${actor.name} asked you to review “${product.name}”`, body: excerpt(input.note), link,
            mail: (to) => reviewRequestedMail(to, { requesterName: actor.name, productName: product.name, note: input.note, link: full(link) }),
          },
        });
        return { mails };
      });
      await sendNotificationMails(mailer, mails);
      return review(actor.studioId, productId);
    },

    async decide(actor: Actor, productId: string, input: { decision: ReviewDecisionKind; note: string }) {
      const { mails } = await db.transaction(async (tx) => {
        const product = await productOrThrow(tx, actor.studioId, productId);
        await repo.insertDecision(tx, { studioId: actor.studioId, productId, reviewerId: actor.userId, decision: input.decision, note: input.note, productRevision: product.revision });
        const approved = input.decision === 'approved';
        await recordActivity(tx, {
          studioId: actor.studioId, actorId: actor.userId, kind: approved ? 'review.approved' : 'review.changes_requested', subjectType: 'product', subjectId: productId,
          summary: approved ? `approved “${product.name}”` : `asked for changes to “${product.name}”: ${excerpt(input.note, 80)}`, data: { revision: product.revision, note: input.note },
        });
        const link = `${productPath(productId)}#review`;
        const recipients = [...(product.createdBy ? [product.createdBy] : []), ...(await repo.requesters(tx, actor.studioId, productId))];
        const mails = await prepareNotifications(tx, {
          studioId: actor.studioId, recipientIds: recipients, exceptUserId: actor.userId,
          message: {
            kind: 'review.decided', title: approved ? `${actor.name} approved “${product.name}”` : `${actor.name} asked for changes to “${product.name}”`, body: excerpt(input.note), link,
            mail: (to) => reviewDecidedMail(to, { reviewerName: actor.name, productName: product.name, approved, note: input.note, link: full(link) }),
          },
        });
        return { mails };
      });
      await sendNotificationMails(mailer, mails);
      return review(actor.studioId, productId);
    },
  };
}

export type ReviewsService = ReturnType<typeof createReviewsService>;
