import sharp from 'sharp';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { productDetailSchema } from '../../shared/contracts/products';
import { mug11oz } from '../../shared/templates';
import type { OpenBrowser } from './support/browser';
import { openSignedIn } from './support/studio-steps';
import '../setup/provided-context';

// The editor's printer's guide overlay, text on a curve, and two-finger zoom on a touch screen.
const appUrl = inject('appUrl');

let browser: OpenBrowser;
let page: Page;
let guidedProductId: string;

const csrf = async () => ((await (await page.request.get(`${appUrl}/api/auth/csrf`)).json()) as { csrfToken: string }).csrfToken;

beforeAll(async () => {
  ({ browser, page } = await openSignedIn(appUrl, 'teodor@saltmarsh.test', { viewport: { width: 1440, height: 900 }, timeout: 20_000 }));
  // a studio template with the printer's guide: a solid plum sheet, half the file's size, so
  // the canvas must stretch it to the whole file
  const token = await csrf();
  const made = await page.request.post(`${appUrl}/api/templates`, { headers: { 'x-csrf-token': token }, data: { template: { ...mug11oz, name: 'Harbour Press guided mug' } } });
  expect(made.status()).toBe(201);
  const templateId = ((await made.json()) as { id: string }).id;
  const guide = await sharp({ create: { width: 1275, height: 525, channels: 4, background: { r: 200, g: 0, b: 120, alpha: 1 } } }).png().toBuffer();
  const put = await page.request.put(`${appUrl}/api/templates/${templateId}/guide-image`, { headers: { 'x-csrf-token': token }, multipart: { file: { name: 'harbour-guide.png', mimeType: 'image/png', buffer: guide } } });
  expect(put.status()).toBe(200);
  const created = await page.request.post(`${appUrl}/api/products`, { headers: { 'x-csrf-token': token }, data: { name: 'Guided mug', templateId } });
  guidedProductId = productDetailSchema.parse(await created.json()).id;
});

afterAll(async () => {
  await browser?.close();
});

/** The canvas's device pixel at a fraction of its width and height. */
async function canvasPixel(fx: number, fy: number): Promise<number[]> {
  return page.getByTestId('editor-canvas').evaluate((c: HTMLCanvasElement, [x, y]) => {
    const data = c.getContext('2d')!.getImageData(Math.round(c.width * x), Math.round(c.height * y), 1, 1).data;
    return [data[0], data[1], data[2]];
  }, [fx, fy] as const);
}

const guidesMenu = () => page.getByRole('toolbar', { name: 'Editing' }).locator('details');

describe('the printer’s guide over the canvas', () => {
  it('lays the guide half see-through over the file, toggles it with the guides, and leaves it out of the print view', async () => {
    await page.goto(`${appUrl}/products/${guidedProductId}/layout`);
    await page.getByTestId('editor-canvas').waitFor();
    await guidesMenu().locator('summary').click();
    const toggle = page.getByRole('checkbox', { name: 'Printer’s guide image' });
    await toggle.waitFor();
    expect(await toggle.isChecked()).toBe(true);
    // a quarter of the way along the fitted wrap, clear of every guide line: plum at 50 % over the
    // white blank is about (228, 128, 188) (source-over alpha blending, W3C Compositing §5.1)
    await expect.poll(async () => (await canvasPixel(0.3, 0.5))[1], { timeout: 10_000 }).toBeLessThan(170);
    const on = await canvasPixel(0.3, 0.5);
    expect(on[0]).toBeGreaterThan(on[1] + 60);
    await browser.screenshot(page, 'editor-guide-image');

    // keyboard: the toggle is a plain checkbox in the guides list
    await toggle.focus();
    await page.keyboard.press('Space');
    expect(await toggle.isChecked()).toBe(false);
    await expect.poll(async () => (await canvasPixel(0.3, 0.5))[1]).toBeGreaterThan(220);
    await page.keyboard.press('Space');
    await expect.poll(async () => (await canvasPixel(0.3, 0.5))[1]).toBeLessThan(170);
    await guidesMenu().locator('summary').click();

    // the print simulation shows only what would print: no guide there
    await page.getByLabel('As printed').check();
    await page.getByTestId('soft-proof-notice').getByText(/A simulation of/).waitFor({ timeout: 30_000 });
    await expect.poll(async () => (await canvasPixel(0.3, 0.5))[1], { timeout: 10_000 }).toBeGreaterThan(200);
    await page.getByLabel('As printed').uncheck();
  });

  it('offers no guide toggle on a template without one', async () => {
    const token = await csrf();
    const created = await page.request.post(`${appUrl}/api/products`, { headers: { 'x-csrf-token': token }, data: { name: 'Plain mug', templateId: 'mug-11oz' } });
    const id = productDetailSchema.parse(await created.json()).id;
    await page.goto(`${appUrl}/products/${id}/layout`);
    await page.getByTestId('editor-canvas').waitFor();
    await guidesMenu().locator('summary').click();
    await page.getByRole('checkbox', { name: 'Safe area' }).waitFor();
    expect(await page.getByRole('checkbox', { name: 'Printer’s guide image' }).count()).toBe(0);
  });
});

