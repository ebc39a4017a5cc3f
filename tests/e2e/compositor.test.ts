import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { productDetailSchema } from '../../shared/contracts/products';
import type { OpenBrowser } from './support/browser';
import { openSignedIn } from './support/studio-steps';
import '../setup/provided-context';

// The compositor issue's walk-through: three Puffin Picnic motifs on an 11 oz mug wrap, one
// dragged and the drag undone, one recoloured, and after a reload the layout is as saved.
const appUrl = inject('appUrl');

let browser: OpenBrowser;
let page: Page;

beforeAll(async () => {
  ({ browser, page } = await openSignedIn(appUrl, 'ines@saltmarsh.test', { viewport: { width: 1440, height: 900 } }));
});

afterAll(async () => {
  await browser?.close();
});

const across = () => page.getByLabel('Across').inputValue();
// The inspector shows a click, drag or undo on its next render: the value once two reads agree.
async function settledAcross(): Promise<string> {
  let last = await across();
  for (let i = 0; i < 20; i++) {
    await page.waitForTimeout(150);
    const now = await across();
    if (now === last) return now;
    last = now;
  }
  return last;
}
const saved = () => page.getByTestId('save-status').filter({ hasText: /^Saved · revision \d+$/ }).waitFor({ timeout: 10_000 });

describe('composing a mug wrap from the card’s motifs', () => {
  it('places, drags, undoes and recolours, and finds the layout saved after a reload', async () => {
    await page.goto(`${appUrl}/products`);
    const form = page.getByRole('form', { name: 'New product' });
    await form.getByLabel('Name').fill('Coastal Spring mug');
    await form.getByLabel('Template').selectOption('mug-11oz');
    await form.getByRole('button', { name: 'Start a product' }).click();
    // a new product opens on its layout
    await page.waitForURL((u) => /\/products\/[^/]+\/layout$/.test(u.pathname));
    const productId = new URL(page.url()).pathname.split('/').at(-2)!;
    const canvas = page.getByTestId('editor-canvas');
    await canvas.waitFor();
    const box = (await canvas.boundingBox())!;
    const tray = page.getByRole('list', { name: 'Motifs to place' }).getByRole('button');

    // Each puffin found by its full name and dragged once it leads the settled results: while a
    // search is on its way the tray still shows the previous list, which may reorder under the pointer.
    const placeFound = async (name: string, at: { x: number; y: number }) => {
      await page.getByLabel('Find motifs').fill(name);
      await tray.first().filter({ hasText: name }).waitFor();
      await tray.first().dragTo(canvas, { targetPosition: at });
    };
    await placeFound('Puffin Red Jumper', { x: box.width * 0.3, y: box.height * 0.5 });
    await placeFound('Puffin Teal Jumper', { x: box.width * 0.7, y: box.height * 0.5 });
    await page.getByLabel('Find motifs').fill('sandwich');
    await tray.filter({ hasText: 'Sandwich' }).first().focus();
    await page.keyboard.press('Enter');
    await saved();

    // Select the left puffin, note where it is, drag it, and undo the drag. The canvas may have
    // moved on the page since the drops (panels around it fill in as their data arrives), so its
    // box is read again; the puffin stays at the same place on the canvas.
    const moved = (await canvas.boundingBox())!;
    const left = { x: moved.x + box.width * 0.3, y: moved.y + box.height * 0.5 };
    await page.mouse.click(left.x, left.y);
    const before = await settledAcross();
    await page.mouse.move(left.x, left.y);
    await page.mouse.down();
    for (let i = 1; i <= 8; i++) await page.mouse.move(left.x + i * 10, left.y + i * 3);
    await page.mouse.up();
    await expect.poll(across).not.toBe(before);
    await page.keyboard.press('Control+z');
    await expect.poll(across).toBe(before);

    // Recolour the right-hand puffin.
    await page.mouse.click(box.x + box.width * 0.7, box.y + box.height * 0.5);
    await page.getByLabel('Recolour').selectOption('hue');
    await saved();
    await browser.screenshot(page, 'compositor-mug-wrap');

    await page.reload();
    await canvas.waitFor();
    await saved();
    const product = productDetailSchema.parse(await (await page.request.get(`${appUrl}/api/products/${productId}`)).json());
    const placements = product.layout.placements;
    expect(placements).toHaveLength(3);
    const recoloured = placements.filter((p) => p.type !== 'text' && p.recolour.kind === 'hue');
    expect(recoloured).toHaveLength(1);
    await page.mouse.click(left.x, left.y);
    await expect.poll(across).toBe(before);
    // the save recorded which motifs (and versions) the product uses
    expect(product.motifs.map((m) => m.name).sort()).toEqual(['Puffin Red Jumper', 'Puffin Teal Jumper', 'Sandwiches']);
  });
});
