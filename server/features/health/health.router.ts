import { sql } from 'drizzle-orm';
import type { Database } from '../../db/client';
import type { Mailer } from '../../lib/mail';
import { createRoutes } from '../../lib/routes';
import type { ObjectStorage } from '../../lib/storage';

const within = <T>(promise: Promise<T>, ms: number, fallback: T) =>
  Promise.race([promise, new Promise<T>((resolve) => setTimeout(() => resolve(fallback), ms))]);

export function healthRouter(deps: { db: Database; storage: ObjectStorage; mailer: Mailer }) {
  const r = createRoutes('/api/health');
  r.get('/', 'public', async (_req, res) => {
    const [database, storage, mail] = await Promise.all([
      within(deps.db.execute(sql`select 1`).then(() => true, () => false), 3000, false),
      within(deps.storage.check(), 3000, false),
      within(deps.mailer.check(), 3000, false),
    ]);
    const services = { database: database ? 'up' : 'down', storage: storage ? 'up' : 'down', mail: mail ? 'up' : 'down' } as const;
    const ok = database && storage && mail;
    res.status(ok ? 200 : 503).json({ status: ok ? 'ok' : 'degraded', services });
  });
  return r.router;
}
