import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import opentype from 'opentype.js';
import sharp from 'sharp';
import type { Rect } from '../../../shared/geometry';
import type { TextDrawOp } from '../../../shared/scene';
import { transformedBox } from './affine-sample';
import type { RgbaImage } from './rgba-image';

const require = createRequire(import.meta.url);
const fonts = new Map<number, opentype.Font>();

/** Source Sans 3 from @fontsource (opentype.js reads its WOFF files, not WOFF2); a weight in the id ("…-700") picks the file. */
function fontFor(fontId: string): opentype.Font {
  const weight = Number(/-(\d{3})$/.exec(fontId)?.[1] ?? 400);
  const w = [200, 300, 400, 500, 600, 700, 800, 900].includes(weight) ? weight : 400;
  let font = fonts.get(w);
  if (!font) {
    const bytes = readFileSync(require.resolve(`@fontsource/source-sans-3/files/source-sans-3-latin-${w}-normal.woff`));
    font = opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
    fonts.set(w, font);
  }
  return font;
}

const escapeAttr = (s: string) => s.replace(/[&<>"]/g, (c) => `&#${c.charCodeAt(0)};`);

/**
 * Text as outlines, laid out like the editor's canvas: lines 1.2 em apart, centred vertically in
 * the box, each line's em box middle on its line (canvas textBaseline 'middle'), aligned in the
 * box; rasterised by sharp (librsvg) through the op's matrix. Arcs and letter spacing are not
 * drawn yet.
 */
export async function drawTextLayer(op: TextDrawOp, clip: Rect): Promise<RgbaImage | null> {
  const box = transformedBox(op.matrix, op.width, op.height, clip);
  if (!box || !op.content.trim()) return null;
  const font = fontFor(op.fontId);
  const lines = op.content.split('\n');
  const lineHeight = op.sizePx * 1.2;
  const top = op.height / 2 - ((lines.length - 1) * lineHeight) / 2;
  const middleToBaseline = ((font.ascender + font.descender) / 2 / font.unitsPerEm) * op.sizePx;
  const paths = lines.map((line, i) => {
    const advance = font.getAdvanceWidth(line, op.sizePx);
    const x = op.align === 'left' ? 0 : op.align === 'right' ? op.width - advance : (op.width - advance) / 2;
    return font.getPath(line, x, top + i * lineHeight + middleToBaseline, op.sizePx).toPathData(3);
  });
  const [a, b, c, d, e, f] = op.matrix;
  const width = box.right - box.left;
  const height = box.bottom - box.top;
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">` +
    `<g transform="matrix(${a} ${b} ${c} ${d} ${e - box.left} ${f - box.top})" fill="${escapeAttr(op.colour)}">${paths.map((p) => `<path d="${p}"/>`).join('')}</g></svg>`;
  const { data, info } = await sharp(Buffer.from(svg), { density: 72 }).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
  if (info.width !== width || info.height !== height) return null;
  return { data, width, height, left: box.left, top: box.top };
}
