// Dragging one placement among 60 on an 11 oz wrap at 300 DPI, in headless Chromium: the median
// and 95th-percentile frame times from requestAnimationFrame (targets 16.7 ms and 25 ms), against
// a peer measured in the same run: the same page, the same rAF loop, no drag (the frame clock
// of this browser on this machine with nothing to draw). The pointer moves every 1/60 s, as a
// mouse's do, without waiting for the page; the canvas's own drawing time is printed beside it.
// `npm run bench -- compositor`: the built client and the real app in-process on the bench's services.
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { mug11oz, templateGeometry } from '../../shared/templates';
import { openBrowser } from '../../tests/e2e/support/browser';
import { clientOutDir, ensureClientBuild } from '../services/client-build';
import { createDragProduct, PLACEMENTS, seedDragMotifs, signUpOwner, startBenchApp } from './compositor-drag-setup';

const DRAG_STEPS = 240;
// 16.7 ms: one frame at 60 Hz; 25 ms for the slow frames (95th percentile)
const MEDIAN_TARGET_MS = 16.7;
const P95_TARGET_MS = 25;

export type FrameStats = { frames: number; median: number; p95: number };
/** `drag`: every frame during the drag; `drawing`: only the frames in which the canvas redrew (the work a move costs). */
export type DragBenchResult = { drag: FrameStats; drawing: FrameStats; idle: FrameStats; draw: { median: number; p95: number }; pass: boolean };

export async function benchCompositorDrag(log: (line: string) => void = console.log): Promise<DragBenchResult | null> {
  try {
    log(`client build ${(await ensureClientBuild()) ? 'made' : 'current'}`);
  } catch (error) {
    if (!existsSync(path.join(clientOutDir, 'index.html'))) {
      log(`skipped: the client does not build (${error instanceof Error ? error.message : String(error)})`);
      return null;
    }
    log('the client does not build now; measuring the last built one');
  }
  const app = await startBenchApp();
  let browser: Awaited<ReturnType<typeof openBrowser>> | undefined;
  try {
    browser = await openBrowser({ viewport: { width: 1440, height: 900 } });
    const page = await browser.newPage();
    const studioId = await signUpOwner(page, app.appUrl);
    const seeded = await seedDragMotifs(app.runtime, studioId);
    const productId = await createDragProduct(page, app.appUrl, seeded);

    await page.goto(`${app.appUrl}/products/${productId}/layout`);
    const canvas = page.getByTestId('editor-canvas');
    await canvas.waitFor();
    await waitForThumbnails(page, seeded.length);
    const box = (await canvas.boundingBox())!;
    const start = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
    // select the top placement first, so both runs draw the same selection chrome
    await page.mouse.click(start.x, start.y);
    await page.waitForTimeout(300);

    // the peer first: the same loop for as many frames as the drag will take, nothing moving
    await startFrameLog(page);
    await page.waitForTimeout(DRAG_STEPS * 17);
    const idle = stats(await stopFrameLog(page));

    // The pointer as a mouse delivers it: a move every 1/60 s whether or not the page has caught
    // up (Playwright's mouse.move waits for each event's round trip, which paces it to the harness).
    const input = await page.context().newCDPSession(page);
    const mouse = (type: 'mousePressed' | 'mouseMoved' | 'mouseReleased', x: number, y: number) =>
      input.send('Input.dispatchMouseEvent', { type, x, y, button: 'left', buttons: type === 'mouseReleased' ? 0 : 1, clickCount: type === 'mouseMoved' ? 0 : 1 });
    await page.mouse.move(start.x, start.y);
    await startFrameLog(page);
    await mouse('mousePressed', start.x, start.y);
    const sent: Promise<unknown>[] = [];
    const began = performance.now();
    for (let i = 1; i <= DRAG_STEPS; i++) {
      const due = began + i * (1000 / 60);
      while (performance.now() < due) await new Promise((r) => setTimeout(r, Math.max(0, due - performance.now())));
      sent.push(mouse('mouseMoved', start.x + Math.sin(i / 20) * 200, start.y + Math.cos(i / 30) * 80 - 80));
    }
    await Promise.all(sent);
    await mouse('mouseReleased', start.x + Math.sin(DRAG_STEPS / 20) * 200, start.y + Math.cos(DRAG_STEPS / 30) * 80 - 80);
    await page.waitForTimeout(100);
    const ticks = await stopFrameLog(page);
    await input.detach();
    const drag = stats(ticks);
    const drawing = stats(ticks, true);

    // a median of exactly one 60 Hz frame meets the target: no page can be faster than the display
    const result: DragBenchResult = { drag, drawing, idle, draw: drawCost(ticks), pass: drawing.median <= MEDIAN_TARGET_MS && drawing.p95 <= P95_TARGET_MS };
    print(result, log);
    return result;
  } finally {
    await browser?.close();
    await app.close();
  }
}

