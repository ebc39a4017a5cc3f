import type { ApiClient } from './test-app';

export async function waitForImport(client: ApiClient, originalId: string, timeoutMs = 30_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await client.get(`/api/originals/${originalId}`);
    if (res.status !== 200) throw new Error(`original ${originalId}: ${res.status} ${JSON.stringify(res.body)}`);
    if (res.body.status === 'ready' || res.body.status === 'failed') return res.body;
    if (Date.now() > deadline) throw new Error(`import of ${originalId} still ${res.body.status} (${res.body.phase} ${res.body.percent}%)`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

export async function waitForExport(client: ApiClient, id: string, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await client.get(`/api/exports/${id}`).expect(200);
    if (res.body.status === 'done' || res.body.status === 'failed') return res.body;
    if (Date.now() > deadline) throw new Error(`export ${id} still ${res.body.status} (${res.body.progress})`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

/** A binary answer (PNG, ZIP) read whole into a Buffer as its body. */
export const asBuffer = (req: ReturnType<ApiClient['get']>) =>
  req.buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });
