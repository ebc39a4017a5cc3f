import type { Router } from 'express';
import type { Runtime } from '../../runtime';
import { createCalendarRepository } from './calendar.repository';
import { calendarRouter } from './calendar.router';
import { createCalendarService } from './calendar.service';

export function calendarRouters(runtime: Pick<Runtime, 'db'>): Router[] {
  return [calendarRouter(createCalendarService(createCalendarRepository(runtime.db.db)))];
}
