import sharp from 'sharp';
import { useSvgFonts } from '../../../lib/fonts/svg-font-config';
import { shippedFonts } from '../../../../shared/text/shipped-fonts';
import { formatMegapixels } from './psd-header';
import { sanitiseSvg, SvgRefused } from './sanitise-svg';
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

const GENERIC_FAMILIES = new Set(['serif', 'sans-serif', 'monospace', 'cursive', 'fantasy', 'system-ui', 'emoji', 'math', 'fangsong', 'ui-serif', 'ui-sans-serif', 'ui-monospace', 'ui-rounded', 'inherit', 'initial', 'unset']);

// The typefaces the drawing's text asks for by name (font-family attributes and CSS), generic
// families left out; at most a few, each cut short and stripped of control characters.
export function fontFamiliesNamed(svg: string): string[] {
  const found = new Map<string, string>();
  const decode = (text: string) => text.replace(/&quot;|&#34;/g, '"').replace(/&apos;|&#39;/g, "'");
  const lists = [...svg.matchAll(/font-family\s*=\s*(?:"([^"]*)"|'([^']*)')/gi)].map((m) => decode(m[1] ?? m[2] ?? ''));
  // CSS, in style attributes and style elements
  const sheets = [...svg.matchAll(/\sstyle\s*=\s*(?:"([^"]*)"|'([^']*)')|<style[^>]*>([\s\S]*?)<\/style>/gi)].map((m) => decode(m[1] ?? m[2] ?? m[3] ?? ''));
  for (const sheet of sheets) for (const m of sheet.matchAll(/font-family\s*:\s*([^;}]+)/gi)) lists.push(m[1]);
  for (const list of lists) {
    for (const part of list.split(',')) {
      const name = part.replace(/!important/i, '').trim().replace(/^["']|["']$/g, '').replace(/[\u0000-\u001f\u007f]/g, '').trim().slice(0, 60);
      if (!name || GENERIC_FAMILIES.has(name.toLowerCase())) continue;
      if (!found.has(name.toLowerCase())) found.set(name.toLowerCase(), name);
    }
  }
  return [...found.values()].slice(0, 8);
}

// librsvg draws live text with the app's own typefaces (svg-font-config.ts) or this server's.
export function liveTextNote(families: string[], fontsReady: boolean): string {
  const exact = 'To keep the lettering exact, turn text into outlines before exporting.';
  if (!fontsReady) return `The drawing has live text, drawn with the fonts this server has, which may differ from yours. ${exact}`;
  const shipped = new Set(shippedFonts.map((f) => f.name.toLowerCase()));
  const missing = families.filter((name) => !shipped.has(name.toLowerCase()));
  const present = families.filter((name) => shipped.has(name.toLowerCase()));
  const list = (names: string[]) => names.map((n) => `"${n}"`).join(', ');
  if (missing.length > 0) {
    const more = missing.length > 3 ? ` and ${missing.length - 3} more` : '';
    return `The drawing's live text asks for ${list(missing.slice(0, 3))}${more}, which this app does not have, so that text is drawn in ${shippedFonts[0].name} (or the closest font on this server). ${exact}`;
  }
  if (present.length > 0) return `The drawing's live text is drawn in this app's own ${list(present)}; a weight the app does not ship takes the nearest one. ${exact}`;
  return `The drawing's live text names no typeface and is drawn in ${shippedFonts[0].name}. ${exact}`;
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
