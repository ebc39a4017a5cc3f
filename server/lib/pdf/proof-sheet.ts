import { clip, endPath, PDFDocument, popGraphicsState, pushGraphicsState, rectangle, rgb, StandardFonts, type PDFFont, type PDFPage } from 'pdf-lib';
import sharp from 'sharp';
import type { Rect } from '../../../shared/geometry';
import { templateGeometry, type Template } from '../../../shared/templates';
import { drawRulers, RULER_BAND_PT } from './proof-rulers';

export type Paper = 'a4' | 'letter';

// ISO 216 A4 is 210 x 297 mm = 595.28 x 841.89 pt; US Letter is 8.5 x 11 in = 612 x 792 pt (1 pt = 1/72 in, ISO 32000).
export const PAPER_SIZES_PT: Record<Paper, { width: number; height: number; label: string }> = {
  a4: { width: (210 / 25.4) * 72, height: (297 / 25.4) * 72, label: 'A4' },
  letter: { width: 612, height: 792, label: 'US Letter' },
};

export const MM_PT = 72 / 25.4;
// Most office printers cannot print the outer 4–6 mm (from memory); 12 mm leaves room for crop marks.
const MARGIN_PT = 12 * MM_PT;
// Neighbouring tiles repeat this much, so the pages can be overlapped and taped.
export const TILE_OVERLAP_PT = 10 * MM_PT;
const HEADER_PT = 28;
const MARK_PT = 10;

export type ProofSheetInput = { png: Buffer | Uint8Array; template: Template; productName: string; paper: Paper };
export type TileLayout = { landscape: boolean; cols: number; rows: number; tileWidth: number; tileHeight: number; stepX: number; stepY: number; pageWidth: number; pageHeight: number };

/** The print file's size in points at 100 %: pixels / DPI inches. */
export function printSizePt(template: Template): { width: number; height: number } {
  const { size } = templateGeometry(template);
  return { width: (size.width / template.dpi) * 72, height: (size.height / template.dpi) * 72 };
}

/** Portrait or landscape, whichever needs fewer pages; tiles overlap by TILE_OVERLAP_PT. */
export function tileLayout(design: { width: number; height: number }, paper: Paper): TileLayout {
  const options = [false, true].map((landscape) => {
    const p = PAPER_SIZES_PT[paper];
    const pageWidth = landscape ? p.height : p.width;
    const pageHeight = landscape ? p.width : p.height;
    const tileWidth = pageWidth - 2 * MARGIN_PT;
    const tileHeight = pageHeight - 2 * MARGIN_PT - HEADER_PT - RULER_BAND_PT;
    const count = (len: number, tile: number) => (len <= tile ? 1 : Math.ceil((len - TILE_OVERLAP_PT) / (tile - TILE_OVERLAP_PT)));
    const cols = count(design.width, tileWidth);
    const rows = count(design.height, tileHeight);
    return { landscape, cols, rows, tileWidth, tileHeight, stepX: tileWidth - TILE_OVERLAP_PT, stepY: tileHeight - TILE_OVERLAP_PT, pageWidth, pageHeight };
  });
  return options[0].cols * options[0].rows <= options[1].cols * options[1].rows ? options[0] : options[1];
}

/**
 * The print file at exactly 100 % on office paper, tiled with overlap marks when larger than a
 * page: crop marks at the trim, print and safe areas outlined, a 10 cm and a 4 in ruler, and
 * "print at actual size" stated on every page.
 */
export async function buildProofSheet(input: ProofSheetInput): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(`Proof sheet: ${safeText(input.productName)}`);
  doc.setCreator('Motifold');
  const font = await doc.embedFont(StandardFonts.Helvetica);
  // Embedded as JPEG on white (paper is white anyway): pdf-lib passes JPEG through, while a large
  // PNG would be decoded and re-compressed in JavaScript, seconds for an A3 at 300 DPI.
  const jpeg = await sharp(input.png, { limitInputPixels: false }).flatten({ background: '#ffffff' }).jpeg({ quality: 90 }).toBuffer();
  const image = await doc.embedJpg(jpeg);
  const design = printSizePt(input.template);
  const layout = tileLayout(design, input.paper);
  const g = templateGeometry(input.template);
  const ptPerPx = 72 / input.template.dpi;
  const toPt = (r: Rect): Rect => ({ x: r.x * ptPerPx, y: r.y * ptPerPx, width: r.width * ptPerPx, height: r.height * ptPerPx });
  const total = layout.cols * layout.rows;

  for (let row = 0; row < layout.rows; row++) {
    for (let col = 0; col < layout.cols; col++) {
      const page = doc.addPage([layout.pageWidth, layout.pageHeight]);
      const tileTop = layout.pageHeight - MARGIN_PT - HEADER_PT;
      // Page position of design point (x, y) in pt, y measured down from the design's top.
      const originX = MARGIN_PT - col * layout.stepX;
      const originY = tileTop + row * layout.stepY;
      const shownW = Math.min(layout.tileWidth, design.width - col * layout.stepX);
      const shownH = Math.min(layout.tileHeight, design.height - row * layout.stepY);
      page.pushOperators(pushGraphicsState(), rectangle(MARGIN_PT, tileTop - shownH, shownW, shownH), clip(), endPath());
      page.drawImage(image, { x: originX, y: originY - design.height, width: design.width, height: design.height });
      outline(page, toPt(g.printArea), originX, originY, rgb(0.1, 0.45, 0.75), undefined);
      outline(page, toPt(g.safeRect), originX, originY, rgb(0.15, 0.6, 0.3), [4, 3]);
      page.pushOperators(popGraphicsState());
      cropMarks(page, toPt(g.trim), originX, originY, { left: MARGIN_PT, right: MARGIN_PT + shownW, top: tileTop, bottom: tileTop - shownH });
      if (total > 1) overlapMarks(page, font, layout, row, col, tileTop, shownW, shownH);
      header(page, font, input, layout, row, col, tileTop);
      drawRulers(page, font, MARGIN_PT, MARGIN_PT);
    }
  }
  return doc.save();
}

