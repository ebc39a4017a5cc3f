import { execFileSync } from 'node:child_process';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { mug11oz } from '../../shared/templates/built-in-mugs';
import { templatePixelSize } from '../../shared/templates/template-geometry';
import type { OpenBrowser } from './support/browser';
import { openSignedIn } from './support/studio-steps';
import '../setup/provided-context';

// An editor reads the mug's cautions on its page, makes its print file, and downloads a PNG
// that an independent reader (ImageMagick's `identify`) finds at the template's pixels and DPI.
const appUrl = inject('appUrl');

let browser: OpenBrowser;
let page: Page;

beforeAll(async () => {
  ({ browser, page } = await openSignedIn(appUrl, 'teodor@saltmarsh.test', { viewport: { width: 1440, height: 900 } }));
});

afterAll(async () => {
  await browser?.close();
});

describe('print files from a product page', () => {
  it('shows the cautions, makes the print file and downloads it at the right pixels and DPI', async () => {
    await page.goto(`${appUrl}/products`);
    await page.getByRole('link', { name: 'Puffin Picnic mug', exact: true }).first().click();
    await page.getByRole('heading', { name: 'Print files' }).waitFor();
    await expect(page.getByText(/^Hot drinks:/).isVisible()).resolves.toBe(true);
    await expect(page.getByText(/^Microwave:/).isVisible()).resolves.toBe(true);

    await page.getByRole('button', { name: 'Make the print file' }).click();
    const link = page.getByRole('link', { name: 'Download Print file (PNG)' });
    await link.waitFor({ timeout: 60_000 });
    const answer = await page.request.get(`${appUrl}${await link.getAttribute('href')}`);
    expect(answer.status()).toBe(200);
    const dir = await mkdtemp(path.join(os.tmpdir(), 'motifold-print-'));
    try {
      const file = path.join(dir, 'print-file.png');
      await writeFile(file, await answer.body());
      // ImageMagick (Debian's package), an independent PNG reader: size in pixels and resolution
      const facts = execFileSync('identify', ['-units', 'PixelsPerInch', '-format', '%w %h %x', file], { encoding: 'utf8' });
      const [width, height, dpi] = facts.trim().split(/\s+/).map(Number);
      const size = templatePixelSize(mug11oz); // 8.5 x 3.5 in at 300 DPI
      expect([width, height]).toEqual([size.width, size.height]);
      expect(Math.round(dpi)).toBe(mug11oz.dpi);
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });
});
