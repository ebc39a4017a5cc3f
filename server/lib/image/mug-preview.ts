import sharp from 'sharp';
import { hexToRgb, type Rgb } from '../../../shared/colour';
import type { BlankColours, Template } from '../../../shared/templates';
import { templateGeometry } from '../../../shared/templates';
import { handleInView, MUG_LOOK, wrapCylinder, wrapToCylinder, type WrapView } from '../../../shared/wrap';
import type { RgbaImage } from './rgba-image';

export type MugPreviewOptions = {
  /** Output pixels across the mug body's silhouette. */
  bodyWidth?: number;
  /** Heat-changing blanks when cold: the coating hides the print. */
  printHidden?: boolean;
};

// Drawn twice as large and reduced, so the silhouette and handle edges are anti-aliased.
const SUPERSAMPLE = 2;
// Handle and opening as MUG_LOOK (shared with the editor) draws them. The opening's far half sits
// in the body's top rows (above the print area on the mug wraps), so the preview keeps its size
// and review pins, stored as fractions of it, keep their places.

type Canvas = { data: Uint8Array; width: number; height: number };

/**
 * A mug seen from one side (orthographic): each column of the body copies the print file's
 * column that the shared column map names, on the blank's body colour, times the map's shade;
 * then the opening (edged in the rim's colour) and the handle in the blank's (variant's) colours.
 */
export async function renderMugPreview(print: RgbaImage, template: Template, view: WrapView, blank: BlankColours, options: MugPreviewOptions = {}): Promise<Buffer> {
  const geometry = templateGeometry(template);
  const cyl = wrapCylinder(geometry);
  if (!cyl || !geometry.wrap) throw new Error('mug previews need a wrap template');
  const bodyWidth = Math.round((options.bodyWidth ?? 480) * SUPERSAMPLE);
  const map = wrapToCylinder(cyl, view, { outputWidth: bodyWidth });
  const s = map.scale; // output px per template px
  const bodyHeight = Math.round(geometry.wrap.heightPx * s);
  const margin = Math.round(cyl.radiusPx * s * (MUG_LOOK.handleReach + 0.05));
  const opening = Math.max(1, Math.round((bodyWidth / 2) * MUG_LOOK.openingTilt));
  const canvas: Canvas = { width: bodyWidth + 2 * margin, height: bodyHeight, data: new Uint8Array((bodyWidth + 2 * margin) * bodyHeight * 4) };

  // The print, reduced once to the preview's scale so each column is a plain lookup.
  // `print` may itself be a reduced render: only its aspect is assumed to be the template's.
  const pw = Math.max(1, Math.round(geometry.size.width * s));
  const ph = Math.max(1, Math.round(geometry.size.height * s));
  const small = await sharp(Buffer.from(print.data.buffer, print.data.byteOffset, print.data.byteLength), { raw: { width: print.width, height: print.height, channels: 4 } })
    .resize(pw, ph, { fit: 'fill', kernel: 'lanczos3' })
    .raw()
    .toBuffer();
  const kx = pw / geometry.size.width; // reduced-print px per template px
  const ky = ph / geometry.size.height;
  // The strip sits centred on the blank's height (an assumption; presses centre the wrap).
  const stripTop = ((geometry.wrap.heightPx - geometry.trim.height) / 2 - geometry.trim.y) * s;

  const handle = handleInView(cyl, view);
  const colours = {
    body: hexToRgb(blank.body), rim: hexToRgb(blank.rim ?? blank.body), handle: hexToRgb(blank.handle ?? blank.body), inside: hexToRgb(blank.inside ?? blank.body),
  };
  if (handle.side === 'behind') drawHandle(canvas, margin, bodyWidth, bodyHeight, cyl.radiusPx * s, handle.side, colours.handle);
  drawBody(canvas, margin, map.sourceX, map.shade, bodyHeight, colours.body, options.printHidden ? null : { small, pw, ph, kx, ky, stripTop, s });
  drawOpening(canvas, margin, bodyWidth, opening, colours.inside, colours.rim);
  if (handle.side !== 'behind') drawHandle(canvas, margin, bodyWidth, bodyHeight, cyl.radiusPx * s, handle.side, colours.handle);

  return sharp(Buffer.from(canvas.data.buffer), { raw: { width: canvas.width, height: canvas.height, channels: 4 } })
    .resize(Math.round(canvas.width / SUPERSAMPLE), Math.round(canvas.height / SUPERSAMPLE), { kernel: 'lanczos3' })
    .png()
    .toBuffer();
}

type PrintLookup = { small: Buffer; pw: number; ph: number; kx: number; ky: number; stripTop: number; s: number };

function drawBody(canvas: Canvas, left: number, sourceX: Float64Array, shade: Float32Array, height: number, body: Rgb, print: PrintLookup | null): void {
  for (let i = 0; i < sourceX.length; i++) {
    const light = shade[i];
    const sx = print && sourceX[i] >= 0 ? Math.min(print.pw - 1, Math.floor(sourceX[i] * print.kx)) : -1;
    for (let y = 0; y < height; y++) {
      let r = body.r, g = body.g, b = body.b;
      if (sx >= 0 && print) {
        const sy = Math.floor(((y - print.stripTop) / print.s) * print.ky);
        if (sy >= 0 && sy < print.ph) {
          const p = (sy * print.pw + sx) * 4;
          const a = print.small[p + 3] / 255;
          r = print.small[p] * a + r * (1 - a);
          g = print.small[p + 1] * a + g * (1 - a);
          b = print.small[p + 2] * a + b * (1 - a);
        }
      }
      put(canvas, left + i, y, r * light, g * light, b * light);
    }
  }
}

