import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from './schema/index';

export type Database = NodePgDatabase<typeof schema>;
export type DbHandle = { db: Database; pool: pg.Pool; close(): Promise<void> };

export function createDb(databaseUrl: string, max = 10): DbHandle {
  const pool = new pg.Pool({ connectionString: databaseUrl, max });
  // An idle client's error (e.g. the server restarting) must not crash the process.
  pool.on('error', (err) => console.error('[db] idle client error:', err.message));
  const db = drizzle(pool, { schema });
  return { db, pool, close: () => pool.end() };
}
