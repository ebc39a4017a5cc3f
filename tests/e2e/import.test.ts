import type { APIRequestContext, Page } from 'playwright-core';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { originalDetailSchema, uploadOriginalResponseSchema, type OriginalDetail } from '../../shared/contracts/originals';
import { openBrowser, type OpenBrowser } from './support/browser';
import { layeredCard, type ExpectedMotif } from './support/layered-card';
import { demoPassword, signIn } from './support/studio-steps';
import '../setup/provided-context';

// The originals issue's promise, as the demo editor sees it: a layered PSD goes in, a progress
// bar moves, and the motifs come out with the names, positions and pixels of the file.
const appUrl = inject('appUrl');

let browser: OpenBrowser;
let page: Page;

beforeAll(async () => {
  browser = await openBrowser();
  page = await browser.newPage();
  page.setDefaultTimeout(15_000);
  await signIn(page, appUrl, 'teodor@saltmarsh.test', demoPassword);
});

afterAll(async () => {
  await browser?.close();
});

describe('importing a layered PSD as the demo editor', () => {
  it('answers an upload with 202 and, once the import commits, lists one motif per group and loose layer', async () => {
    const card = layeredCard(1);
    // The browser's own session: the same cookie and CSRF token the page uses.
    const api = page.request;
    const token = await csrfToken(api);
    const upload = await api.post(`${appUrl}/api/originals`, {
      headers: { 'x-csrf-token': token },
      multipart: { cut: 'groups', file: { name: 'api-card.psd', mimeType: 'image/vnd.adobe.photoshop', buffer: card.psd } },
    });
    expect(upload.status()).toBe(202);
    const { id } = uploadOriginalResponseSchema.parse(await upload.json());

    const { original, seen } = await waitForImport(api, id);
    expect(original.status).toBe('ready');
    // Atomic for the user: while the job runs, the original shows no motifs.
    expect(seen.filter((s) => s.status !== 'ready').every((s) => s.motifCount === 0)).toBe(true);
    expect(seen.every((s) => s.percent >= 0 && s.percent <= 100)).toBe(true);
    expect(original.percent).toBe(100);
    await expectMotifsOfCard(api, original, card.motifs);
  });
});

type Seen = { status: string; phase: string; percent: number; motifCount: number };

async function csrfToken(api: APIRequestContext): Promise<string> {
  const response = await api.get(`${appUrl}/api/auth/csrf`);
  return ((await response.json()) as { csrfToken: string }).csrfToken;
}

async function waitForImport(api: APIRequestContext, id: string, timeoutMs = 30_000): Promise<{ original: OriginalDetail; seen: Seen[] }> {
  const seen: Seen[] = [];
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const response = await api.get(`${appUrl}/api/originals/${id}`);
    expect(response.status()).toBe(200);
    const original = originalDetailSchema.parse(await response.json());
    seen.push({ status: original.status, phase: original.phase, percent: original.percent, motifCount: original.motifs.length });
    if (original.status === 'ready' || original.status === 'failed') return { original, seen };
    if (Date.now() > deadline) throw new Error(`the import of ${id} did not finish in ${timeoutMs} ms: ${JSON.stringify(seen.at(-1))}`);
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
}

// Names, offsets and sizes come from the rectangles written into the PSD; the pixels are
// read back with sharp (libvips), a decoder apart from the one that wrote the PNG.
async function expectMotifsOfCard(api: APIRequestContext, original: OriginalDetail, expected: ExpectedMotif[]): Promise<void> {
  const byName = new Map(original.motifs.map((m) => [m.name, m]));
  expect([...byName.keys()].sort()).toEqual(expected.map((m) => m.name).sort());
  for (const want of expected) {
    const motif = byName.get(want.name);
    expect({ name: motif?.name, x: motif?.offsetX, y: motif?.offsetY, w: motif?.width, h: motif?.height }).toEqual({
      name: want.name,
      x: want.offsetX,
      y: want.offsetY,
      w: want.width,
      h: want.height,
    });
    const image = await api.get(`${appUrl}/api/motifs/${motif?.id}/image`);
    expect(image.status()).toBe(200);
    const { data, info } = await sharp(await image.body()).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
    expect([info.width, info.height]).toEqual([want.width, want.height]);
    expect([...data.subarray(0, 4)]).toEqual(want.colour);
  }
}
