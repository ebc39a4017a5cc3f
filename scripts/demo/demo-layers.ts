import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Layer, LayerTextData, Psd } from 'ag-psd';
import opentype from 'opentype.js';
import sharp from 'sharp';
import { alphaBounds } from '../../server/lib/image/alpha-bounds';
import { compositeOnto } from '../../server/lib/image/composite-rgba';
import type { RgbaImage } from '../../server/lib/image/rgba-image';

// A demo original described as SVG layers, bottom to top, the way the PSD stores them.
export type DemoLayer = {
  name: string;
  // SVG elements drawn on the full canvas
  svg: string;
  opacity?: number;
  blendMode?: string;
  hidden?: boolean;
  clipping?: boolean;
  text?: { content: string; fontName: string; sizePt: number; x: number; y: number };
};
export type DemoGroup = { name: string; children: DemoNode[]; opacity?: number; blendMode?: string; hidden?: boolean };
export type DemoNode = DemoLayer | DemoGroup;
export type DemoDocument = { width: number; height: number; ppi: number; children: DemoNode[] };

export const isGroup = (node: DemoNode): node is DemoGroup => 'children' in node;

export async function renderSvgLayer(svg: string, width: number, height: number): Promise<RgbaImage | null> {
  const document = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">${svg}</svg>`;
  const { data } = await sharp(Buffer.from(document)).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
  const full: RgbaImage = { data: new Uint8Array(data.buffer, data.byteOffset, data.length), width, height, left: 0, top: 0 };
  const box = alphaBounds(full);
  if (!box) return null;
  const w = box.right - box.left;
  const h = box.bottom - box.top;
  const out = new Uint8Array(w * h * 4);
  for (let y = 0; y < h; y++) {
    const start = ((box.top + y) * width + box.left) * 4;
    out.set(full.data.subarray(start, start + w * 4), y * w * 4);
  }
  return { data: out, width: w, height: h, left: box.left, top: box.top };
}

const require = createRequire(import.meta.url);
const fontCache = new Map<number, opentype.Font>();

// Text drawn as outlines with opentype.js (it reads WOFF, not WOFF2).
export function textPath(text: string, weight: number, sizePx: number, x: number, y: number, anchor: 'start' | 'middle' = 'middle'): string {
  let font = fontCache.get(weight);
  if (!font) {
    const file = require.resolve(`@fontsource/source-sans-3/files/source-sans-3-latin-${weight}-normal.woff`);
    const bytes = readFileSync(file);
    font = opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.length));
    fontCache.set(weight, font);
  }
  const advance = font.getAdvanceWidth(text, sizePx);
  const startX = anchor === 'middle' ? x - advance / 2 : x;
  return font.getPath(text, startX, y, sizePx).toPathData(2);
}

type Rendered = { node: DemoNode; image: RgbaImage | null; children?: Rendered[] };

async function renderTree(nodes: DemoNode[], width: number, height: number, scale: number): Promise<Rendered[]> {
  const out: Rendered[] = [];
  for (const node of nodes) {
    if (isGroup(node)) out.push({ node, image: null, children: await renderTree(node.children, width, height, scale) });
    else out.push({ node, image: await renderSvgLayer(scale === 1 ? node.svg : `<g transform="scale(${scale})">${node.svg}</g>`, width, height) });
  }
  return out;
}

// The merged image a PSD carries for previews, flattened with our own compositor.
function flatten(rendered: Rendered[], canvas: RgbaImage): void {
  for (let i = 0; i < rendered.length; i++) {
    const item = rendered[i];
    if (item.node.hidden) continue;
    let image = item.image;
    if (item.children) {
      image = { data: new Uint8Array(canvas.width * canvas.height * 4), width: canvas.width, height: canvas.height, left: 0, top: 0 };
      flatten(item.children, image);
    }
    if (!image) continue;
    const clipped: Rendered[] = [];
    while (i + 1 < rendered.length && !isGroup(rendered[i + 1].node) && (rendered[i + 1].node as DemoLayer).clipping) clipped.push(rendered[++i]);
    if (clipped.length > 0) {
      image = { ...image, data: image.data.slice() };
      for (const c of clipped) {
        if (c.image && !c.node.hidden) compositeOnto(image, c.image, { blendMode: c.node.blendMode ?? 'normal', opacity: c.node.opacity ?? 1, clipToBackdrop: true });
      }
    }
    const mode = item.node.blendMode ?? 'normal';
    compositeOnto(canvas, image, { blendMode: mode === 'pass through' ? 'normal' : mode, opacity: item.node.opacity ?? 1 });
  }
}

function toPsdLayers(rendered: Rendered[], scale: number): Layer[] {
  return rendered.map(({ node, image, children }) => {
    const common: Layer = {
      name: node.name,
      ...(node.opacity !== undefined ? { opacity: node.opacity } : {}),
      ...(node.blendMode ? { blendMode: node.blendMode as Layer['blendMode'] } : {}),
      ...(node.hidden ? { hidden: true } : {}),
    };
    if (children) return { ...common, opened: true, children: toPsdLayers(children, scale) };
    const layer = node as DemoLayer;
    const pixels = image
      ? { left: image.left, top: image.top, imageData: { width: image.width, height: image.height, data: new Uint8ClampedArray(image.data.buffer, image.data.byteOffset, image.data.length) } as ImageData }
      : {};
    return { ...common, ...(layer.clipping ? { clipping: true } : {}), ...pixels, ...(layer.text ? { text: textData(layer.text, scale) } : {}) };
  });
}

function textData(text: NonNullable<DemoLayer['text']>, scale: number): LayerTextData {
  return {
    text: text.content,
    transform: [1, 0, 0, 1, text.x * scale, text.y * scale],
    style: { font: { name: text.fontName }, fontSize: text.sizePt, fillColor: { r: 35, g: 57, b: 91 } },
  };
}

// `scale` draws a smaller copy (same artwork, same print size at a lower PPI), for fast tests.
export async function buildDemoPsd(doc: DemoDocument, scale = 1): Promise<Psd> {
  const width = Math.round(doc.width * scale);
  const height = Math.round(doc.height * scale);
  const ppi = Math.round(doc.ppi * scale * 100) / 100;
  const rendered = await renderTree(doc.children, width, height, scale);
  const merged: RgbaImage = { data: new Uint8Array(width * height * 4), width, height, left: 0, top: 0 };
  flatten(rendered, merged);
  return {
    width,
    height,
    imageResources: {
      resolutionInfo: {
        horizontalResolution: ppi, horizontalResolutionUnit: 'PPI', widthUnit: 'Inches',
        verticalResolution: ppi, verticalResolutionUnit: 'PPI', heightUnit: 'Inches',
      },
    },
    imageData: { width, height, data: new Uint8ClampedArray(merged.data.buffer) } as ImageData,
    children: toPsdLayers(rendered, scale),
  };
}
