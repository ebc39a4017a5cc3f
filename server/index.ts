import type { Server } from 'node:http';
import { createApp } from './app';
import { getConfig } from './config';
import { startImportWorkers } from './jobs/workers';
import { openRuntime } from './runtime';
import { featureRouters } from './features/feature-routers';

const config = getConfig();
const runtime = await openRuntime(config);
const app = createApp({ ...runtime, extraRouters: (shared) => featureRouters(runtime, shared) });
const stopWorkers = config.RUN_WORKER_IN_PROCESS ? await startImportWorkers(runtime) : async () => {};

const server: Server = app.listen(config.PORT, config.HOST, () => {
  console.log(`Motifold is listening on ${config.appUrl}`);
});

let closing = false;
async function shutDown(signal: string) {
  if (closing) return;
  closing = true;
  console.log(`\n${signal}: shutting down…`);
  const force = setTimeout(() => process.exit(1), 15_000);
  force.unref();
  server.close();
  server.closeAllConnections?.();
  await stopWorkers();
  await runtime.close();
  process.exit(0);
}
process.on('SIGINT', () => void shutDown('SIGINT'));
process.on('SIGTERM', () => void shutDown('SIGTERM'));
