// Loaded into a blank Chromium page by print-parity.test.ts: the editor's own canvas renderer,
// bundled on the fly, drawing a layout at the print file's pixel size from the same motif PNGs
// the server reads. Never part of the app's build.
import { createScene, type Layout } from '../../../shared/scene';
import type { Template } from '../../../shared/templates';
import { defaultOverlays, type OverlaySettings } from '../../../src/features/compositor/overlay-settings';
import { drawScene } from '../../../src/features/compositor/render/draw-scene';
import { fontCache } from '../../../src/features/compositor/render/font-cache';
import { MotifImageCache, type MotifBitmap } from '../../../src/features/compositor/render/image-cache';

export type ParityRenderInput = {
  layout: Layout;
  template: Template;
  /** `${motifId}@${version}` -> PNG data URL */
  motifPngs: Record<string, string>;
  width: number;
  height: number;
};

const noOverlays = Object.fromEntries(Object.keys(defaultOverlays).map((k) => [k, false])) as unknown as OverlaySettings;

async function renderForParity(input: ParityRenderInput): Promise<string> {
  const load = async (motifId: string, version: number): Promise<MotifBitmap> => {
    const url = input.motifPngs[`${motifId}@${version}`];
    if (!url) throw new Error(`no PNG for ${motifId}@${version}`);
    return createImageBitmap(await (await fetch(url)).blob());
  };
  let pending = 0;
  let settled: () => void = () => {};
  const allLoaded = new Promise<void>((resolve) => { settled = resolve; });
  const images = new MotifImageCache(load, () => { pending -= 1; if (pending === 0) settled(); });
  const keys = new Set(input.layout.placements.flatMap((p) => (p.type === 'text' ? [] : [`${p.motifId}@${p.version}`])));
  pending = keys.size;
  for (const key of keys) {
    const at = key.lastIndexOf('@');
    images.get(key.slice(0, at), Number(key.slice(at + 1)));
  }
  if (pending > 0) await allLoaded;
  // text is drawn from the shipped fonts' outlines: wait until each font is parsed (a faint box until then)
  for (const p of input.layout.placements) if (p.type === 'text' && !(await fontCache.ready(p.fontId))) throw new Error(`font ${p.fontId} did not load`);

  const canvas = document.createElement('canvas');
  canvas.width = input.width;
  canvas.height = input.height;
  const ctx = canvas.getContext('2d');
  if (!ctx) throw new Error('no 2D context');
  // Print size: one template pixel per canvas pixel.
  drawScene(ctx, createScene(input.layout), input.template, images, { zoom: 1, panX: 0, panY: 0 }, noOverlays, { dpr: 1, screen: { width: input.width, height: input.height } });
  return canvas.toDataURL('image/png');
}

(globalThis as unknown as { renderForParity: typeof renderForParity }).renderForParity = renderForParity;
