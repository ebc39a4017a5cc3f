import { existsSync } from 'node:fs';
import path from 'node:path';
import { runChild, type ChildOptions } from './child-process';
import { repoRoot, tsxCli } from './repo-paths';
import { ServiceError } from './service-error';

const migrateModule = path.join(repoRoot, 'server', 'db', 'migrate.ts');

export function hasMigrations(): boolean {
  return existsSync(migrateModule);
}

/** Applies the Drizzle migrations in ./drizzle. */
export async function migrateDatabase(databaseUrl: string): Promise<void> {
  if (!hasMigrations()) {
    throw new ServiceError('db.no_migrations', 'server/db/migrate.ts is missing, so the database cannot be prepared');
  }
  const { runMigrations } = (await import('../../server/db/migrate')) as {
    runMigrations(url: string): Promise<void>;
  };
  await runMigrations(databaseUrl);
}

/** Loads the Saltmarsh Studio demo data (idempotent) in a child, with the app's environment. */
export async function seedDemoData(options: ChildOptions): Promise<void> {
  await runChild('demo data seed', process.execPath, [tsxCli, path.join('scripts', 'seed', 'seed.ts')], {
    ...options,
    errorCode: 'seed.failed',
  });
}
