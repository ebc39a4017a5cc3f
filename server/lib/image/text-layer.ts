import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import opentype from 'opentype.js';
import sharp from 'sharp';
import type { Rect } from '../../../shared/geometry';
import type { TextDrawOp } from '../../../shared/scene';
import type { FontStack, OutlineFont } from '../../../shared/text/outline-font';
import { fontFilesOf } from '../../../shared/text/shipped-fonts';
import { textOutlinePath } from '../../../shared/text/text-layout';
import { transformedBox } from './affine-sample';
import type { RgbaImage } from './rgba-image';

const require = createRequire(import.meta.url);
const stacks = new Map<string, FontStack>();

/** The shipped WOFF files of a font id (opentype.js reads WOFF, not WOFF2), parsed once per process. */
export function fontStackFor(fontId: string): FontStack {
  const files = fontFilesOf(fontId);
  const key = files[0].key;
  let stack = stacks.get(key);
  if (!stack) {
    stack = files.map((file) => {
      const bytes = readFileSync(require.resolve(file.path));
      return opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength)) as unknown as OutlineFont;
    });
    stacks.set(key, stack);
  }
  return stack;
}

const escapeAttr = (s: string) => s.replace(/[&<>"]/g, (c) => `&#${c.charCodeAt(0)};`);

/**
 * Text as outlines from the shared layout (shared/text/text-layout.ts: the editor draws the same
 * path), rasterised by sharp (librsvg) through the op's matrix.
 */
export async function drawTextLayer(op: TextDrawOp, clip: Rect): Promise<RgbaImage | null> {
  const box = transformedBox(op.matrix, op.width, op.height, clip);
  if (!box || !op.content.trim()) return null;
  const d = textOutlinePath(op, { width: op.width, height: op.height }, fontStackFor(op.fontId));
  const [a, b, c, dd, e, f] = op.matrix;
  const width = box.right - box.left;
  const height = box.bottom - box.top;
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">` +
    `<g transform="matrix(${a} ${b} ${c} ${dd} ${e - box.left} ${f - box.top})" fill="${escapeAttr(op.colour)}"><path d="${d}"/></g></svg>`;
  const { data, info } = await sharp(Buffer.from(svg), { density: 72 }).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
  if (info.width !== width || info.height !== height) return null;
  return { data, width, height, left: box.left, top: box.top };
}
