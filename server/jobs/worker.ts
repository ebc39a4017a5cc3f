import { getConfig } from '../config';
import { openRuntime } from '../runtime';
import { startImportWorkers } from './workers';

// `npm run worker`: a process that only runs jobs; start as many as the machines allow.
const runtime = await openRuntime(getConfig());
const stop = await startImportWorkers(runtime);
console.log(`Motifold worker running ${runtime.config.IMPORT_CONCURRENCY} import slot(s).`);

async function shutDown() {
  await stop();
  await runtime.close();
  process.exit(0);
}
process.on('SIGINT', () => void shutDown());
process.on('SIGTERM', () => void shutDown());
