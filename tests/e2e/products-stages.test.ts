import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { OpenBrowser } from './support/browser';
import { openSignedIn } from './support/studio-steps';
import '../setup/provided-context';

// An owner starts a product, gives it a variant with a SKU, walks it along its stages on the
// board from the keyboard, is stopped by the sample check, overrides it with a note and moves
// it on to listed.
const appUrl = inject('appUrl');

let browser: OpenBrowser;
let page: Page;

beforeAll(async () => {
  ({ browser, page } = await openSignedIn(appUrl, 'ines@saltmarsh.test', { viewport: { width: 1440, height: 900 } }));
});

afterAll(async () => {
  await browser?.close();
});

const name = `Stage walk mug ${Date.now().toString(36)}`;

async function moveOnBoard(to: string, note: string) {
  const button = page.getByRole('button', { name: `Move “${name}” to another stage` });
  await button.focus();
  await page.keyboard.press('ArrowDown');
  await page.getByRole('menuitem', { name: to, exact: true }).focus();
  await page.keyboard.press('Enter');
  const dialog = page.getByRole('dialog');
  await dialog.getByLabel(/Note/).fill(note);
  await dialog.getByRole('button', { name: `Move to ${to}` }).click();
}

describe('a product through its stages', () => {
  it('starts on its layout, gets a SKU on its own page and moves along the board', async () => {
    await page.goto(`${appUrl}/products`);
    const form = page.getByRole('form', { name: 'New product' });
    await form.getByLabel('Name').fill(name);
    await form.getByLabel('Template').selectOption('mug-11oz');
    await form.getByRole('button', { name: 'Start a product' }).click();
    await page.waitForURL((u) => u.pathname.endsWith('/layout'));
    await page.getByRole('link', { name: 'The product’s page' }).click();
    await page.getByRole('heading', { level: 1, name }).waitFor();

    const variant = page.getByRole('form', { name: 'New variant' });
    await variant.getByLabel(/Variant/).fill('Navy handle');
    await variant.getByLabel(/SKU/).fill(`E2E-${Date.now().toString(36)}`.toUpperCase());
    await variant.getByRole('button', { name: 'Add variant' }).click();
    await page.getByRole('form', { name: 'Variant Navy handle' }).waitFor();

    // the stage requests and their answers, named in the message should a move not arrive
    const stageCalls: string[] = [];
    page.on('requestfinished', async (r) => {
      if (r.url().includes('/stage')) stageCalls.push(`${r.method()} ${new URL(r.url()).pathname.split('/').pop()} ${(await r.response())?.status()}`);
    });
    page.on('requestfailed', (r) => { if (r.url().includes('/stage')) stageCalls.push(`${r.method()} ${r.url()} failed: ${r.failure()?.errorText}`); });
    await page.goto(`${appUrl}/products?view=board`);
    await moveOnBoard('Proofing', 'Proof looks right on the printer’s site');
    await page.getByRole('list', { name: /^Proofing:/ }).getByText(name).waitFor();
    await moveOnBoard('Sampling', 'Sample ordered');
    await page.getByRole('list', { name: /^Sampling:/ }).getByText(name).waitFor();

    await moveOnBoard('Ready', '');
    const dialog = page.getByRole('dialog');
    await dialog.getByText('The sample check stopped this move').waitFor();
    await dialog.getByRole('button', { name: 'Move anyway as owner…' }).click();
    await dialog.getByLabel(/Note/).fill('Same blank as the approved spring mug');
    await dialog.getByRole('button', { name: 'Move without a sample' }).click();
    await page.getByRole('list', { name: /^Ready:/ }).getByText(name).waitFor();
    // the board shows the move before the dialog closes; the next move starts once it has
    await expect.poll(() => dialog.count()).toBe(0);
    await browser.screenshot(page, 'products-board');

    // on to Listed (a card dropped on a column opens the same prompt: products-board.test.tsx)
    await moveOnBoard('Listed', '');
    const moveDialog = page.getByRole('dialog');
    // The dialog closes once the move is saved and the board refetched; if the server refused,
    // its message is what this check prints.
    await expect
      .poll(async () => ((await moveDialog.count()) === 0 ? 'closed' : `${await moveDialog.innerText()} (stage calls ${stageCalls.join(', ')})`), { timeout: 30_000 })
      .toBe('closed');
    // On the board, and (should the board lag) what the server holds, so a failure says which is behind.
    const listed = page.getByRole('list', { name: /^Listed:/ }).getByText(name);
    await expect
      .poll(async () => {
        if (await listed.isVisible()) return 'on the board';
        const answer = await page.request.get(`${appUrl}/api/products`);
        const held = ((await answer.json()).products as { name: string; stage: string }[]).find((p) => p.name === name);
        const columns = await page.getByRole('list', { name: /products?$/ }).evaluateAll((lists) => lists.map((l) => l.getAttribute('aria-label')));
        return `board columns ${columns.join(' | ')}; server says ${held?.stage ?? 'no such product'}; stage calls ${stageCalls.join(', ')}; at ${page.url()}`;
      }, { timeout: 30_000 })
      .toBe('on the board');

    await page.getByRole('link', { name }).click();
    const history = page.getByRole('list', { name: 'Stage history, oldest first' });
    await history.getByText('Owner override: no approved sample').waitFor();
    expect(await history.getByRole('listitem').count()).toBe(5);
    expect(await history.textContent()).toContain('Proof looks right on the printer’s site');
    await page.getByRole('img', { name: new RegExp(`Preview of ${name}`) }).waitFor();
    await browser.screenshot(page, 'product-page');
  }, 90_000);
});
