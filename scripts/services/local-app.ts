import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { migrateDatabase, seedDemoData } from './app-steps';
import type { RunningChild } from './child-process';
import { isPortTaken } from './free-port';
import { localSessionSecret, startLocalServices, type LocalServices } from './local-services';
import { repoRoot } from './repo-paths';
import { ServiceError } from './service-error';
import { onShutdown } from './shutdown';
import { demoAccounts, demoPassword } from '../seed/demo-accounts';

export interface LocalAppOptions {
  nodeEnv: 'development';
  /** Where people open the app (the vite dev server in `npm run dev`). */
  appUrl(port: number): string;
}

export interface PreparedApp {
  env: NodeJS.ProcessEnv;
  port: number;
  services: LocalServices;
  /** Children to stop, in order, before the services. */
  children: RunningChild[];
  shutdown(exitCode: number): Promise<never>;
  /** Stops everything when this child ends on its own (a crash, or a port clash). */
  stopWhenChildEnds(child: RunningChild): void;
}

/** Shared first half of `npm start` and `npm run dev`: services, migrations, demo data. */
export async function prepareLocalApp(options: LocalAppOptions): Promise<PreparedApp> {
  const port = Number(process.env.PORT ?? 3000);
  if (await isPortTaken(port)) {
    throw new ServiceError(
      'app.port_taken',
      `port ${port} is already in use (is another \`npm start\` or \`npm run dev\` running?); stop it or set PORT`,
    );
  }
  if (!process.env.DATABASE_URL) ensureSystemPackages('postgres');

  const services = await timed('services', () => startLocalServices());
  const children: RunningChild[] = [];
  const { shutdown, isShuttingDown } = onShutdown(async () => {
    for (const child of [...children].reverse()) await child.stop();
    await services.stop();
  });
  for (const line of services.summary) console.log(`  ${line}`);

  const env: NodeJS.ProcessEnv = {
    ...process.env,
    ...services.env,
    PORT: String(port),
    APP_URL: process.env.APP_URL ?? options.appUrl(port),
    SESSION_SECRET: await localSessionSecret(),
    NODE_ENV: process.env.NODE_ENV ?? options.nodeEnv,
    RUN_WORKER_IN_PROCESS: process.env.RUN_WORKER_IN_PROCESS ?? 'true',
  };
  // the migration runs in this process and may read the same variables as the server
  Object.assign(process.env, env);
  try {
    await timed('migrations', () => migrateDatabase(services.env.DATABASE_URL));
    await timed('demo data', () => seedDemoData({ env }));
  } catch (error) {
    await services.stop();
    throw error;
  }
  const stopWhenChildEnds = (child: RunningChild) => {
    void child.exited.then((code) => {
      if (isShuttingDown()) return;
      console.error(`${child.name} stopped on its own (exit code ${code}); stopping everything.`);
      void shutdown(code || 1);
    });
  };
  return { env, port, services, children, shutdown, stopWhenChildEnds };
}

export function ensureSystemPackages(...which: string[]): void {
  try {
    execFileSync('bash', [path.join(repoRoot, 'scripts', 'ensure-system-packages.sh'), ...which], { stdio: 'inherit' });
  } catch {
    throw new ServiceError('system.packages_missing', `system packages (${which.join(', ')}) are missing; see above`);
  }
}

export async function timed<T>(label: string, step: () => Promise<T>): Promise<T> {
  const startedAt = performance.now();
  const result = await step();
  console.log(`✓ ${label} (${((performance.now() - startedAt) / 1000).toFixed(1)} s)`);
  return result;
}

export function printSignIns(appUrl: string, inboxUrl: string | undefined): void {
  console.log(`\nMotifold is running at ${appUrl}`);
  if (inboxUrl) console.log(`Mail sent by the app arrives at ${inboxUrl}`);
  console.log(`\nDemo sign-ins (password for all: ${demoPassword}):`);
  for (const account of demoAccounts) console.log(`  ${account.email.padEnd(24)} ${account.role.padEnd(9)} ${account.name}`);
  console.log('\nPress Ctrl-C to stop.');
}
