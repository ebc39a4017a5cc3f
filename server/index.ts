import type { Server } from 'node:http';
import { createApp } from './app';
import { getConfig } from './config';
import { createEarlyUnpacks } from './features/originals/early-unpacks';
import { runUnpack } from './features/originals/unpack/run-unpack';
import { startImportWorkers } from './jobs/workers';
import { openRuntime } from './runtime';
import { featureRouters } from './features/feature-routers';

const config = getConfig();
const runtime = await openRuntime(config);
// With the worker in this process, an upload starts unpacking while it is being stored.
const earlyUnpacks = config.RUN_WORKER_IN_PROCESS ? createEarlyUnpacks({ runUnpack, maxRunning: config.IMPORT_CONCURRENCY }) : undefined;
const app = createApp({ ...runtime, extraRouters: (shared) => featureRouters(runtime, shared, { earlyUnpacks, warmLibrariesOnStart: true }) });
const stopWorkers = config.RUN_WORKER_IN_PROCESS ? await startImportWorkers(runtime, { earlyUnpacks }) : async () => {};

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
  await earlyUnpacks?.close();
  await runtime.close();
  process.exit(0);
}
process.on('SIGINT', () => void shutDown('SIGINT'));
process.on('SIGTERM', () => void shutDown('SIGTERM'));