// A string, not a function: tsx's name helpers do not exist inside the page.
// Each tick: its time, how many frames the canvas had drawn by then and the ms its own drawing took in all.
const startFrameLog = (page: Page) => page.evaluate(`(() => {
  window.__frames = [];
  window.__stop = false;
  const canvas = document.querySelector('[data-testid="editor-canvas"]');
  const tick = (t) => { window.__frames.push([t, Number(canvas.dataset.framesDrawn || 0), Number(canvas.dataset.drawMs || 0)]); if (!window.__stop) requestAnimationFrame(tick); };
  requestAnimationFrame(tick);
})()`);

type Tick = [time: number, drawn: number, drawMs: number];
const stopFrameLog = async (page: Page) => (await page.evaluate('(() => { window.__stop = true; return window.__frames; })()')) as Tick[];

async function waitForThumbnails(page: Page, motifs: number): Promise<void> {
  let answered = 0;
  const counted = (r: { url(): string }) => { if (r.url().includes('/image?size=thumb')) answered += 1; };
  page.on('requestfinished', counted);
  const deadline = Date.now() + 30_000;
  while (answered < motifs && Date.now() < deadline) await page.waitForTimeout(100);
  page.off('requestfinished', counted);
  // decoding and the next frame
  await page.waitForTimeout(500);
}

/** Frame intervals; with `drawnOnly`, only those across which the canvas drew (its work lands between the two ticks). */
export function stats(ticks: Tick[], drawnOnly = false): FrameStats {
  const intervals = ticks.slice(1)
    .map(([t, drawn], i) => ({ ms: t - ticks[i][0], drew: drawn > ticks[i][1] }))
    .filter((f) => !drawnOnly || f.drew)
    .map((f) => f.ms)
    .sort((a, b) => a - b);
  const pick = (q: number) => intervals[Math.min(intervals.length - 1, Math.floor(q * intervals.length))] ?? NaN;
  return { frames: intervals.length, median: pick(0.5), p95: pick(0.95) };
}

/** What the canvas view's own drawing took in each frame that drew (the rest of a frame is the browser's). */
export function drawCost(ticks: Tick[]): { median: number; p95: number } {
  const perFrame: number[] = [];
  for (let i = 1; i < ticks.length; i++) {
    const frames = ticks[i][1] - ticks[i - 1][1];
    if (frames > 0) perFrame.push((ticks[i][2] - ticks[i - 1][2]) / frames);
  }
  perFrame.sort((a, b) => a - b);
  const pick = (q: number) => perFrame[Math.min(perFrame.length - 1, Math.floor(q * perFrame.length))] ?? NaN;
  return { median: pick(0.5), p95: pick(0.95) };
}

function print(r: DragBenchResult, log: (line: string) => void): void {
  const g = templateGeometry(mug11oz);
  const ms = (n: number) => `${n.toFixed(1).padStart(5)} ms`;
  log(`dragging 1 of ${PLACEMENTS} placements on ${mug11oz.name} (${g.size.width} x ${g.size.height} px), ${DRAG_STEPS} pointer moves, 1440 x 900 headless Chromium`);
  const row = (label: string, f: FrameStats) => `  ${label.padEnd(34)} ${String(f.frames).padStart(5)} frames, median ${ms(f.median)}, p95 ${ms(f.p95)}`;
  log(`${row('frames that redrew the canvas', r.drawing)}  targets ${MEDIAN_TARGET_MS} / ${P95_TARGET_MS} ms ${r.pass ? 'ok' : 'MISSED'}`);
  log(row('every frame during the drag', r.drag));
  log(row('peer: idle rAF loop, no drag', r.idle));
  log(`  the canvas's own drawing per frame: median ${ms(r.draw.median)}, p95 ${ms(r.draw.p95)} (the rest of each frame is Chromium's commit and software compositing)`);
  log(`  ratio redrawing / idle: ${(r.drawing.median / r.idle.median).toFixed(2)}x (median), ${(r.drawing.p95 / r.idle.p95).toFixed(2)}x (p95)`);
}
