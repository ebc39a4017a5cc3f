// The library page's first screen in headless Chromium: from navigation to every thumbnail on
// the screen drawn, for a studio of 10,000 motifs, against the same page of an empty studio
// (the same client, sign-in and API round trips, no motifs) in the same run.
// `npm run bench -- library-ui`; the built client and a real server on the bench's services.
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { closeSync, existsSync, openSync } from 'node:fs';
import { cp, rm } from 'node:fs/promises';
import path from 'node:path';
import { desc, eq } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import sharp from 'sharp';
import { parseConfig } from '../../server/config';
import { motifs, motifVersions } from '../../server/db/schema/index';
import { openRuntime } from '../../server/runtime';
import { openBrowser } from '../../tests/e2e/support/browser';
import { seedMotifs } from '../../tests/api/support/library-seed';
import { waitForHealthy, type RunningChild } from '../services/child-process';
import { clientOutDir, ensureClientBuild } from '../services/client-build';
import { freePort } from '../services/free-port';
import { repoRoot, storageRoot, tsxCli } from '../services/repo-paths';
import { benchMotifs } from './library-data';

const TARGET_MS = 1000;
const MOTIFS = Number(process.env.BENCH_UI_MOTIFS ?? 10_000);
// newest first: the first screen and a few rows below it get real thumbnails
const WITH_PICTURES = 300;
const SAMPLES = 5;

export type LibraryUiBenchResult = {
  motifs: number;
  tilesOnScreen: number;
  firstVisitMs: number;
  /** The same signed-in visit right after the server restarts (its libraries build at start). */
  afterRestartMs: number;
  cold: number[];
  warm: number[];
  emptyCold: number[];
  emptyWarm: number[];
  pass: boolean;
};

export async function benchLibraryUi(log: (line: string) => void = console.log): Promise<LibraryUiBenchResult | null> {
  const runtime = await openRuntime(parseConfig({ ...process.env, NODE_ENV: 'test' }));
  const serverLog = path.join(storageRoot, 'bench', 'library-ui-server.log');
  let server: RunningServer | undefined;
  let browser: Awaited<ReturnType<typeof openBrowser>> | undefined;
  let cleanupDir: string | undefined;
  try {
    try {
      log(`client build ${(await ensureClientBuild()) ? 'made' : 'current'}`);
    } catch (error) {
      // the other benches still run; this one needs a client that builds
      if (!existsSync(path.join(clientOutDir, 'index.html'))) {
        log(`skipped: the client does not build (${error instanceof Error ? error.message : String(error)}), see the vite output above`);
        return null;
      }
      log('the client does not build now; measuring the last built one');
    }
    const port = await freePort();
    const appUrl = `http://127.0.0.1:${port}`;
    // the server serves ./dist/client: a private copy, so another build meanwhile cannot empty it
    const cwd = path.join(storageRoot, 'bench', `library-ui-${process.pid}`);
    await rm(cwd, { recursive: true, force: true });
    await cp(clientOutDir, path.join(cwd, 'dist', 'client'), { recursive: true });
    cleanupDir = cwd;
    const serverEnv: NodeJS.ProcessEnv = {
      ...process.env,
      NODE_ENV: 'production',
      PORT: String(port),
      APP_URL: appUrl,
      SESSION_SECRET: randomBytes(24).toString('hex'),
      RUN_WORKER_IN_PROCESS: 'false',
      RATE_LIMIT_SIGN_UP: '100',
    };
    server = startServer(cwd, serverEnv, serverLog);
    await waitForHealthy(`${appUrl}/api/health`, server);

    browser = await openBrowser({ viewport: { width: 1440, height: 900 } });
    const page = await browser.newPage();
    if (process.env.BENCH_UI_DEBUG) {
      const started = new Map<string, number>();
      page.on('request', (r) => started.set(r.url(), performance.now()));
      page.on('requestfinished', (r) => log(`  done ${Math.round(performance.now() - (started.get(r.url()) ?? 0))} ms ${r.url().slice(-60)}`));
      page.on('requestfailed', (r) => log(`  failed ${r.failure()?.errorText} ${r.url().slice(-60)}`));
    }
    const full = await signUp(page, appUrl, 'full');
    const seedStarted = performance.now();
    await seedLibrary(runtime, full.studioId);
    log(`seeded ${MOTIFS.toLocaleString('en')} motifs (${WITH_PICTURES} newest with thumbnails) in ${Math.round(performance.now() - seedStarted)} ms`);

    // the first visit after the server started also builds the studio's search index
    const firstVisit = await firstScreen(page, `${appUrl}/library`, 'thumbnails', false);
    const cold: number[] = [];
    const warm: number[] = [];
    for (let i = 0; i < SAMPLES; i++) cold.push((await firstScreen(page, `${appUrl}/library`, 'thumbnails', true)).ms);
    for (let i = 0; i < SAMPLES; i++) warm.push((await firstScreen(page, `${appUrl}/library`, 'thumbnails', false)).ms);
    // a restart (a deploy) with the person still signed in: the visit comes as soon as the server answers
    await server.stop();
    server = startServer(cwd, serverEnv, serverLog);
    await waitForHealthy(`${appUrl}/api/health`, server);
    const afterRestart = await firstScreen(page, `${appUrl}/library`, 'thumbnails', false);

    await page.context().clearCookies();
    await signUp(page, appUrl, 'empty');
    const emptyCold: number[] = [];
    const emptyWarm: number[] = [];
    await firstScreen(page, `${appUrl}/library`, 'empty', false);
    for (let i = 0; i < SAMPLES; i++) emptyCold.push((await firstScreen(page, `${appUrl}/library`, 'empty', true)).ms);
    for (let i = 0; i < SAMPLES; i++) emptyWarm.push((await firstScreen(page, `${appUrl}/library`, 'empty', false)).ms);

    const result: LibraryUiBenchResult = {
      motifs: MOTIFS, tilesOnScreen: firstVisit.tiles, firstVisitMs: firstVisit.ms, afterRestartMs: afterRestart.ms, cold, warm, emptyCold, emptyWarm,
      pass: median(cold) < TARGET_MS && median(warm) < TARGET_MS,
    };
    print(result, log);
    return result;
  } finally {
    await browser?.close();
    await server?.stop();
    if (cleanupDir) await rm(cleanupDir, { recursive: true, force: true });
    await runtime.close();
  }
}

