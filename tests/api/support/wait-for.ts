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
