import { and, eq } from 'drizzle-orm';
import { commentAnchorSchema, type CommentAnchor } from '../../shared/contracts/reviews';
import { commentThreads, comments, notifications, reviewDecisions, reviewRequests } from '../../server/db/schema/index';
import { daysAgo } from './demo-dates';
import { recordDemoActivity, type DemoContext } from './demo-life';
import type { DemoPerson } from './demo-products';

// Review threads on the mug and the tote: June's pins, Teodor's replies, one thread resolved;
// a review request and a decision on each, with the in-app notifications they would have sent.
// Dated in the story's past, so written as rows (the reviews service dates everything now).

// `pin` is where the thread sits on a preview view, as shares of the image's width and height.
type Pin = { view: 'front' | 'back' | 'flat'; at: [number, number] };
type DemoThread = { pin: Pin; revision: number; comments: { by: DemoPerson; daysAgo: number; hour: number; body: string }[]; resolved?: { by: DemoPerson; daysAgo: number } };
type DemoReview = {
  product: string;
  request: { by: DemoPerson; reviewer: DemoPerson; daysAgo: number; revision: number; note: string };
  decision: { by: DemoPerson; daysAgo: number; revision: number; decision: 'approved' | 'changes_requested'; note: string };
  threads: DemoThread[];
};

const demoReviews: DemoReview[] = [
  {
    product: 'Puffin Picnic mug',
    request: { by: 'teodor', reviewer: 'june', daysAgo: 57, revision: 2, note: 'First proof is up on the printer’s site; does the picnic read well from the front?' },
    decision: { by: 'june', daysAgo: 13, revision: 3, decision: 'approved', note: 'Good to sample. Thanks for moving the teal puffin.' },
    threads: [
      {
        pin: { view: 'front', at: [0.66, 0.42] },
        revision: 2,
        comments: [
          { by: 'june', daysAgo: 56, hour: 14, body: 'The teal puffin sits very close to the edge of the front view; on the real mug it would curve away. Could the pair sit a little closer together?' },
          { by: 'teodor', daysAgo: 55, hour: 9, body: 'Moved both puffins 60 px towards the basket in revision 3. New preview is up.' },
          { by: 'june', daysAgo: 14, hour: 11, body: 'Much better, thank you.' },
        ],
        resolved: { by: 'teodor', daysAgo: 14 },
      },
      {
        pin: { view: 'front', at: [0.5, 0.7] },
        revision: 3,
        comments: [
          { by: 'june', daysAgo: 13, hour: 15, body: 'On the front view the basket looks small next to the puffins. Fine for the sample, but let’s check it in hand.' },
        ],
      },
    ],
  },
  {
    product: 'Puffin Picnic tote',
    request: { by: 'teodor', reviewer: 'june', daysAgo: 27, revision: 5, note: 'Second proof with the artwork redrawn at print size.' },
    decision: { by: 'june', daysAgo: 26, revision: 5, decision: 'changes_requested', note: 'The title is still too small to read from across a market stall; see my pin.' },
    threads: [
      {
        pin: { view: 'flat', at: [0.5, 0.31] },
        revision: 5,
        comments: [
          { by: 'june', daysAgo: 26, hour: 10, body: 'The title is hard to read from two metres away. Can it be about a fifth larger?' },
          { by: 'teodor', daysAgo: 25, hour: 16, body: 'Will try it 20 % larger on the next proof, and check it still clears the handles.' },
        ],
      },
      {
        pin: { view: 'flat', at: [0.36, 0.6] },
        revision: 4,
        comments: [
          { by: 'ines', daysAgo: 29, hour: 12, body: 'On the sample the wave band sits right on the bottom seam. Lift it about 2 cm.' },
          { by: 'teodor', daysAgo: 28, hour: 10, body: 'Lifted by 240 px (2 cm at 300 DPI) in revision 5.' },
        ],
        resolved: { by: 'teodor', daysAgo: 28 },
      },
    ],
  },
];

const displayName: Record<DemoPerson, string> = { ines: 'Ines', teodor: 'Teodor', june: 'June' };

