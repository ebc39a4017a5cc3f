import { calendarQuerySchema } from '../../../shared/contracts/calendar';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { parseQuery } from '../../middleware/validate';
import type { CalendarService } from './calendar.service';

// The season calendar: collections with their products and ready-by flags, and the home page's short list.
export function calendarRouter(service: CalendarService) {
  const r = createRoutes('/api/calendar');
  r.get('/', 'studio.read', async (req, res) => {
    res.json(await service.calendar(studioAuth(req).studioId, parseQuery(req, calendarQuerySchema)));
  });
  r.get('/flags', 'studio.read', async (req, res) => {
    res.json(await service.flags(studioAuth(req).studioId));
  });
  return r.router;
}
