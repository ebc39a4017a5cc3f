import { createServer, type Socket } from 'node:net';
import { afterEach, describe, expect, it } from 'vitest';
import { createS3Client, createStorage } from './storage';

// A storage that takes the connection and then never answers: the request must fail in bounded
// time (after the SDK's own retries) instead of holding its job or page.
const sockets: Socket[] = [];
let close = async () => {};
afterEach(async () => {
  for (const s of sockets.splice(0)) s.destroy();
  await close();
});

describe('object storage timeouts', () => {
  it('gives up on a storage that accepts the request and never answers', async () => {
    const server = createServer((socket) => {
      sockets.push(socket);
      socket.on('data', () => {}); // read the request, say nothing
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    close = () => new Promise<void>((resolve) => server.close(() => resolve()));
    const { port } = server.address() as { port: number };
    const client = createS3Client(
      { S3_ENDPOINT: `http://127.0.0.1:${port}`, S3_REGION: 'us-east-1', S3_ACCESS_KEY_ID: 'k', S3_SECRET_ACCESS_KEY: 's', S3_FORCE_PATH_STYLE: true },
      { connectionTimeoutMs: 500, idleTimeoutMs: 300 },
    );
    const storage = createStorage(client, 'silent');
    const started = performance.now();
    await expect(storage.put('k', Buffer.from('motif'), 'image/png')).rejects.toThrow();
    // three attempts of 0.3 s each plus the SDK's back-off between them
    expect(performance.now() - started).toBeLessThan(10_000);
    client.destroy();
  }, 20_000);
});
