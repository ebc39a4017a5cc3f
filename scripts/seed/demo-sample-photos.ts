import sharp from 'sharp';
import { renderPlan, createScene, type Layout } from '../../shared/scene';
import type { Template } from '../../shared/templates';
import { scaledPlan } from '../../server/features/exports/product-sources';
import { productPreview } from '../../server/features/exports/product-previews';
import { decodeMotifPng, renderPrintFile, type LoadMotifPixels } from '../../server/lib/image/print-render';
import { drawTextLayer } from '../../server/lib/image/text-layer';

// "Phone photos" of the demo samples, drawn by us: the product's own preview (the server's
// renderer) laid on a wooden table top with a soft shadow, saved the way a phone saves a
// portrait photo: 4032 x 3024 pixels on their side, EXIF orientation 6 to stand them up.

export const PHOTO_WIDTH = 3024;
export const PHOTO_HEIGHT = 4032;
// Bump when the drawing changes, so cached photos are drawn again.
export const PHOTO_DRAWING_VERSION = 1;

export type PhotoScene = { kind: 'tote' | 'sheet'; angleDeg: number; table: 'oak' | 'ash'; zoom: number };

/** The product's flat preview, rendered small from the full-resolution motifs. */
export async function renderFlatProductPreview(layout: Layout, template: Template, loadMotif: LoadMotifPixels, maxSide = 1400): Promise<Buffer> {
  const plan = renderPlan(createScene(layout), template);
  const k = Math.min(1, maxSide / Math.max(plan.size.width, plan.size.height));
  const { image } = await renderPrintFile(scaledPlan(plan, k), { loadMotif, drawText: drawTextLayer });
  return productPreview(image, template, 'flat', null);
}

export const motifLoader = (getPng: (motifId: string, version: number) => Promise<Buffer>): LoadMotifPixels => {
  const cache = new Map<string, ReturnType<typeof decodeMotifPng>>();
  return (motifId, version) => {
    const key = `${motifId}@${version}`;
    if (!cache.has(key)) cache.set(key, getPng(motifId, version).then(decodeMotifPng));
    return cache.get(key)!;
  };
};

function tableSvg(table: PhotoScene['table']): string {
  const [light, dark] = table === 'oak' ? ['#c89a68', '#9c6f43'] : ['#d9c4a4', '#b59a76'];
  const planks = [0, 1, 2, 3, 4].map((i) => {
    const x = i * 620 - 40;
    const grain = Array.from({ length: 9 }, (_, j) => {
      const gx = x + 40 + j * 64 + ((i * 37 + j * 13) % 30);
      return `<path d="M${gx},0 C${gx + 30},1100 ${gx - 40},2600 ${gx + 20},${PHOTO_HEIGHT}" stroke="${dark}" stroke-opacity="0.18" stroke-width="${6 + ((i + j) % 4) * 3}" fill="none"/>`;
    }).join('');
    return `<rect x="${x}" y="0" width="612" height="${PHOTO_HEIGHT}" fill="${i % 2 ? light : dark}" fill-opacity="${i % 2 ? 1 : 0.35}"/>${grain}<rect x="${x + 612}" y="0" width="8" height="${PHOTO_HEIGHT}" fill="#5b3f25" fill-opacity="0.5"/>`;
  });
  // window light from the top left, falling off towards the bottom right
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${PHOTO_WIDTH}" height="${PHOTO_HEIGHT}">
    <defs><radialGradient id="light" cx="0.25" cy="0.15" r="1.1"><stop offset="0" stop-color="#fff6e6" stop-opacity="0.35"/><stop offset="1" stop-color="#2a1a0c" stop-opacity="0.45"/></radialGradient></defs>
    <rect width="100%" height="100%" fill="${light}"/>${planks.join('')}<rect width="100%" height="100%" fill="url(#light)"/></svg>`;
}

// The bag: canvas body and handles around the printed panel (the preview).
function toteSvg(width: number, height: number, panel: { x: number; y: number; w: number; h: number }): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}">
    <path d="M${width * 0.28},${height * 0.2} C${width * 0.28},-${height * 0.12} ${width * 0.72},-${height * 0.12} ${width * 0.72},${height * 0.2}" stroke="#d9cbaa" stroke-width="${width * 0.05}" fill="none"/>
    <rect x="0" y="${height * 0.18}" width="${width}" height="${height * 0.82}" rx="${width * 0.012}" fill="#ece2cc"/>
    <path d="M${width * 0.01},${height * 0.2} H${width * 0.99}" stroke="#cbbb98" stroke-width="${width * 0.004}" stroke-dasharray="${width * 0.015} ${width * 0.01}"/></svg>`;
}

