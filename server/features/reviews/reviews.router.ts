import { addCommentRequestSchema, createDecisionRequestSchema, createReviewRequestSchema, createThreadRequestSchema } from '../../../shared/contracts/reviews';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody } from '../../middleware/validate';
import type { Request } from 'express';
import type { Actor, ReviewsService } from './reviews.service';

const actorOf = (req: Request): Actor => {
  const auth = studioAuth(req);
  return { studioId: auth.studioId, userId: auth.user.id, name: auth.user.name, role: auth.role };
};

// A product's comment threads, review requests and decisions.
export function productReviewsRouter(service: ReviewsService) {
  const r = createRoutes('/api/products');
  r.get('/:id/threads', 'studio.read', async (req, res) => {
    res.json(await service.threads(studioAuth(req).studioId, idParam(req, 'id', 'That product')));
  });
  r.post('/:id/threads', 'reviews.comment', async (req, res) => {
    const productId = idParam(req, 'id', 'That product');
    res.status(201).json(await service.openThread(actorOf(req), productId, parseBody(req, createThreadRequestSchema)));
  });
  r.get('/:id/review', 'studio.read', async (req, res) => {
    res.json(await service.review(studioAuth(req).studioId, idParam(req, 'id', 'That product')));
  });
  r.post('/:id/review-requests', 'reviews.resolve', async (req, res) => {
    const productId = idParam(req, 'id', 'That product');
    res.status(201).json(await service.requestReview(actorOf(req), productId, parseBody(req, createReviewRequestSchema)));
  });
  r.post('/:id/decisions', 'reviews.decide', async (req, res) => {
    const productId = idParam(req, 'id', 'That product');
    res.status(201).json(await service.decide(actorOf(req), productId, parseBody(req, createDecisionRequestSchema)));
  });
  return r.router;
}

// One thread: reply, resolve, reopen.
export function threadsRouter(service: ReviewsService) {
  const r = createRoutes('/api/threads');
  r.post('/:id/comments', 'reviews.comment', async (req, res) => {
    const threadId = idParam(req, 'id', 'That thread');
    res.status(201).json(await service.reply(actorOf(req), threadId, parseBody(req, addCommentRequestSchema).body));
  });
  r.post('/:id/resolve', 'reviews.resolve', async (req, res) => {
    res.json(await service.setResolved(actorOf(req), idParam(req, 'id', 'That thread'), true));
  });
  r.post('/:id/reopen', 'reviews.resolve', async (req, res) => {
    res.json(await service.setResolved(actorOf(req), idParam(req, 'id', 'That thread'), false));
  });
  return r.router;
}
