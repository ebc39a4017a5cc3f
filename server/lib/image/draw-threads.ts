import { createRequire } from 'node:module';
import { availableParallelism } from 'node:os';
import { pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import { bandCount, bandRows, drawBandList, drawBands, drawOneBand, type DrawLayer } from './draw-bands';
import type { DrawReply, DrawRequest } from './draw-thread-entry';
import type { RgbaImage } from './rgba-image';
import { sharedMemory } from './shared-sources';

// Print files are drawn band by band (draw-bands.ts); on a machine with more than one core the
// bands are shared between this thread and a few long-lived draw threads, as libvips shares an
// image's tiles between its own threads. The canvas and the sources sit in shared memory, each
// thread draws whole bands of its own, so the bytes are those of drawing on one thread.

// Below this many canvas pixels a render is quick enough that copying sources to shared memory
// and waking threads would cost more than it saves (previews, small cards, tests' tiny plans).
const THREADED_FROM_PIXELS = 1_000_000;

type DrawThread = {
  worker: Worker;
  ready: boolean;
  /** Settles once the thread can draw, or has died trying. */
  started: Promise<void>;
  pending: Map<number, { resolve: () => void; reject: (e: Error) => void; onBand: (band: number) => void }>;
};

let wanted = Math.max(0, Math.min(3, availableParallelism() - 1));
let threads: DrawThread[] = [];
let nextId = 1;

/** How many draw threads to keep besides the calling thread (0 draws everything on it); from PRINT_DRAW_THREADS. */
export function setDrawThreads(count: number): void {
  wanted = Math.max(0, Math.floor(count));
  for (const t of threads.splice(wanted)) void t.worker.terminate();
}

/** Starts the draw threads (a few hundred ms of module loading) so the first print file does not wait; resolves once they can draw. */
export function warmDrawThreads(): Promise<void> {
  while (threads.length < wanted) threads.push(startThread());
  return Promise.all(threads.map((t) => t.started)).then(() => undefined);
}

// Shared canvases handed back by releasePrintCanvas, reused by the next render of the same size:
// their pages are already mapped (see ARENA_KEEP_BYTES below), zeroing them is cheap.
const SPARE_CANVAS_BYTES = 128 * 1024 * 1024;
let spareCanvases: SharedArrayBuffer[] = [];
const handedOut = new WeakSet<SharedArrayBuffer>();

/** A zeroed canvas, in shared memory when draw threads may share its bands. */
export function printCanvas(width: number, height: number): RgbaImage {
  const bytes = width * height * 4;
  const threaded = wanted > 0 && width * height >= THREADED_FROM_PIXELS;
  if (!threaded) return { data: new Uint8Array(bytes), width, height, left: 0, top: 0 };
  const at = spareCanvases.findIndex((b) => b.byteLength === bytes);
  let buffer: SharedArrayBuffer;
  if (at >= 0) {
    buffer = spareCanvases.splice(at, 1)[0];
    new Uint8Array(buffer).fill(0);
  } else {
    buffer = new SharedArrayBuffer(bytes);
  }
  handedOut.add(buffer);
  return { data: new Uint8Array(buffer), width, height, left: 0, top: 0 };
}

/**
 * Hands a print canvas back for the next render once nothing reads its pixels any more (the
 * export job calls it when the print file, previews and proof are written). Canvases that were
 * not made by printCanvas, or were handed back already, are ignored.
 */
export function releasePrintCanvas(image: RgbaImage): void {
  const buffer = image.data.buffer;
  if (!(buffer instanceof SharedArrayBuffer) || !handedOut.has(buffer)) return;
  handedOut.delete(buffer);
  spareCanvases = [buffer, ...spareCanvases];
  let kept = 0;
  spareCanvases = spareCanvases.filter((b) => (kept += b.byteLength) <= SPARE_CANVAS_BYTES);
}

/**
 * Layers handed over one at a time, in plan order, as their pixels are ready. Queued layers are
 * drawn on every band at once when the caller has time (drawQueued, while it waits for the next
 * layer's pixels); finish() draws what is still queued band by band, top to bottom, so each band
 * is final as early as it can be, and tells onBand of each band in order as it is final.
 */
export type CanvasDrawing = {
  add(layer: DrawLayer): void;
  drawQueued(): void;
  finish(onBand?: OnBand): Promise<void>;
  /** Gives the render up (a source failed to load): the draw threads drop it and its shared copies are freed. */
  cancel(): void;
};

/** Rows [top, bottom) of the canvas are final; called top to bottom, once per band. */
export type OnBand = (top: number, bottom: number) => void;

// Between the bands it draws itself, the calling thread lets the event loop run, so the draw
// threads' "band done" messages and the consumer of finished bands (zlib) keep moving.
const turn = () => new Promise<void>((resolve) => setImmediate(resolve));

/**
 * Starts drawing onto the canvas, sharing its bands with the draw threads that are ready
 * (starting them for next time if they are not). A layer drawn early is drawn on this thread's
 * bands and posted to the draw threads for theirs, so drawing overlaps the fetching and resizing
 * of the layers after it. A thread that fails or dies has its unfinished bands cleared and drawn
 * here at the end, so a fault costs time, never pixels.
 */
export function startDrawing(canvas: RgbaImage): CanvasDrawing {
  const shared = canvas.data.buffer instanceof SharedArrayBuffer;
  if (shared) void warmDrawThreads();
  const helpers = shared ? threads.filter((t) => t.ready) : [];
  const parts = helpers.length + 1;
  const bands = bandCount(canvas.height);
  const queued: DrawLayer[] = [];
  const final = new Uint8Array(bands);
  let told = 0;
  let onBand: OnBand | undefined;
  const markFinal = (band: number) => {
    final[band] = 1;
    for (; told < bands && final[told]; told++) {
      const { top, bottom } = bandRows(canvas.height, told);
      onBand?.(top, bottom);
    }
  };
  if (parts === 1) {
    return {
      add: (layer) => void queued.push(layer),
      drawQueued: () => drawBands(canvas, queued.splice(0)),
      async finish(listener) {
        onBand = listener;
        const tail = queued.splice(0);
        for (let band = 0; band < bands; band++) {
          drawOneBand(canvas, tail, band);
          markFinal(band);
          if (listener) await turn();
        }
      },
      cancel: () => void queued.splice(0),
    };
  }
  const id = nextId++;
  const layers: DrawLayer[] = [];
  const memory = sharedMemory();
  const owned = bandsByPart(bands, helpers.length);
  const replies = helpers.map((thread, i) => ask(thread, id, { kind: 'begin', id, canvas, bands: owned[i + 1] }, markFinal));
  for (const reply of replies) reply.catch(() => undefined);
  return {
    add: (layer) => void queued.push(layer),
    drawQueued() {
      for (const layer of queued.splice(0)) {
        layers.push(layer);
        const copy = memory.share(layer);
        for (const thread of helpers) thread.worker.postMessage({ kind: 'layer', id, layer: copy } satisfies DrawRequest);
        drawBandList(canvas, [layer], owned[0]);
      }
    },
    async finish(listener) {
      onBand = listener;
      const tail = queued.splice(0);
      layers.push(...tail);
      const copies = tail.map((layer) => memory.share(layer));
      for (const thread of helpers) thread.worker.postMessage({ kind: 'end', id, tail: copies } satisfies DrawRequest);
      for (const band of owned[0]) {
        drawOneBand(canvas, tail, band);
        markFinal(band);
        await turn();
      }
      const results = await Promise.allSettled(replies);
      memory.release();
      results.forEach((r, i) => {
        if (r.status === 'fulfilled') return;
        for (const band of owned[i + 1]) {
          if (final[band]) continue;
          const { top, bottom } = bandRows(canvas.height, band);
          canvas.data.fill(0, top * canvas.width * 4, bottom * canvas.width * 4);
          drawOneBand(canvas, layers, band);
          markFinal(band);
        }
      });
    },
    cancel() {
      queued.splice(0);
      for (const thread of helpers) thread.worker.postMessage({ kind: 'cancel', id } satisfies DrawRequest);
      // the threads may still be reading the shared copies until they have heard
      void Promise.allSettled(replies).then(() => memory.release());
    },
  };
}

// The calling thread also copies sources to shared memory, hands finished bands to zlib and
// hears the draw threads, so with one draw thread it draws one band in three, not one in two
// (measured on the 11 oz mug, 2 cores: render + encode at 1.22-1.38x sharp's composite against
// 1.31-1.37x with even shares, and 1.41-1.48x at one in four). With more draw threads it takes an
// equal share.
const MAIN_SHARE_ONE_IN = 3;

/** The bands each part draws: part 0 is the calling thread, parts 1.. the draw threads. */
function bandsByPart(bands: number, helpers: number): number[][] {
  const owned: number[][] = Array.from({ length: helpers + 1 }, () => []);
  const cycle = Math.max(helpers + 1, MAIN_SHARE_ONE_IN);
  for (let band = 0; band < bands; band++) {
    const slot = band % cycle;
    owned[slot === 0 ? 0 : 1 + ((slot - 1) % helpers)].push(band);
  }
  return owned;
}

/** Draws every layer onto the canvas in plan order (startDrawing with all layers at once). */
export async function drawLayers(canvas: RgbaImage, layers: DrawLayer[]): Promise<void> {
  const drawing = startDrawing(canvas);
  for (const layer of layers) drawing.add(layer);
  await drawing.finish();
}

function ask(thread: DrawThread, id: number, request: DrawRequest, onBand: (band: number) => void): Promise<void> {
  return new Promise<void>((resolve, reject) => {
    thread.pending.set(id, { resolve, reject, onBand });
    thread.worker.ref();
    thread.worker.postMessage(request);
  }).finally(() => {
    if (thread.pending.size === 0) thread.worker.unref();
  });
}

function startThread(): DrawThread {
  // The thread loads the TypeScript entry through tsx's loader, as the rest of the server runs.
  const req = createRequire(import.meta.url);
  const loader = pathToFileURL(req.resolve('tsx/esm/api')).href.replace(/\.cjs$/, '.mjs');
  const entry = new URL('./draw-thread-entry.ts', import.meta.url).href;
  const worker = new Worker(`import(${JSON.stringify(loader)}).then(({ register }) => { register(); return import(${JSON.stringify(entry)}); })`, { eval: true });
  let started = () => {};
  const thread: DrawThread = { worker, ready: false, started: new Promise<void>((resolve) => (started = resolve)), pending: new Map() };
  worker.on('message', (message: DrawReply | { ready: true }) => {
    if ('ready' in message) {
      thread.ready = true;
      started();
      if (thread.pending.size === 0) worker.unref();
      return;
    }
    const waiting = thread.pending.get(message.id);
    if ('band' in message) {
      waiting?.onBand(message.band);
      return;
    }
    thread.pending.delete(message.id);
    if (message.ok) waiting?.resolve();
    else waiting?.reject(new Error(message.message));
  });
  const fail = (error: Error) => {
    threads = threads.filter((t) => t !== thread);
    thread.ready = false;
    started();
    for (const waiting of thread.pending.values()) waiting.reject(error);
    thread.pending.clear();
  };
  worker.on('error', fail);
  worker.on('exit', (code) => fail(new Error(`draw thread exited with code ${code}`)));
  // The thread holds the process only while it starts (a few hundred ms) or draws: once ready it
  // is unref'd (in the listener above, so after every listener is added, since adding a 'message'
  // listener refs the worker's port again), and an idle draw thread never keeps a process (the
  // seed, a script, a test run) from exiting.
  return thread;
}