function outline(page: PDFPage, r: Rect, ox: number, oy: number, colour: ReturnType<typeof rgb>, dash: number[] | undefined): void {
  page.drawRectangle({ x: ox + r.x, y: oy - r.y - r.height, width: r.width, height: r.height, borderColor: colour, borderWidth: 0.6, borderDashArray: dash, opacity: 0, borderOpacity: 1 });
}

/** Short lines outside each trim corner, in line with the trim edges (common practice). */
function cropMarks(page: PDFPage, trim: Rect, ox: number, oy: number, shown: { left: number; right: number; top: number; bottom: number }): void {
  const gap = 3;
  const black = rgb(0, 0, 0);
  for (const x of [trim.x, trim.x + trim.width]) {
    for (const y of [trim.y, trim.y + trim.height]) {
      const px = ox + x;
      const py = oy - y;
      // Only the corners on this tile; the others belong to a neighbouring page.
      if (px < shown.left - 0.5 || px > shown.right + 0.5 || py > shown.top + 0.5 || py < shown.bottom - 0.5) continue;
      const sx = x === trim.x ? -1 : 1;
      const sy = y === trim.y ? 1 : -1;
      page.drawLine({ start: { x: px + sx * gap, y: py }, end: { x: px + sx * (gap + MARK_PT), y: py }, thickness: 0.5, color: black });
      page.drawLine({ start: { x: px, y: py + sy * gap }, end: { x: px, y: py + sy * (gap + MARK_PT) }, thickness: 0.5, color: black });
    }
  }
}

/** Dashed lines where the next page's tile begins, so the sheets can be overlapped exactly. */
function overlapMarks(page: PDFPage, font: PDFFont, layout: TileLayout, row: number, col: number, tileTop: number, shownW: number, shownH: number): void {
  const colour = rgb(0.8, 0.2, 0.5);
  if (col < layout.cols - 1) {
    const x = MARGIN_PT + layout.stepX;
    page.drawLine({ start: { x, y: tileTop }, end: { x, y: tileTop - shownH }, thickness: 0.5, color: colour, dashArray: [2, 2] });
    page.drawText('overlap the next page to here', { x: x + 2, y: tileTop - shownH - 9, size: 6, font, color: colour });
  }
  if (row < layout.rows - 1) {
    const y = tileTop - layout.stepY;
    page.drawLine({ start: { x: MARGIN_PT, y }, end: { x: MARGIN_PT + shownW, y }, thickness: 0.5, color: colour, dashArray: [2, 2] });
  }
}

function header(page: PDFPage, font: PDFFont, input: ProofSheetInput, layout: TileLayout, row: number, col: number, tileTop: number): void {
  const title = `${safeText(input.productName)} - ${safeText(input.template.name)}, ${input.template.dpi} DPI`;
  const tile = layout.cols * layout.rows > 1 ? `  |  page ${row * layout.cols + col + 1} of ${layout.cols * layout.rows} (row ${row + 1}, column ${col + 1})` : '';
  page.drawText(`${title}${tile}`.slice(0, 140), { x: MARGIN_PT, y: tileTop + 16, size: 9, font, color: rgb(0, 0, 0) });
  page.drawText(`PRINT AT ACTUAL SIZE (100 %): turn off "fit to page" and any scaling, on ${PAPER_SIZES_PT[input.paper].label}.`, { x: MARGIN_PT, y: tileTop + 5, size: 8, font, color: rgb(0.6, 0.1, 0.1) });
}

/** Helvetica (a standard PDF font) encodes WinAnsi only: names from files are reduced to printable ASCII. */
export function safeText(text: string): string {
  return text.normalize('NFKD').replace(/[\u2018\u2019]/g, "'").replace(/[\u201c\u201d]/g, '"').replace(/[^\x20-\x7e]/g, '').slice(0, 100);
}
