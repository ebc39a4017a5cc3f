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
  const steps = new StepClock();
  const services = await startTestServices({ label: 'e2e' });
  steps.done('services');
  let server: RunningChild | undefined;
  const stop = async () => {
    await server?.stop();
    await services.stop();
  };
  try {
    const app = await startApp(services, steps);
    server = app.server;
    project.provide('appUrl', app.appUrl);
    project.provide('inboxUrl', services.env.MAIL_INBOX_URL);
    console.log(`e2e app ready at ${app.appUrl}: ${steps.summary()}`);
  } catch (error) {
    await stop();
    throw error;
  }
  return stop;
}

async function startApp(services: TestServices, steps: StepClock): Promise<{ server: RunningChild; appUrl: string }> {
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
  const built = await ensureClientBuild({ env });
  steps.done(built ? 'client build' : 'client build (current)');
  await writeFile(serverLog, '');
  await seedDemoData({ env, logFile: serverLog });
  steps.done('demo data');
  const server = startChild('server', process.execPath, [tsxCli, path.join('server', 'index.ts')], { env, logFile: serverLog });
  try {
    await waitForHealthy(`${appUrl}/api/health`, server);
    steps.done('server');
  } catch (error) {
    await server.stop();
    throw new Error(`${error instanceof Error ? error.message : String(error)}; server output in ${serverLog}`);
  }
  return { server, appUrl };
}

class StepClock {
  private last = performance.now();
  private readonly started = this.last;
  private readonly steps: string[] = [];

  done(step: string): void {
    const now = performance.now();
    this.steps.push(`${step} ${((now - this.last) / 1000).toFixed(1)} s`);
    this.last = now;
  }

  summary(): string {
    return `${((performance.now() - this.started) / 1000).toFixed(1)} s (${this.steps.join(', ')})`;
  }
}