describe('text on a curve', () => {
  it('bends the text from the inspector, grows its box by the bend, and undoes a key step at a time', async () => {
    await page.goto(`${appUrl}/products/${guidedProductId}/layout`);
    await page.getByTestId('editor-canvas').waitFor();
    await page.getByRole('button', { name: 'Add text' }).click();
    const curve = page.getByLabel('Curve', { exact: true });
    await curve.waitFor();
    expect(await curve.inputValue()).toBe('0');
    // the size line under Width: "W × H px · …"
    const height = async () => Number((await page.getByRole('complementary', { name: 'Selection' }).getByText(/^\d+ × \d+ px/).textContent())!.match(/× (\d+) px/)![1]);
    const straight = await height();
    await curve.fill('120');
    await curve.press('Enter');
    await expect.poll(height).toBeGreaterThan(straight);

    const slider = page.getByRole('slider', { name: 'Curve in degrees' });
    await slider.focus();
    await page.keyboard.press('ArrowRight');
    await expect.poll(() => curve.inputValue()).toBe('125');
    expect(await slider.getAttribute('aria-valuetext')).toBe('125 degrees, bowed upwards');
    await browser.screenshot(page, 'editor-text-on-a-curve');
    await page.getByTestId('editor-canvas').focus();
    await page.keyboard.press('Control+z');
    await expect.poll(() => curve.inputValue()).toBe('120');

    await page.getByRole('button', { name: 'Straight' }).click();
    await expect.poll(() => curve.inputValue()).toBe('0');
    await expect.poll(height).toBeCloseTo(straight, 1);
  });
});

describe('two fingers on a touch screen', () => {
  it('zooms about the fingers’ midpoint as they spread', async () => {
    await page.goto(`${appUrl}/products/${guidedProductId}/layout`);
    const canvas = page.getByTestId('editor-canvas');
    await canvas.waitFor();
    const zoomText = () => page.getByLabel('Zoom', { exact: true }).textContent();
    await expect.poll(zoomText).toMatch(/\d+ %/);
    const before = Number((await zoomText())!.replace(/\D/g, ''));
    const box = (await canvas.boundingBox())!;
    const mid = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
    const cdp = await page.context().newCDPSession(page);
    await cdp.send('Emulation.setTouchEmulationEnabled', { enabled: true, maxTouchPoints: 2 });
    const touch = (type: 'touchStart' | 'touchMove' | 'touchEnd', spread: number) => cdp.send('Input.dispatchTouchEvent', {
      type,
      touchPoints: type === 'touchEnd' ? [] : [{ x: mid.x - spread, y: mid.y, id: 1 }, { x: mid.x + spread, y: mid.y, id: 2 }],
    });
    await touch('touchStart', 50);
    for (let s = 60; s <= 100; s += 10) await touch('touchMove', s);
    await touch('touchEnd', 100);
    // the fingers spread from 100 to 200 px apart: twice the zoom (rounded to whole per cent)
    await expect.poll(async () => Number((await zoomText())!.replace(/\D/g, ''))).toBeGreaterThanOrEqual(2 * before - 1);
    expect(Number((await zoomText())!.replace(/\D/g, ''))).toBeLessThanOrEqual(2 * before + 1);
    await cdp.detach();
  });
});
