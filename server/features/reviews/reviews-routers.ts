import type { Router } from 'express';
import type { Runtime } from '../../runtime';
import { createActivityRepository } from '../activity/activity.repository';
import { activityRouter } from '../activity/activity.router';
import { createNotificationsRepository } from '../notifications/notifications.repository';
import { notificationsRouter } from '../notifications/notifications.router';
import { reviewsRepository } from './reviews.repository';
import { productReviewsRouter, threadsRouter } from './reviews.router';
import { createReviewsService } from './reviews.service';

// Review threads and decisions, each member's notifications, and the studio's activity feed.
export function reviewsRouters(runtime: Pick<Runtime, 'config' | 'db' | 'mailer'>): Router[] {
  const { config, db, mailer } = runtime;
  const reviews = createReviewsService({ db: db.db, repo: reviewsRepository, mailer, config });
  return [productReviewsRouter(reviews), threadsRouter(reviews), notificationsRouter(createNotificationsRepository(db.db)), activityRouter(createActivityRepository(db.db))];
}