/** The product as it lies on the table, before turning: a tote round the panel, or a sheet with a paper edge. */
async function productObject(preview: Buffer, scene: PhotoScene, workScale: number): Promise<Buffer> {
  const meta = await sharp(preview).metadata();
  const pw = meta.width ?? 1000;
  const ph = meta.height ?? 1000;
  const target = Math.round(PHOTO_WIDTH * scene.zoom * workScale);
  if (scene.kind === 'sheet') {
    const w = target;
    const h = Math.round((ph / pw) * w);
    const art = await sharp(preview).resize(w, h).toBuffer();
    return sharp({ create: { width: w, height: h, channels: 4, background: '#ffffff' } }).composite([{ input: art }]).png().toBuffer();
  }
  const w = target;
  const h = Math.round(w * 1.25);
  const panelW = Math.round(w * 0.78);
  const panelH = Math.round((ph / pw) * panelW);
  const panel = { x: Math.round((w - panelW) / 2), y: Math.round(h * 0.18 + (h * 0.82 - panelH) / 2), w: panelW, h: panelH };
  const art = await sharp(preview).resize(panelW, panelH).toBuffer();
  return sharp(Buffer.from(toteSvg(w, h, panel)))
    .composite([{ input: art, left: panel.x, top: panel.y }])
    .png()
    .toBuffer();
}

// The picture is composed at half size and enlarged once when encoded: the display copy is at
// most 2000 px, so nobody sees the difference, and a photo costs a quarter of the work.
const WORK_SCALE = 0.5;

/**
 * One sample photo as a phone would store it: JPEG, the pixels on their side (4032 x 3024) and
 * EXIF orientation 6 to stand them up. Built sideways from the start; the soft parts (table,
 * shadow) are drawn small and enlarged.
 */
export async function drawSamplePhoto(preview: Buffer, scene: PhotoScene): Promise<Buffer> {
  const width = Math.round(PHOTO_HEIGHT * WORK_SCALE); // sideways: the upright height runs across
  const height = Math.round(PHOTO_WIDTH * WORK_SCALE);
  // sharp turns clockwise; the stored picture is the upright one turned a quarter anticlockwise
  const object = await sharp(await productObject(preview, scene, WORK_SCALE))
    .rotate(scene.angleDeg - 90, { background: { r: 0, g: 0, b: 0, alpha: 0 } })
    .png({ compressionLevel: 1 })
    .toBuffer({ resolveWithObject: true });
  const { width: ow, height: oh } = object.info;
  const left = Math.round((width - ow) / 2);
  const top = Math.round((height - oh) / 2);
  const SHRINK = 4;
  const PAD = 12;
  const small = await sharp(object.data)
    .resize(Math.round(ow / SHRINK), Math.round(oh / SHRINK))
    .ensureAlpha()
    .linear([0, 0, 0, 0.55], [30, 20, 10, 0])
    .extend({ top: PAD, bottom: PAD, left: PAD, right: PAD, background: { r: 0, g: 0, b: 0, alpha: 0 } })
    .blur(7)
    .png()
    .toBuffer({ resolveWithObject: true });
  const shadow = await sharp(small.data).resize(small.info.width * SHRINK, small.info.height * SHRINK).png({ compressionLevel: 1 }).toBuffer();
  // light falls down-right in the upright photo, which is down and left in the sideways pixels
  const shadowLeft = clamp(left + 40 - PAD * SHRINK, width - small.info.width * SHRINK);
  const shadowTop = clamp(top - 25 - PAD * SHRINK, height - small.info.height * SHRINK);
  const table = await sharp(Buffer.from(tableSvg(scene.table))).resize(PHOTO_WIDTH / 4, PHOTO_HEIGHT / 4).rotate(270).png().toBuffer();
  const composed = await sharp(table)
    .resize(width, height, { kernel: 'cubic' })
    .composite([
      { input: shadow, left: shadowLeft, top: shadowTop },
      { input: object.data, left: Math.max(0, left), top: Math.max(0, top) },
    ])
    .raw()
    .toBuffer({ resolveWithObject: true });
  return sharp(composed.data, { raw: { width: composed.info.width, height: composed.info.height, channels: composed.info.channels } })
    .resize(PHOTO_HEIGHT, PHOTO_WIDTH, { kernel: 'cubic' })
    .jpeg({ quality: 82 })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

const clamp = (v: number, max: number) => Math.max(0, Math.min(v, Math.max(0, max)));
