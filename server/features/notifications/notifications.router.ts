import { notificationSettingsSchema, notificationsQuerySchema, updateNotificationSettingsRequestSchema, type NotificationsList } from '../../../shared/contracts/notifications';
import { notFound } from '../../lib/http-error';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody, parseQuery } from '../../middleware/validate';
import type { NotificationsRepository } from './notifications.repository';

// Each member's own notifications and settings: 'studio.read', and never anyone else's.
export function notificationsRouter(repo: NotificationsRepository) {
  const r = createRoutes('/api/notifications');
  r.get('/', 'studio.read', async (req, res) => {
    const { studioId, user } = studioAuth(req);
    const { limit } = parseQuery(req, notificationsQuerySchema);
    const [rows, unreadCount] = await Promise.all([repo.latest(studioId, user.id, limit), repo.unreadCount(studioId, user.id)]);
    const body: NotificationsList = {
      unreadCount,
      notifications: rows.map((n) => ({ id: n.id, kind: n.kind, title: n.title, body: n.body, link: n.link, read: n.readAt !== null, createdAt: n.createdAt.toISOString() })),
    };
    res.json(body);
  });
  r.post('/read-all', 'studio.read', async (req, res) => {
    const { studioId, user } = studioAuth(req);
    res.json({ marked: await repo.markAllRead(studioId, user.id) });
  });
  r.get('/settings', 'studio.read', async (req, res) => {
    const { studioId, user } = studioAuth(req);
    const settings = await repo.settings(studioId, user.id);
    if (!settings) throw notFound('Your membership');
    res.json(notificationSettingsSchema.parse(settings));
  });
  r.patch('/settings', 'studio.read', async (req, res) => {
    const { studioId, user } = studioAuth(req);
    const settings = await repo.updateSettings(studioId, user.id, parseBody(req, updateNotificationSettingsRequestSchema));
    if (!settings) throw notFound('Your membership');
    res.json(settings);
  });
  r.post('/:id/read', 'studio.read', async (req, res) => {
    const { studioId, user } = studioAuth(req);
    if (!(await repo.markRead(studioId, user.id, idParam(req, 'id', 'That notification')))) throw notFound('That notification');
    res.json({ ok: true });
  });
  return r.router;
}
