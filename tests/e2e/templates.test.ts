import sharp from 'sharp';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { OpenBrowser } from './support/browser';
import { openSignedIn } from './support/studio-steps';
import '../setup/provided-context';

// An editor enters their printer's own mug figures, watches the diagram follow, saves, and lays
// the printer's guide drawing over it.
const appUrl = inject('appUrl');

let browser: OpenBrowser;
let page: Page;

beforeAll(async () => {
  ({ browser, page } = await openSignedIn(appUrl, 'teodor@saltmarsh.test', { viewport: { width: 1440, height: 1000 } }));
});

afterAll(async () => {
  await browser?.close();
});

const diagramGuideHref = () => page.locator('figure svg image').first().getAttribute('href');

describe('a studio template from the printer\'s figures', () => {
  it('starts from a built-in mug, redraws the diagram as figures change, saves and takes a guide image', async () => {
    await page.goto(`${appUrl}/templates`);
    await page.getByRole('heading', { name: 'Built in' }).waitFor();
    const mugRow = page.getByRole('listitem').filter({ hasText: '11 oz' }).first();
    await mugRow.getByRole('link', { name: 'Start from this' }).click();
    await page.getByRole('form', { name: 'New template' }).waitFor();
    const diagram = page.getByRole('img').first();
    await page.getByLabel('Template name').fill('Harbour Press 11 oz mug');

    // 8.5 in trim + 2 × bleed at 300 DPI: the diagram's own caption names the file's width
    await page.getByLabel('Trim width (in)').fill('8.5');
    await page.getByLabel('Bleed on each side (in)').fill('0');
    await expect.poll(() => diagram.textContent()).toContain('2550 px');
    expect(await diagram.textContent()).toContain('8.5 in trim');
    // a figure that cannot work is named at the field, and the diagram keeps the last good one
    await page.getByLabel('Resolution (DPI)').fill('');
    await page.getByLabel('Resolution (DPI)').blur();
    await page.getByText('Showing the last figures that worked').waitFor();
    await page.getByLabel('Resolution (DPI)').fill('300');
    await browser.screenshot(page, 'template-form');

    await page.getByRole('button', { name: 'Save template' }).click();
    await page.waitForURL((u) => /\/templates\/[0-9a-f-]{36}$/.test(u.pathname));
    await page.getByRole('heading', { name: 'Harbour Press 11 oz mug' }).waitFor();

    const guide = await sharp({ create: { width: 1200, height: 500, channels: 4, background: { r: 30, g: 60, b: 200, alpha: 0.4 } } }).png().toBuffer();
    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('button', { name: 'Choose an image' }).click();
    await (await chooser).setFiles({ name: 'harbour-press-guide.png', mimeType: 'image/png', buffer: guide });
    await page.getByRole('img', { name: "The printer's guide image" }).waitFor();
    await page.getByText("Printer's guide (not printed)").waitFor();
    // the diagram lays the guide over the whole print file, served by the API as WebP
    const href = await diagramGuideHref();
    expect(href).toMatch(/^\/api\/templates\/[0-9a-f-]{36}\/guide-image\?v=/);
    const served = await page.request.get(`${appUrl}${href}`);
    expect(served.status()).toBe(200);
    expect(served.headers()['content-type']).toBe('image/webp');
    await browser.screenshot(page, 'template-with-guide');

    await page.goto(`${appUrl}/templates`);
    const ours = page.getByRole('region', { name: "Your studio's templates" });
    await expect.poll(() => ours.textContent()).toContain('Harbour Press 11 oz mug');
    await expect.poll(() => ours.textContent()).toContain("Printer's guide");
  });
});
