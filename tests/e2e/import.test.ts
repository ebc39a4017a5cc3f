import type { APIRequestContext, Page } from 'playwright-core';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { originalDetailSchema, uploadOriginalResponseSchema, type OriginalDetail } from '../../shared/contracts/originals';
import type { OpenBrowser } from './support/browser';
import { layeredCard, type ExpectedMotif } from './support/layered-card';
import { openSignedIn } from './support/studio-steps';
import '../setup/provided-context';

// The originals issue's promise, as the demo editor sees it: a layered PSD goes in, a progress
// bar moves, and the motifs come out with the names, positions and pixels of the file.
const appUrl = inject('appUrl');

let browser: OpenBrowser;
let page: Page;

beforeAll(async () => {
  ({ browser, page } = await openSignedIn(appUrl, 'teodor@saltmarsh.test'));
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
    const history = `states seen: ${JSON.stringify(seen)}`;
    expect(original.status, history).toBe('ready');
    // Atomic for the user: while the job runs, the original shows no motifs.
    expect(seen.filter((s) => s.status !== 'ready' && s.motifCount > 0), history).toEqual([]);
    expect(seen.filter((s) => s.percent < 0 || s.percent > 100), history).toEqual([]);
    await expectMotifsOfCard(api, original, card.motifs);
    // Once ready it stays done: no progress report of the finished job may land afterwards.
    await new Promise((resolve) => setTimeout(resolve, 600));
    const later = originalDetailSchema.parse(await (await api.get(`${appUrl}/api/originals/${id}`)).json());
    expect({ status: later.status, phase: later.phase, percent: later.percent }, history).toEqual({ status: 'ready', phase: 'done', percent: 100 });
  });

  it('takes a dropped file, uploads it with a progress bar, follows the import and shows the motifs', async () => {
    const card = layeredCard(2, 4);
    const fileName = 'Spring card 2.psd';
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Originals' }).click();
    await page.getByRole('heading', { level: 1, name: 'Originals' }).waitFor();
    await page.getByRole('heading', { name: 'Add an original' }).waitFor();

    // Dragging a file over the zone, then dropping it, as a browser does.
    const zone = page.getByTestId('drop-zone');
    const dataTransfer = await page.evaluateHandle(
      ({ base64, name }) => {
        const bytes = Uint8Array.from(atob(base64), (c) => c.charCodeAt(0));
        const transfer = new DataTransfer();
        transfer.items.add(new File([bytes], name, { type: 'image/vnd.adobe.photoshop' }));
        return transfer;
      },
      { base64: card.psd.toString('base64'), name: fileName },
    );
    await zone.dispatchEvent('dragenter', { dataTransfer });
    await page.getByText('Let go to add this file').waitFor();
    await browser.screenshot(page, 'import-01-dragging-over');
    await zone.dispatchEvent('drop', { dataTransfer });
    await page.getByText(fileName, { exact: true }).waitFor();
    expect(await page.getByRole('radio', { name: /One motif per layer group/ }).isChecked()).toBe(true);

    // The same file again through the button and the browser's file chooser.
    await page.getByRole('button', { name: 'Choose another file' }).click();
    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('button', { name: 'Choose a file…' }).click();
    await (await chooser).setFiles({ name: fileName, mimeType: 'image/vnd.adobe.photoshop', buffer: card.psd });
    await page.getByText(fileName, { exact: true }).waitFor();
    await browser.screenshot(page, 'import-02-file-chosen');

    await recordProgressBars(page);
    await page.getByRole('button', { name: 'Upload and import' }).click();
    const imports = page.getByRole('region', { name: 'Imports started here' });
    // Best effort: a small import may be over before the bar can be photographed.
    const importBar = imports.getByRole('progressbar');
    if (await importBar.first().waitFor({ timeout: 5_000 }).then(() => true, () => false)) {
      await browser.screenshot(page, 'import-02b-importing').catch(() => undefined);
    }
    const done = imports.getByRole('status').filter({ hasText: `${fileName} is imported` });
    await done.waitFor({ timeout: 30_000 });
    expect(await done.innerText()).toContain(`${card.motifs.length} motifs are in the library now.`);
    await browser.screenshot(page, 'import-03-imported');

    const bars = await progressBarsSeen(page);
    expect(bars.some((bar) => bar.label.startsWith(`Uploading ${fileName}`) || bar.label.startsWith('Sent;'))).toBe(true);
    // The import's own bar names its phase (the words of import-words.ts).
    expect(bars.some((bar) => bar.label.startsWith(`${fileName} ·`))).toBe(true);
    expect(bars.every((bar) => bar.value === null || (Number(bar.value) >= 0 && Number(bar.value) <= 100))).toBe(true);

    // The list of all originals has it, ready, with its motif count.
    const row = page.getByRole('row').filter({ has: page.getByRole('link', { name: fileName, exact: true }) });
    await row.filter({ hasText: 'Ready' }).waitFor();
    expect(await row.innerText()).toContain(String(card.motifs.length));

    await done.getByRole('link', { name: 'See its motifs and import report' }).click();
    await page.waitForURL((url) => url.pathname.startsWith('/originals/'));
    await page.getByRole('heading', { level: 1, name: fileName }).waitFor();
    await page.getByRole('heading', { name: 'Motifs', exact: true }).waitFor();
    for (const motif of card.motifs) {
      await page.getByText(motif.name, { exact: true }).first().waitFor();
    }
    // A layer name with markup is shown as the text it is, never as markup.
    expect(await page.locator('i', { hasText: 'band' }).count()).toBe(0);
    await expectThumbnailsLoaded(page, card.motifs.length);
    await browser.screenshot(page, 'import-04-original-motifs');
  });

  it('refuses a file that is not an original before sending any byte', async () => {
    await page.goto(`${appUrl}/originals`);
    await page.getByRole('heading', { name: 'Add an original' }).waitFor();
    const uploads: string[] = [];
    page.on('request', (request) => {
      if (request.method() === 'POST' && new URL(request.url()).pathname === '/api/originals') uploads.push(request.url());
    });
    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('button', { name: 'Choose a file…' }).click();
    await (await chooser).setFiles({ name: 'notes.txt', mimeType: 'text/plain', buffer: Buffer.from('not a picture') });
    const problem = page.getByTestId('drop-zone').getByRole('alert');
    await problem.waitFor();
    expect(await problem.innerText()).toContain('notes.txt');
    expect(await page.getByRole('button', { name: 'Upload and import' }).count()).toBe(0);
    expect(uploads).toEqual([]);
    await browser.screenshot(page, 'import-05-not-an-original');
  });
});

