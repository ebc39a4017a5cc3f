import { spawnSync } from 'node:child_process';
import { PNG } from 'pngjs';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { tsxCli } from '../../../scripts/services/repo-paths';
import { compose, radians, rotate, scale, translate } from '../../../shared/geometry';
import type { BlendMode, MotifDrawOp, RenderPlan } from '../../../shared/scene';
import { mug11oz } from '../../../shared/templates';
import { drawBands, type DrawLayer } from './draw-bands';
import { printCanvas, setDrawThreads, startDrawing, warmDrawThreads } from './draw-threads';
import { prepareMotif } from './motif-layer';
import { renderPrintFile } from './print-render';

// A plan big enough (over a million canvas pixels) to be shared with the draw threads: turned,
// scaled motifs in four blend modes crossing many band edges.
function bigPlan(): { plan: RenderPlan; motif: { data: Uint8Array; width: number; height: number } } {
  const motif = { data: new Uint8Array(300 * 300 * 4), width: 300, height: 300 };
  for (let i = 0; i < motif.data.length; i += 4) motif.data.set([(i * 7) % 256, (i * 3) % 256, 120, i % 9 === 0 ? 80 : 255], i);
  const modes: BlendMode[] = ['normal', 'multiply', 'screen', 'overlay', 'normal', 'normal'];
  const ops: MotifDrawOp[] = modes.map((blendMode, i) => ({
    kind: 'motif', placementId: `p${i}`, role: 'placement', width: 300, height: 300, motifId: `m${i}`, version: 1, recolour: { kind: 'none' },
    matrix: compose(translate(-150, -150), scale(0.6 + 0.5 * i), rotate(radians(0.3 * i + 0.2)), translate(250 + 260 * i, 400 + 40 * (i % 3))),
    opacity: i === 4 ? 0.6 : 1, blendMode, clip: { x: 10, y: 5, width: 1580, height: 790 },
  }));
  return { plan: { size: { width: 1600, height: 800 }, notes: [], ops }, motif };
}

/** The plan's layers, prepared, and the canvas they make drawn band by band on this thread alone. */
async function onOneThread(plan: RenderPlan, motif: { data: Uint8Array; width: number; height: number }) {
  const layers: DrawLayer[] = [];
  for (const op of plan.ops as MotifDrawOp[]) layers.push({ kind: 'motif', motif: await prepareMotif(motif, op), clip: op.clip!, composite: { blendMode: op.blendMode, opacity: op.opacity } });
  const expected = { data: new Uint8Array(plan.size.width * plan.size.height * 4), width: plan.size.width, height: plan.size.height, left: 0, top: 0 };
  drawBands(expected, layers);
  return { layers, expected };
}

describe('print drawing shared with draw threads', () => {
  beforeAll(async () => {
    setDrawThreads(1);
    await warmDrawThreads();
  }, 30_000);
  afterAll(() => setDrawThreads(0));

  it('gives byte for byte the pixels of drawing every band on one thread', async () => {
    const { plan, motif } = bigPlan();
    const { image, encoded } = await renderPrintFile(plan, { loadMotif: async () => motif, encode: mug11oz.output });
    expect(image.data.buffer).toBeInstanceOf(SharedArrayBuffer);
    // the PNG compressed band by band as this thread and the draw thread finished them (pngjs reads it)
    expect(Buffer.compare(PNG.sync.read(encoded!.buffer).data, Buffer.from(image.data))).toBe(0);
    const { expected } = await onOneThread(plan, motif);
    expect(Buffer.compare(Buffer.from(image.data), Buffer.from(expected.data))).toBe(0);
    // the draw thread's bands (two in three: rows 64-191, ...) were really drawn
    expect(image.data.subarray(100 * 1600 * 4, 101 * 1600 * 4).some((v) => v > 0)).toBe(true);
  });

  it('redraws here the bands of a draw thread that dies mid-render, losing no pixels', async () => {
    const { plan, motif } = bigPlan();
    const { layers, expected } = await onOneThread(plan, motif);

    const canvas = printCanvas(1600, 800);
    const drawing = startDrawing(canvas);
    layers.slice(0, 3).forEach((l) => drawing.add(l));
    setDrawThreads(0); // the thread is terminated with layers still to draw
    layers.slice(3).forEach((l) => drawing.add(l));
    const told: number[] = [];
    await drawing.finish((top, bottom) => told.push(top, bottom));
    expect(Buffer.compare(Buffer.from(canvas.data), Buffer.from(expected.data))).toBe(0);
    // every band told once, top to bottom, though the dead thread's bands were drawn here last
    expect(told).toEqual(Array.from({ length: 13 }, (_, b) => [b * 64, Math.min(800, b * 64 + 64)]).flat());
    setDrawThreads(1);
    await warmDrawThreads();
  }, 30_000);

  it('draws layers that were ready early layer by layer and the rest band by band, to the same pixels', async () => {
    const { plan, motif } = bigPlan();
    const { layers, expected } = await onOneThread(plan, motif);
    const canvas = printCanvas(1600, 800);
    const drawing = startDrawing(canvas);
    layers.slice(0, 2).forEach((l) => drawing.add(l));
    drawing.drawQueued();
    layers.slice(2).forEach((l) => drawing.add(l));
    const told: number[] = [];
    await drawing.finish((top) => told.push(top));
    expect(told).toEqual(Array.from({ length: 13 }, (_, b) => b * 64));
    expect(Buffer.compare(Buffer.from(canvas.data), Buffer.from(expected.data))).toBe(0);
  });

  it('gives a render up when a source fails to load, and draws the next one whole', async () => {
    const { plan, motif } = bigPlan();
    let loads = 0;
    const failing = renderPrintFile(plan, { loadMotif: async () => (++loads === 4 ? Promise.reject(new Error('storage is down')) : motif), encode: mug11oz.output });
    await expect(failing).rejects.toThrow('storage is down');
    const { expected } = await onOneThread(plan, motif);
    const { image } = await renderPrintFile(plan, { loadMotif: async () => motif });
    expect(Buffer.compare(Buffer.from(image.data), Buffer.from(expected.data))).toBe(0);
  });

  it('never keeps a process alive once its render is done', () => {
    // a thread left referenced made the seed hang after its last line, and with it the test run
    const script = fileURLToPath(new URL('./draw-threads-exit.fixture.ts', import.meta.url));
    const run = spawnSync(process.execPath, [tsxCli, script], { encoding: 'utf8', timeout: 20_000 });
    expect(run.error).toBeUndefined();
    expect(run.stdout).toContain('drawn 200');
    expect(run.status).toBe(0);
  }, 30_000);
});
