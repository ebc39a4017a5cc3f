import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { motifListResponseSchema } from '../../shared/contracts/motifs';
import { productDetailSchema } from '../../shared/contracts/products';
import { createMotifPlacement } from '../../shared/scene';
import type { OpenBrowser } from './support/browser';
import { openSignedIn } from './support/studio-steps';
import '../setup/provided-context';

// Issue 6 in the editor: the print check beside the canvas follows the layout live, a finding
// selects its placement, and "As printed" shows the soft proof with its printing condition named.
const appUrl = inject('appUrl');

let browser: OpenBrowser;
let page: Page;
let productId: string;

beforeAll(async () => {
  ({ browser, page } = await openSignedIn(appUrl, 'ines@saltmarsh.test', { viewport: { width: 1440, height: 900 }, timeout: 20_000 }));
  const api = page.request;
  const csrf = ((await (await api.get(`${appUrl}/api/auth/csrf`)).json()) as { csrfToken: string }).csrfToken;
  const list = motifListResponseSchema.parse(await (await api.get(`${appUrl}/api/motifs?limit=500`)).json());
  const kite = list.motifs.find((m) => m.name === 'Kite' && /puffin/i.test(m.originalName))!;
  const created = productDetailSchema.parse(await (await api.post(`${appUrl}/api/products`, { data: { name: 'Print check mug', templateId: 'mug-11oz' }, headers: { 'x-csrf-token': csrf } })).json());
  productId = created.id;
  // enlarged 2.5 times: 120 PPI on a 300 DPI wrap, a problem
  const blurry = createMotifPlacement({ id: 'blurry-kite', motifId: kite.id, version: kite.version, naturalWidth: kite.width, naturalHeight: kite.height, x: 1275, y: 525, scale: 2.5 });
  const res = await api.patch(`${appUrl}/api/products/${productId}`, { data: { revision: created.revision, layout: { ...created.layout, placements: [blurry] } }, headers: { 'x-csrf-token': csrf } });
  expect(res.status()).toBe(200);
});

afterAll(async () => {
  await browser?.close();
});

describe('the print check in the editor', () => {
  it('lists findings live, selects a placement from one, and clears it once fixed', async () => {
    await page.goto(`${appUrl}/products/${productId}/layout`);
    const panel = page.getByTestId('preflight-panel');
    const findings = panel.getByRole('list', { name: 'Findings to look at' });
    const blurry = findings.getByRole('button', { name: /^Problem: .*PPI/ });
    await blurry.waitFor();
    // the server's facts arrive after the first render: its colour checks are then counted too
    await panel.getByText(/as of the last save/).waitFor();
    await browser.screenshot(page, 'editor-print-check');

    // keyboard: focus the finding and press Enter; the inspector shows the placement
    await blurry.focus();
    await page.keyboard.press('Enter');
    await expect.poll(() => blurry.getAttribute('aria-pressed')).toBe('true');
    await page.getByTestId('effective-ppi').filter({ hasText: /Prints at 120 PPI/ }).waitFor();

    // fixing it in the inspector clears the problem without waiting for the server
    await page.getByLabel('Scale').fill('100');
    await page.getByLabel('Scale').press('Enter');
    await blurry.waitFor({ state: 'detached', timeout: 5_000 });
  });

  it('shows the design as it would print, naming the printing condition', async () => {
    const canvas = page.getByTestId('editor-canvas');
    const before = await canvas.screenshot();
    await page.getByLabel('As printed').check();
    const notice = page.getByTestId('soft-proof-notice');
    await notice.getByText(/A simulation of ISO Coated v2 300% \(FOGRA39/).waitFor({ timeout: 30_000 });
    await expect.poll(async () => Buffer.compare(await canvas.screenshot(), before) !== 0, { timeout: 10_000 }).toBe(true);
    await browser.screenshot(page, 'editor-as-printed');
    await page.getByLabel('As printed').uncheck();
    await notice.waitFor({ state: 'detached' });
  });

  it('shows the layout on the mug from four sides, in the blank colour picked', async () => {
    const preview = page.getByTestId('wrap-preview');
    for (const side of ['front', 'handle right', 'back', 'handle left']) await preview.getByRole('img', { name: `The mug seen from the ${side} side` }).waitFor();
    // a pixel near the middle of the front picture's body, away from the kite at the centre, and
    // how many of the picture's pixels are the kite's colours rather than the blank's
    const sample = (side: string) => page.evaluate((label) => {
      const canvas = document.querySelector<HTMLCanvasElement>(`[data-testid="wrap-preview"] canvas[aria-label="${label}"]`)!;
      const { data, width, height } = canvas.getContext('2d')!.getImageData(0, 0, canvas.width, canvas.height);
      const at = (x: number, y: number) => [...data.subarray((y * width + x) * 4, (y * width + x) * 4 + 4)];
      let coloured = 0;
      for (let i = 0; i < data.length; i += 4) if (data[i + 3] === 255 && Math.abs(data[i] - data[i + 2]) > 40) coloured++;
      return { body: at(Math.round(width / 2), Math.round(height * 0.6)), coloured };
    }, `The mug seen from the ${side} side`);
    // the kite faces the viewer on the front; the back shows the bare blank
    await expect.poll(async () => (await sample('front')).coloured, { timeout: 10_000 }).toBeGreaterThan(20);
    expect((await sample('back')).body[0]).toBeGreaterThan(200);
    await preview.getByLabel('Blank colour').selectOption({ label: 'Heat-changing, cold' });
    // the cold heat-changing blank is near black (#1c1c1f), shaded
    await expect.poll(async () => (await sample('back')).body[0], { timeout: 5_000 }).toBeLessThan(40);
    await browser.screenshot(page, 'editor-on-the-mug');
  });
});
