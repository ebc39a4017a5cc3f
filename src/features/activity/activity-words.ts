import type { ActivityEvent, ActivityKind } from '@shared/contracts/activity';

export const activityKindLabels: Record<ActivityKind, string> = {
  'original.imported': 'Originals imported',
  'product.created': 'Products started',
  'product.stage_moved': 'Stage moves',
  'product.variants_changed': 'Variants changed',
  'sample.recorded': 'Samples recorded',
  'sample.verdict': 'Sample verdicts',
  'review.requested': 'Reviews asked for',
  'review.approved': 'Approvals',
  'review.changes_requested': 'Changes asked for',
  'comment.added': 'Comments',
  'comment.resolved': 'Comments resolved',
  'sales.imported': 'Sales imported',
  'studio.data_imported': 'Studio data imported',
};

// Where an event's subject lives in the app, when it has a page.
export function activityLink(event: ActivityEvent): string | null {
  const productId = typeof event.data.productId === 'string' ? event.data.productId : null;
  if (event.subjectType === 'product' && event.subjectId) return `/products/${event.subjectId}`;
  if (event.subjectType === 'original' && event.subjectId) return `/originals/${event.subjectId}`;
  if (event.subjectType === 'thread' && productId && event.subjectId) return `/products/${productId}?thread=${event.subjectId}`;
  if (productId) return `/products/${productId}`;
  return null;
}
