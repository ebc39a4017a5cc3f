import { randomBytes } from 'node:crypto';
import { existsSync } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { seedDemoData } from '../../scripts/services/app-steps';
import { startChild, waitForHealthy, type RunningChild } from '../../scripts/services/child-process';
import { ensureClientBuild } from '../../scripts/services/client-build';
import { freePort } from '../../scripts/services/free-port';
import { repoRoot, tsxCli } from '../../scripts/services/repo-paths';
import { startTestServices, testStorageRoot, type TestServices } from './test-services';
import './provided-context';

// Kept after the run (the run folder is not): the first place to look when a browser test fails.
const serverLog = path.join(testStorageRoot, 'e2e-server.log');

// Global setup of the `e2e` project: the real app as `npm start` runs it (built client, server
// with its job worker, demo data), on its own services and a random port.
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const services = await startTestServices({ label: 'e2e' });
  let server: RunningChild | undefined;
  const stop = async () => {
    await server?.stop();
    await services.stop();
  };
  try {
    const app = await startApp(services);
    server = app.server;
    project.provide('appUrl', app.appUrl);
    project.provide('inboxUrl', services.env.MAIL_INBOX_URL);
  } catch (error) {
    await stop();
    throw error;
  }
  return stop;
}

async function startApp(services: TestServices): Promise<{ server: RunningChild; appUrl: string }> {
  if (!existsSync(path.join(repoRoot, 'server', 'index.ts'))) throw new Error('server/index.ts is missing');
  const port = await freePort();
  const appUrl = `http://127.0.0.1:${port}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    ...services.env,
    PORT: String(port),
    APP_URL: appUrl,
    SESSION_SECRET: randomBytes(24).toString('hex'),
    // as `npm start` runs it: plain http on loopback
    NODE_ENV: 'development',
    RUN_WORKER_IN_PROCESS: 'true',
  };
  await ensureClientBuild({ env });
  await writeFile(serverLog, '');
  await seedDemoData({ env, logFile: serverLog });
  const server = startChild('server', process.execPath, [tsxCli, path.join('server', 'index.ts')], { env, logFile: serverLog });
  try {
    await waitForHealthy(`${appUrl}/api/health`, server);
  } catch (error) {
    await server.stop();
    throw new Error(`${error instanceof Error ? error.message : String(error)}; server output in ${serverLog}`);
  }
  return { server, appUrl };
}
