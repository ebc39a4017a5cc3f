// Body of a print-draw thread (draw-threads.ts): draws its share of a render's bands onto the
// shared canvas, layer by layer as they arrive; at the end it draws the last layers band by band,
// saying as each of its bands is final, then says the render is done.
// Imports only the pure drawing code, never sharp.
import { parentPort } from 'node:worker_threads';
import { drawBandList, drawOneBand, type DrawLayer } from './draw-bands';
import type { RgbaImage } from './rgba-image';

export type DrawRequest =
  | { kind: 'begin'; id: number; canvas: RgbaImage; bands: number[] }
  | { kind: 'layer'; id: number; layer: DrawLayer }
  | { kind: 'end'; id: number; tail: DrawLayer[] }
  // the render was given up: forget it
  | { kind: 'cancel'; id: number };
export type DrawReply =
  | { id: number; ok: true }
  | { id: number; ok: false; message: string }
  // band `band` of the render is final (only sent while the render has not failed)
  | { id: number; band: number };

type Render = { canvas: RgbaImage; bands: number[]; error: string | null };
const renders = new Map<number, Render>();

const messageOf = (error: unknown) => (error instanceof Error ? error.message : String(error));

parentPort?.on('message', (request: DrawRequest) => {
  if (request.kind === 'begin') {
    renders.set(request.id, { canvas: request.canvas, bands: request.bands, error: null });
    return;
  }
  const render = renders.get(request.id);
  if (!render) return;
  if (request.kind === 'layer') {
    if (render.error !== null) return;
    try {
      drawBandList(render.canvas, [request.layer], render.bands);
    } catch (error) {
      render.error = messageOf(error);
    }
    return;
  }
  renders.delete(request.id);
  if (request.kind === 'cancel') {
    parentPort!.postMessage({ id: request.id, ok: false, message: 'cancelled' } satisfies DrawReply);
    return;
  }
  if (render.error === null) {
    try {
      for (const band of render.bands) {
        drawOneBand(render.canvas, request.tail, band);
        parentPort!.postMessage({ id: request.id, band } satisfies DrawReply);
      }
    } catch (error) {
      render.error = messageOf(error);
    }
  }
  const reply: DrawReply = render.error === null ? { id: request.id, ok: true } : { id: request.id, ok: false, message: render.error };
  parentPort!.postMessage(reply);
});
parentPort?.postMessage({ ready: true });
