import { mkdir, mkdtemp, readdir, readFile, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { storageRoot } from '../../../scripts/services/repo-paths';

export const screenshotDir = path.join(storageRoot, 'screenshots');

// Debian's Chromium; without the background-networking flags it keeps calling outside hosts.
const chromiumPath = '/usr/bin/chromium';
const chromiumFlags = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export interface OpenBrowser {
  context: BrowserContext;
  newPage(): Promise<Page>;
  /** Saves a full-page PNG as storage/screenshots/<name>.png and returns its path. */
  screenshot(page: Page, name: string): Promise<string>;
  close(): Promise<void>;
}

export interface OpenBrowserOptions {
  viewport?: { width: number; height: number };
}

/** A fresh Chromium profile per call: no cookies or storage carry over between tests. */
export async function openBrowser(options: OpenBrowserOptions = {}): Promise<OpenBrowser> {
  const profileDir = await mkdtemp(path.join(os.tmpdir(), 'motifold-chromium-'));
  let context: BrowserContext;
  try {
    // a --user-data-dir in launch() args is rejected, hence the persistent context
    context = await chromium.launchPersistentContext(profileDir, {
      executablePath: chromiumPath,
      args: chromiumFlags,
      viewport: options.viewport ?? { width: 1280, height: 800 },
      timeout: 30_000,
    });
  } catch (error) {
    await rm(profileDir, { recursive: true, force: true });
    throw error;
  }
  let closed = false;
  return {
    context,
    newPage: () => context.newPage(),
    async screenshot(page, name) {
      await mkdir(screenshotDir, { recursive: true });
      const file = path.join(screenshotDir, `${screenshotName(name)}.png`);
      await page.screenshot({ path: file, fullPage: true });
      return file;
    },
    async close() {
      if (closed) return;
      closed = true;
      // a hung Chromium must not hang the suite: give it 10 s, then kill it
      const timeout = new Promise<'timeout'>((resolve) => setTimeout(resolve, 10_000, 'timeout').unref());
      const outcome = await Promise.race([context.close().then(() => 'closed' as const), timeout]).catch(() => 'failed');
      if (outcome !== 'closed') await killChromiumUsing(profileDir);
      await rm(profileDir, { recursive: true, force: true, maxRetries: 3 });
    },
  };
}

function screenshotName(name: string): string {
  const safe = name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return safe || 'screenshot';
}

// A persistent context has no browser handle to kill; its processes are the ones using our profile.
async function killChromiumUsing(profileDir: string): Promise<void> {
  for (const pid of await readdir('/proc').catch(() => [])) {
    if (!/^\d+$/.test(pid)) continue;
    const commandLine = await readFile(`/proc/${pid}/cmdline`, 'utf8').catch(() => '');
    if (!commandLine.includes(`--user-data-dir=${profileDir}`)) continue;
    try {
      process.kill(Number(pid), 'SIGKILL');
    } catch {
      // already gone
    }
  }
}
