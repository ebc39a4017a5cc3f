import { activityQuerySchema, type ActivityEvent, type ActivityKind, type ActivityPage, type ActivitySubjectType } from '../../../shared/contracts/activity';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { parseQuery } from '../../middleware/validate';
import type { ActivityRepository, FeedCursor } from './activity.repository';

// `before` is the previous page's nextBefore ("<micros>.<id>"), or any ISO date-time.
function cursorOf(before: string | undefined): FeedCursor | undefined {
  if (!before) return undefined;
  const own = /^(\d+)\.(.+)$/.exec(before);
  if (own) return { micros: own[1]!, id: own[2]!.toLowerCase() };
  return { micros: String(Date.parse(before) * 1000), id: null };
}

export function activityRouter(repo: ActivityRepository) {
  const r = createRoutes('/api/activity');
  r.get('/', 'studio.read', async (req, res) => {
    const query = parseQuery(req, activityQuerySchema);
    // One extra row says whether an older page exists.
    const rows = await repo.page(studioAuth(req).studioId, { actorId: query.actor, kind: query.kind, before: cursorOf(query.before), limit: query.limit + 1 });
    const shown = rows.slice(0, query.limit);
    const events: ActivityEvent[] = shown.map(({ event, actorName }) => ({
      id: event.id,
      kind: event.kind as ActivityKind,
      subjectType: event.subjectType as ActivitySubjectType,
      subjectId: event.subjectId,
      summary: event.summary,
      actor: event.actorId ? { id: event.actorId, name: actorName ?? 'Former member' } : null,
      data: event.data,
      createdAt: event.createdAt.toISOString(),
    }));
    const last = shown.at(-1);
    const body: ActivityPage = { events, nextBefore: rows.length > query.limit && last ? `${last.micros}.${last.event.id}` : null };
    res.json(body);
  });
  return r.router;
}
