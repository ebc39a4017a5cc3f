import { fork } from 'node:child_process';
import { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { startFakeS3 } from '../services/fake-s3';

// The local fake storage in a process of its own, as `npm start` runs it (the web process and
// its worker never host it) and as a real bucket would be: its request handling then does not
// take turns with the import's own work on one event loop. It still shares this machine's CPUs.
const ENTRY = fileURLToPath(import.meta.url);
const TSX = pathToFileURL(createRequire(import.meta.url).resolve('tsx')).href;

export type StorageProcess = { endpoint: string; cpuMs(): Promise<number>; stop(): Promise<void> };

export async function startStorageProcess(directory: string, bucket: string): Promise<StorageProcess> {
  const child = fork(ENTRY, [directory, bucket], { execArgv: ['--import', TSX], stdio: ['ignore', 'ignore', 'inherit', 'ipc'] });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const ask = <T>(type: string) => new Promise<T>((resolve, reject) => {
    const onMessage = (message: { type: string; value: T }) => {
      if (message.type !== type) return;
      child.off('message', onMessage);
      resolve(message.value);
    };
    child.on('message', onMessage);
    void exited.then(() => reject(new Error('the bench storage process ended')));
    if (type !== 'endpoint') child.send({ type });
  });
  const endpoint = await ask<string>('endpoint');
  return {
    endpoint,
    cpuMs: () => ask<number>('cpu'),
    async stop() {
      child.kill('SIGTERM');
      await exited;
    },
  };
}

if (process.argv[1] && path.resolve(process.argv[1]) === ENTRY && process.send) {
  const [directory, bucket] = process.argv.slice(2);
  const s3 = await startFakeS3({ directory, port: 0, bucket });
  process.on('message', (message: { type: string }) => {
    if (message.type !== 'cpu') return;
    const cpu = process.cpuUsage();
    process.send!({ type: 'cpu', value: Math.round((cpu.user + cpu.system) / 1000) });
  });
  process.once('SIGTERM', () => void s3.stop().finally(() => process.exit(0)));
  process.once('disconnect', () => void s3.stop().finally(() => process.exit(0)));
  process.send({ type: 'endpoint', value: s3.endpoint });
}
