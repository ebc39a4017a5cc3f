import sharp from 'sharp';
import type { Page } from 'playwright-core';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, type OpenBrowser } from './support/browser';
import { demoPassword, linkFromInbox, signIn, signOut } from './support/studio-steps';
import '../setup/provided-context';

// The demo studio's mug through the end of its life before launch: June (reviewer) pins a
// comment on its preview, Teodor (editor) gets the mail, resolves the comment, records a sample
// with a photo, approves it and moves the mug to ready, and the calendar stops flagging it.
const appUrl = inject('appUrl');
const inboxUrl = inject('inboxUrl');

const june = { name: 'June Abara', email: 'june@saltmarsh.test' };
const teodor = { name: 'Teodor Vance', email: 'teodor@saltmarsh.test' };
const mug = 'Puffin Picnic mug';
const comment = `The navy handle will hide the kite string on the left; worth a look on the sample (${Date.now().toString(36)})`;

let browser: OpenBrowser;
let page: Page;
let photoDir: string;

beforeAll(async () => {
  browser = await openBrowser({ viewport: { width: 1440, height: 900 } });
  page = await browser.newPage();
  page.setDefaultTimeout(30_000);
  photoDir = await mkdtemp(path.join(os.tmpdir(), 'motifold-sample-photo-'));
});

afterAll(async () => {
  await browser?.close();
  if (photoDir) await rm(photoDir, { recursive: true, force: true });
});

async function openMug(): Promise<void> {
  await page.goto(`${appUrl}/products`);
  await page.getByRole('link', { name: mug, exact: true }).first().click();
  await page.getByRole('heading', { level: 1, name: mug }).waitFor();
}

const calendarEntry = () => page.getByRole('region', { name: 'Coastal Spring' }).locator('dd').filter({ has: page.getByRole('link', { name: mug, exact: true }) });

// A phone-sized photo of our own: a white mug shape on a wooden-brown table.
async function samplePhoto(): Promise<string> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="1500" height="2000"><rect width="100%" height="100%" fill="#a8794b"/>
    <rect x="450" y="600" width="600" height="700" rx="40" fill="#fbfaf7"/><path d="M1050,780 C1250,780 1250,1120 1050,1120" stroke="#2e5e8c" stroke-width="60" fill="none"/></svg>`;
  const file = path.join(photoDir, 'IMG_5120.jpg');
  await writeFile(file, await sharp(Buffer.from(svg)).jpeg({ quality: 85 }).toBuffer());
  return file;
}

describe('the demo mug from review to ready', () => {
  it('is flagged late on the calendar while it is still in sampling', async () => {
    await signIn(page, appUrl, june.email, demoPassword);
    await page.goto(`${appUrl}/calendar`);
    await calendarEntry().getByText(/Late:/).waitFor();
    await browser.screenshot(page, 'studio-life-1-calendar-late');
  });

  it('takes a reviewer’s comment pinned on its preview', async () => {
    await openMug();
    const preview = page.getByRole('img', { name: /Preview of the product, front view; click to pin a comment/ });
    await preview.waitFor();
    await expect.poll(() => preview.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0), { timeout: 60_000 }).toBe(true);
    // from the keyboard: a pin in the middle, moved a big step left, placed with Enter
    await page.getByRole('button', { name: 'Pin with the keyboard' }).click();
    await page.getByRole('button', { name: /^New pin at 50 % across/ }).waitFor();
    await page.keyboard.press('Shift+ArrowLeft');
    await page.keyboard.press('Enter');
    await page.getByLabel(/Comment at the new pin/).fill(comment);
    await page.getByRole('button', { name: 'Post comment' }).click();
    await page.getByText(comment).waitFor();
    await browser.screenshot(page, 'studio-life-2-june-pinned-comment');
    await signOut(page, june.name);
  });

  it('mails the editor, who resolves the comment from the link', async () => {
    const link = await linkFromInbox(inboxUrl, appUrl, teodor.email, /June Abara .*“Puffin Picnic mug”/);
    expect(new URL(link).pathname).toMatch(/^\/products\/[0-9a-f-]{36}$/);
    await signIn(page, appUrl, teodor.email, demoPassword);
    await page.goto(link);
    await page.getByRole('heading', { level: 1, name: mug }).waitFor();
    const thread = page.getByRole('listitem').filter({ hasText: comment }).filter({ has: page.getByRole('button', { name: 'Resolve' }) });
    await thread.getByRole('button', { name: 'Resolve' }).click();
    await page.getByRole('radio', { name: /^Resolved/ }).check();
    await page.getByRole('listitem').filter({ hasText: comment }).getByText(/Resolved by Teodor Vance/).waitFor();
    await browser.screenshot(page, 'studio-life-3-teodor-resolved');
  });

  it('records a sample with a photo, approves it and moves the mug to ready', async () => {
    await page.getByRole('button', { name: 'Record a sample order' }).click();
    const form = page.getByRole('form', { name: 'Record a sample order' });
    await form.getByLabel(/Ordered on/).fill(new Date().toISOString().slice(0, 10));
    await form.getByLabel(/Printer/).fill('Harbourside Print Co.');
    await form.getByRole('button', { name: 'Record sample' }).click();
    await form.waitFor({ state: 'detached' });

    await page.locator('input[type="file"]').first().setInputFiles(await samplePhoto());
    await page.getByRole('button', { name: 'Open photo 1: IMG_5120.jpg' }).waitFor({ timeout: 60_000 });
    await page.getByRole('button', { name: 'Approve sample' }).click();
    await page.getByRole('button', { name: 'Approve sample' }).waitFor({ state: 'detached' });
    await browser.screenshot(page, 'studio-life-4-sample-approved');

    await page.getByRole('button', { name: 'Move to another stage' }).click();
    await page.getByRole('menuitem', { name: 'Ready', exact: true }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('button', { name: 'Move to Ready' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByRole('list', { name: 'Stage history, oldest first' }).getByText('Sampling → Ready').waitFor();
  });

  it('is no longer flagged on the calendar', async () => {
    await page.goto(`${appUrl}/calendar`);
    const entry = calendarEntry();
    await entry.waitFor();
    await expect.poll(() => entry.textContent()).not.toMatch(/Late|At risk/);
    await browser.screenshot(page, 'studio-life-5-calendar-ready');
  });
});