type RunningServer = RunningChild;

function startServer(cwd: string, env: NodeJS.ProcessEnv, logFile: string): RunningServer {
  const log = openSync(logFile, 'a');
  const child = spawn(process.execPath, [tsxCli, path.join(repoRoot, 'server', 'index.ts')], { cwd, env, stdio: ['ignore', log, log] });
  closeSync(log);
  let running = true;
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => {
    running = false;
    resolve(code);
  }));
  return {
    name: 'server', process: child, exited, isRunning: () => running,
    async stop() {
      if (!running) return;
      child.kill('SIGTERM');
      const timer = setTimeout(() => child.kill('SIGKILL'), 15_000);
      await exited;
      clearTimeout(timer);
    },
  };
}

async function signUp(page: Page, appUrl: string, tag: string): Promise<{ studioId: string }> {
  const api = page.context().request;
  const csrf = (await (await api.get(`${appUrl}/api/auth/csrf`)).json()).csrfToken as string;
  const res = await api.post(`${appUrl}/api/auth/sign-up`, {
    headers: { 'x-csrf-token': csrf },
    data: { name: 'Ines Okafor', email: `bench-ui-${tag}-${Date.now()}@saltmarsh.test`, password: 'puffins-in-jumpers', studioName: `Saltmarsh ${tag}` },
  });
  if (res.status() !== 201) throw new Error(`bench sign-up failed: ${res.status()} ${await res.text()}`);
  return { studioId: (await res.json()).studio.id as string };
}

async function seedLibrary(runtime: Awaited<ReturnType<typeof openRuntime>>, studioId: string): Promise<void> {
  const db = runtime.db.db;
  // one second apart in creation, so "newest first" shows the last seeded
  const base = Date.now() - MOTIFS * 1000;
  let n = 0;
  for (const original of benchMotifs(MOTIFS)) {
    const specs = original.motifs.map((m) => ({ ...m, archived: false, createdAt: new Date(base + n++ * 1000) }));
    await seedMotifs(db, studioId, specs, { originalName: original.originalName });
  }
  const newest = await db
    .select({ thumbKey: motifVersions.thumbKey, pngKey: motifVersions.pngKey, colours: motifVersions.colours })
    .from(motifVersions)
    .innerJoin(motifs, eq(motifs.id, motifVersions.motifId))
    .where(eq(motifs.studioId, studioId))
    .orderBy(desc(motifs.createdAt))
    .limit(WITH_PICTURES);
  // thumbnails of the size imports make (320 px WebP), one drawing per colour
  const pictures = new Map<string, Buffer>();
  for (const v of newest) {
    const hex = v.colours[0]?.hex ?? '#808080';
    let webp = pictures.get(hex);
    if (!webp) {
      webp = await thumbnailOf(hex);
      pictures.set(hex, webp);
    }
    await runtime.storage.put(v.thumbKey, webp, 'image/webp');
  }
}

