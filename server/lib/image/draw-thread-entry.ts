// Body of a print-draw thread (draw-threads.ts): draws its share of a render's bands onto the
// shared canvas, one layer at a time as they arrive, and says when the render's layers are done.
// Imports only the pure drawing code, never sharp.
import { parentPort } from 'node:worker_threads';
import { drawBands, type DrawLayer } from './draw-bands';
import type { RgbaImage } from './rgba-image';

export type DrawRequest =
  | { kind: 'begin'; id: number; canvas: RgbaImage; part: number; parts: number }
  | { kind: 'layer'; id: number; layer: DrawLayer }
  | { kind: 'end'; id: number };
export type DrawReply = { id: number; ok: true } | { id: number; ok: false; message: string };

type Render = { canvas: RgbaImage; part: number; parts: number; error: string | null };
const renders = new Map<number, Render>();

parentPort?.on('message', (request: DrawRequest) => {
  if (request.kind === 'begin') {
    renders.set(request.id, { canvas: request.canvas, part: request.part, parts: request.parts, error: null });
    return;
  }
  const render = renders.get(request.id);
  if (!render) return;
  if (request.kind === 'layer') {
    if (render.error !== null) return;
    try {
      drawBands(render.canvas, [request.layer], render.part, render.parts);
    } catch (error) {
      render.error = error instanceof Error ? error.message : String(error);
    }
    return;
  }
  renders.delete(request.id);
  const reply: DrawReply = render.error === null ? { id: request.id, ok: true } : { id: request.id, ok: false, message: render.error };
  parentPort!.postMessage(reply);
});
parentPort?.postMessage({ ready: true });