/**
 * The far half of the opening over the body's top rows: the inside colour, darker towards the
 * back, edged in the rim's colour; beside it, above the front rim's curve, nothing (transparent).
 */
function drawOpening(canvas: Canvas, left: number, width: number, b: number, inside: Rgb, rim: Rgb): void {
  const a = width / 2;
  const cx = left + a;
  const ring = Math.max(1.5, b * 0.18);
  for (let y = 0; y < b; y++) {
    for (let x = left; x < left + width; x++) {
      const d = Math.hypot((x + 0.5 - cx) / a, (y + 0.5 - b) / b);
      if (d > 1) {
        clear(canvas, x, y);
      } else if (d > 1 - ring / b) {
        put(canvas, x, y, rim.r * MUG_LOOK.rimLight, rim.g * MUG_LOOK.rimLight, rim.b * MUG_LOOK.rimLight);
      } else {
        const light = MUG_LOOK.insideLight.back + (MUG_LOOK.insideLight.front - MUG_LOOK.insideLight.back) * (y / b);
        put(canvas, x, y, inside.r * light, inside.g * light, inside.b * light);
      }
    }
  }
}

/** A D-shaped loop beside the body on a side view, or a bar across it when it faces the viewer. */
function drawHandle(canvas: Canvas, left: number, bodyWidth: number, height: number, radius: number, side: 'left' | 'right' | 'in-front' | 'behind', colour: Rgb): void {
  const cy = height / 2;
  const ay = height * MUG_LOOK.handleHalfHeight;
  const t = radius * MUG_LOOK.handleThickness;
  if (side === 'left' || side === 'right') {
    const cx = side === 'right' ? left + bodyWidth : left;
    const ax = radius * MUG_LOOK.handleReach;
    for (let y = Math.floor(cy - ay); y <= Math.ceil(cy + ay); y++) {
      for (let x = Math.floor(cx - ax); x <= Math.ceil(cx + ax); x++) {
        const outside = side === 'right' ? x >= cx : x < cx;
        if (!outside) continue;
        const outer = ((x - cx) / ax) ** 2 + ((y - cy) / ay) ** 2;
        const inner = ((x - cx) / (ax - t)) ** 2 + ((y - cy) / (ay - t)) ** 2;
        if (outer <= 1 && inner > 1) put(canvas, x, y, colour.r * MUG_LOOK.handleLight, colour.g * MUG_LOOK.handleLight, colour.b * MUG_LOOK.handleLight);
      }
    }
    return;
  }
  // Facing the viewer (or hidden behind, drawn first and covered by the body): a bar on the axis.
  const cx = left + bodyWidth / 2;
  for (let y = Math.floor(cy - ay); y <= Math.ceil(cy + ay); y++) {
    for (let x = Math.floor(cx - t); x <= Math.ceil(cx + t); x++) {
      const across = 1 - Math.abs(x - cx) / (t + 1);
      const light = MUG_LOOK.handleLight * (0.75 + 0.25 * across);
      put(canvas, x, y, colour.r * light, colour.g * light, colour.b * light);
    }
  }
}

function clear(canvas: Canvas, x: number, y: number): void {
  if (x < 0 || y < 0 || x >= canvas.width || y >= canvas.height) return;
  canvas.data.fill(0, (y * canvas.width + x) * 4, (y * canvas.width + x) * 4 + 4);
}

function put(canvas: Canvas, x: number, y: number, r: number, g: number, b: number): void {
  if (x < 0 || y < 0 || x >= canvas.width || y >= canvas.height) return;
  const i = (y * canvas.width + x) * 4;
  canvas.data[i] = r;
  canvas.data[i + 1] = g;
  canvas.data[i + 2] = b;
  canvas.data[i + 3] = 255;
}

/** Cards, totes, prints, stickers: the trimmed print on the blank's colour, at most maxSide pixels. */
export async function renderFlatPreview(print: RgbaImage, template: Template, blank: BlankColours, maxSide = 1000): Promise<Buffer> {
  const { trim, size } = templateGeometry(template);
  const f = print.width / size.width; // print px per template px (1 for the print file itself)
  const left = Math.max(0, Math.round(trim.x * f));
  const top = Math.max(0, Math.round(trim.y * f));
  const width = Math.max(1, Math.min(print.width - left, Math.round(trim.width * f)));
  const height = Math.max(1, Math.min(print.height - top, Math.round(trim.height * f)));
  return sharp(Buffer.from(print.data.buffer, print.data.byteOffset, print.data.byteLength), { raw: { width: print.width, height: print.height, channels: 4 } })
    .extract({ left, top, width, height })
    .flatten({ background: blank.body })
    .resize(maxSide, maxSide, { fit: 'inside', withoutEnlargement: true, kernel: 'lanczos3' })
    .png()
    .toBuffer();
}
