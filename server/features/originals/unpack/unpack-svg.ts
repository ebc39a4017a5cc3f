import sharp from 'sharp';
import { useSvgFonts } from '../../../lib/fonts/svg-font-config';
import { formatMegapixels } from './psd-header';
import { sanitiseSvg, SvgRefused } from './sanitise-svg';
import { fontFamiliesNamed, liveTextNote } from './svg-live-text';
import { UnpackError } from './unpack-error';
import { unpackFlatImage } from './unpack-flat-image';
import type { UnpackContext } from './unpack-psd';
import type { UnpackResult } from './unpack-result';

// An SVG drawing becomes one motif, drawn (by librsvg, through sharp) at print resolution after
// sanitise-svg.ts has taken out anything that could run or reach outside the file.

// Drawings are text; one larger than this is not a drawing someone made by hand or exported.
export const MAX_SVG_BYTES = 16 * 1024 * 1024;
// CSS Values and Units: 1 in = 96 px, the unit SVG lengths without one are in.
const CSS_PX_PER_INCH = 96;
// Drawn for print at 300 ppi (common practice), unless that would pass the pixel limits.
const PRINT_PPI = 300;
// libvips draws SVG at 72 dpi by default, one output pixel per SVG px.
const LIBVIPS_SVG_DPI = 72;
// The longest side drawn, as for a PSD (Adobe's limit of 30,000 px a side).
const MAX_SIDE = 30_000;

export async function unpackSvg(file: Buffer, ctx: UnpackContext): Promise<UnpackResult> {
  if (file.length > MAX_SVG_BYTES) {
    throw new UnpackError('svg.too_large', `The SVG is ${(file.length / 1048576).toFixed(1)} MB of text; drawings up to ${MAX_SVG_BYTES / 1048576} MB are accepted`);
  }
  let clean: Awaited<ReturnType<typeof sanitiseSvg>>;
  try {
    clean = await sanitiseSvg(file.toString('utf8'));
  } catch (error) {
    if (error instanceof SvgRefused) throw new UnpackError(error.code, error.message);
    throw error;
  }
  const svg = Buffer.from(clean.svg, 'utf8');
  const hasText = /<text[\s>]/.test(clean.svg);
  // before anything is drawn: fontconfig reads its setting once per process
  const fontsReady = hasText ? await useSvgFonts().then(() => true, () => false) : false;
  // its own size, in CSS px
  const natural = await sizeOf(svg);
  let ppi = PRINT_PPI;
  const scaleAt = (p: number) => p / CSS_PX_PER_INCH;
  const fits = (p: number) => {
    const w = natural.width * scaleAt(p);
    const h = natural.height * scaleAt(p);
    return Math.max(w, h) <= MAX_SIDE && w * h <= ctx.limits.maxDocumentPixels;
  };
  if (!fits(ppi)) {
    // the largest resolution that fits both limits
    const bySide = (MAX_SIDE / Math.max(natural.width, natural.height)) * CSS_PX_PER_INCH;
    const byArea = Math.sqrt(ctx.limits.maxDocumentPixels / (natural.width * natural.height)) * CSS_PX_PER_INCH;
    ppi = Math.floor(Math.min(bySide, byArea));
    if (ppi < 1) throw new UnpackError('image.too_large', `The drawing is ${natural.width} x ${natural.height} px, too large to draw within the ${formatMegapixels(ctx.limits.maxDocumentPixels)} this server accepts`);
  }
  let png: Buffer;
  try {
    png = await sharp(svg, { density: LIBVIPS_SVG_DPI * scaleAt(ppi), limitInputPixels: ctx.limits.maxDocumentPixels, failOn: 'error' })
      .png({ compressionLevel: 0 })
      .withDensity(ppi)
      .toBuffer();
  } catch {
    throw new UnpackError('svg.unreadable', 'The SVG drawing could not be drawn; it is damaged or uses something the renderer cannot read');
  }
  const result = await unpackFlatImage(png, ctx);
  const inches = (px: number) => (px / CSS_PX_PER_INCH).toFixed(2);
  result.report.notes.unshift(`Drawn from the SVG at ${ppi} ppi: the drawing is ${inches(natural.width)} x ${inches(natural.height)} in at 96 px to the inch`);
  if (hasText) result.report.notes.push(liveTextNote(fontFamiliesNamed(clean.svg), fontsReady));
  if (ppi < PRINT_PPI) result.report.notes.push(`Drawn at ${ppi} ppi, not ${PRINT_PPI}, to stay within this server's pixel limits`);
  if (clean.removed.length) result.report.leftOut = clean.removed;
  return result;
}

async function sizeOf(svg: Buffer): Promise<{ width: number; height: number }> {
  try {
    // only the header is read here; the pixel limits are applied to the drawing's size below
    const meta = await sharp(svg, { density: LIBVIPS_SVG_DPI, limitInputPixels: false }).metadata();
    if (!meta.width || !meta.height) throw new Error('no size');
    return { width: meta.width, height: meta.height };
  } catch {
    throw new UnpackError('svg.unreadable', 'The SVG drawing could not be read; it has no size or is damaged');
  }
}
