import { z } from 'zod';

export const notificationKinds = ['review.requested', 'review.decided', 'comment.added'] as const;
export const notificationKindSchema = z.enum(notificationKinds);
export type NotificationKind = z.infer<typeof notificationKindSchema>;

export const notificationSchema = z.object({
  id: z.string(),
  kind: z.string(),
  title: z.string(),
  body: z.string(),
  // an in-app path such as /products/<id>?thread=<id>
  link: z.string().nullable(),
  read: z.boolean(),
  createdAt: z.string(),
});
export type Notification = z.infer<typeof notificationSchema>;

export const notificationsListSchema = z.object({ unreadCount: z.number(), notifications: z.array(notificationSchema) });
export type NotificationsList = z.infer<typeof notificationsListSchema>;

export const notificationsQuerySchema = z.object({ limit: z.coerce.number().int().min(1).max(100).default(20) });

export const notificationSettingsSchema = z.object({ notifyByEmail: z.boolean(), notifyInApp: z.boolean() });
export type NotificationSettings = z.infer<typeof notificationSettingsSchema>;

export const updateNotificationSettingsRequestSchema = notificationSettingsSchema
  .partial()
  .refine((v) => v.notifyByEmail !== undefined || v.notifyInApp !== undefined, 'Change at least one setting');
export type UpdateNotificationSettingsRequest = z.input<typeof updateNotificationSettingsRequestSchema>;