type ProgressBarSeen = { label: string; value: string | null };

// Every state of every progress bar, kept in the page: a small import can pass in a blink.
async function recordProgressBars(page: Page): Promise<void> {
  await page.evaluate(() => {
    const seen: { label: string; value: string | null }[] = [];
    Object.assign(window, { progressBarsSeen: seen });
    const record = () => {
      for (const bar of document.querySelectorAll('[role="progressbar"]')) {
        const labelId = bar.getAttribute('aria-labelledby');
        const label = (labelId && document.getElementById(labelId)?.textContent) || '';
        const value = bar.getAttribute('aria-valuenow');
        if (!seen.some((s) => s.label === label && s.value === value)) seen.push({ label, value });
      }
    };
    new MutationObserver(record).observe(document.body, { subtree: true, childList: true, attributes: true, characterData: true });
  });
}

async function progressBarsSeen(page: Page): Promise<ProgressBarSeen[]> {
  return page.evaluate(() => (window as unknown as { progressBarsSeen: { label: string; value: string | null }[] }).progressBarsSeen);
}

async function expectThumbnailsLoaded(page: Page, count: number): Promise<void> {
  const thumbnails = page.locator('main img');
  await page.waitForFunction(
    (n) => [...document.querySelectorAll('main img')].filter((img) => (img as HTMLImageElement).naturalWidth > 0).length >= n,
    count,
  );
  expect(await thumbnails.count()).toBeGreaterThanOrEqual(count);
}

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
