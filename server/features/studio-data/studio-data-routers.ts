import type { Router } from 'express';
import type { Runtime } from '../../runtime';
import { studioDataRouter } from './studio-data.router';

export function studioDataRouters(runtime: Pick<Runtime, 'db' | 'storage'>): Router[] {
  return [studioDataRouter({ db: runtime.db.db, storage: runtime.storage })];
}