const anchorOf = (pin: Pin): CommentAnchor => commentAnchorSchema.parse({ surface: 'preview', view: pin.view, x: pin.at[0], y: pin.at[1] });

export async function ensureDemoReviews(ctx: DemoContext, productIds: Map<string, string>): Promise<void> {
  const { db, studioId, people, cal } = ctx;
  for (const review of demoReviews) {
    const productId = productIds.get(review.product);
    if (!productId) continue;
    const [existing] = await db.select({ id: commentThreads.id }).from(commentThreads).where(and(eq(commentThreads.studioId, studioId), eq(commentThreads.productId, productId))).limit(1);
    if (existing) continue;
    await db.transaction(async (tx) => {
      const { request, decision } = review;
      const requestedAt = daysAgo(cal, request.daysAgo, 9, 45);
      const decidedAt = daysAgo(cal, decision.daysAgo, 16, 5);
      await tx.insert(reviewRequests).values({ studioId, productId, requestedBy: people[request.by], reviewerId: people[request.reviewer], note: request.note, productRevision: request.revision, createdAt: requestedAt });
      await recordDemoActivity(tx, { studioId, actorId: people[request.by], kind: 'review.requested', subjectType: 'product', subjectId: productId, summary: `asked ${displayName[request.reviewer]} to review “${review.product}”`, data: { reviewerId: people[request.reviewer] }, createdAt: requestedAt });
      await tx.insert(reviewDecisions).values({ studioId, productId, reviewerId: people[decision.by], decision: decision.decision, note: decision.note, productRevision: decision.revision, createdAt: decidedAt });
      const approved = decision.decision === 'approved';
      await recordDemoActivity(tx, {
        studioId, actorId: people[decision.by], kind: approved ? 'review.approved' : 'review.changes_requested', subjectType: 'product', subjectId: productId,
        summary: approved ? `approved “${review.product}”` : `asked for changes to “${review.product}”`, data: { note: decision.note, revision: decision.revision }, createdAt: decidedAt,
      });
      await tx.insert(notifications).values([
        { studioId, userId: people[request.reviewer], kind: 'review.requested', title: `${displayName[request.by]} asked you to review “${review.product}”`, body: request.note, link: `/products/${productId}`, readAt: daysAgo(cal, request.daysAgo, 12), createdAt: requestedAt },
        { studioId, userId: people[request.by], kind: 'review.decided', title: `${displayName[decision.by]} ${approved ? 'approved' : 'asked for changes to'} “${review.product}”`, body: decision.note, link: `/products/${productId}`, readAt: approved ? daysAgo(cal, decision.daysAgo, 17) : null, createdAt: decidedAt },
      ]);
      for (const thread of review.threads) {
        const first = thread.comments[0];
        const openedAt = daysAgo(cal, first.daysAgo, first.hour);
        const [row] = await tx
          .insert(commentThreads)
          .values({
            studioId, productId, anchor: anchorOf(thread.pin), productRevision: thread.revision, createdBy: people[first.by], createdAt: openedAt,
            resolvedAt: thread.resolved ? daysAgo(cal, thread.resolved.daysAgo, 17, 30) : null, resolvedBy: thread.resolved ? people[thread.resolved.by] : null,
          })
          .returning({ id: commentThreads.id });
        for (const c of thread.comments) {
          const at = daysAgo(cal, c.daysAgo, c.hour, 20);
          await tx.insert(comments).values({ studioId, threadId: row.id, authorId: people[c.by], body: c.body, createdAt: at });
          await recordDemoActivity(tx, { studioId, actorId: people[c.by], kind: 'comment.added', subjectType: 'thread', subjectId: row.id, summary: `commented on “${review.product}”`, data: { productId }, createdAt: at });
        }
        if (thread.resolved) {
          await recordDemoActivity(tx, { studioId, actorId: people[thread.resolved.by], kind: 'comment.resolved', subjectType: 'thread', subjectId: row.id, summary: `resolved a thread on “${review.product}”`, data: { productId }, createdAt: daysAgo(cal, thread.resolved.daysAgo, 17, 30) });
        }
      }
    });
    console.log(`  review of ${review.product}: ${review.threads.length} threads, ${review.decision.decision}`);
  }
}