async function thumbnailOf(hex: string): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="320" height="260"><ellipse cx="160" cy="130" rx="150" ry="110" fill="${hex}"/>`
    + `<circle cx="110" cy="100" r="28" fill="#fbf7ef"/><path d="M40 200 Q160 120 280 200" stroke="#1d1f2a" stroke-width="10" fill="none"/></svg>`;
  return sharp(Buffer.from(svg)).webp({ quality: 82, alphaQuality: 90, effort: 1 }).toBuffer();
}

type Wanted = 'thumbnails' | 'empty';

// Milliseconds from the start of navigation (the page's time origin) to the frame after every
// tile on the screen shows its loaded picture, or the empty library's message shows.
async function firstScreen(page: Page, url: string, wanted: Wanted, coldCache: boolean): Promise<{ ms: number; tiles: number }> {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Network.setCacheDisabled', { cacheDisabled: coldCache });
  await page.goto('about:blank');
  await page.goto(url, { waitUntil: 'commit' });
  const handle = await page.waitForFunction((want: Wanted) => {
    if (want === 'empty') {
      return document.body.textContent?.includes('The library is empty') ? { ms: performance.now(), tiles: 0 } : false;
    }
    const onScreen = [...document.querySelectorAll<HTMLElement>('[data-tile]')].filter((tile) => {
      const box = tile.getBoundingClientRect();
      return box.bottom > 0 && box.top < window.innerHeight && box.width > 0;
    });
    if (onScreen.length === 0) return false;
    const drawn = onScreen.every((tile) => {
      const img = tile.querySelector('img');
      return Boolean(img && img.complete && img.naturalWidth > 0 && img.classList.contains('opacity-100'));
    });
    return drawn ? { ms: performance.now(), tiles: onScreen.length } : false;
  }, wanted, { polling: 'raf', timeout: 60_000 }).catch(async (error: unknown) => {
    throw new Error(`${wanted} never showed at ${page.url()}: ${await describeScreen(page)} (${error instanceof Error ? error.message : String(error)})`);
  });
  const value = (await handle.jsonValue()) as { ms: number; tiles: number };
  await cdp.detach();
  return { ms: Math.round(value.ms), tiles: value.tiles };
}

// What the page shows instead, for the error message.
async function describeScreen(page: Page): Promise<string> {
  return page.evaluate(() => {
    const tiles = [...document.querySelectorAll('[data-tile]')];
    const images = tiles.map((t) => t.querySelector('img'));
    const loaded = images.filter((img) => img?.complete && img.naturalWidth > 0).length;
    const waiting = tiles.map((t) => ({ top: Math.round(t.getBoundingClientRect().top), img: t.querySelector('img') }))
      .filter((t) => t.img && !(t.img.complete && t.img.naturalWidth > 0)).slice(0, 3).map((t) => `${t.img?.getAttribute('src')} at y=${t.top}`);
    const text = (document.querySelector('main') ?? document.body).textContent?.replace(/\s+/g, ' ').slice(0, 160);
    return `${tiles.length} tiles (window ${window.innerHeight} px high), ${loaded} pictures loaded, ${images.filter((img) => !img).length} unavailable; waiting: ${waiting.join(', ')}; page text: ${text}`;
  });
}

function median(samples: number[]): number {
  const sorted = [...samples].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function print(r: LibraryUiBenchResult, log: (line: string) => void): void {
  const line = (label: string, samples: number[]) => `${label.padEnd(44)} median ${String(median(samples)).padStart(5)} ms  (${samples.join(', ')})`;
  log(`library page, ${r.motifs.toLocaleString('en')} motifs, ${r.tilesOnScreen} tiles on a 1440 x 900 screen; navigation to every tile on the screen drawn`);
  log(`  first visit after server start (search index built): ${r.firstVisitMs} ms`);
  log(`  first visit right after a restart, still signed in: ${r.afterRestartMs} ms`);
  log(`  ${line('10,000 motifs, empty browser cache', r.cold)}  target < ${TARGET_MS} ms ${median(r.cold) < TARGET_MS ? 'ok' : 'MISSED'}`);
  log(`  ${line('10,000 motifs, cached client', r.warm)}  target < ${TARGET_MS} ms ${median(r.warm) < TARGET_MS ? 'ok' : 'MISSED'}`);
  log(`  ${line('peer: empty studio, empty browser cache', r.emptyCold)}`);
  log(`  ${line('peer: empty studio, cached client', r.emptyWarm)}`);
  log(`  ratio 10,000 motifs / empty studio: ${(median(r.cold) / median(r.emptyCold)).toFixed(2)}x (empty cache), ${(median(r.warm) / median(r.emptyWarm)).toFixed(2)}x (cached client)`);
}
