import { decodePDFRawStream, PDFArray, PDFDocument, PDFRawStream, type PDFPage } from 'pdf-lib';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { mug11oz, printA3, templatePixelSize, type Template } from '../../../shared/templates';
import { buildProofSheet, printSizePt, tileLayout } from './proof-sheet';

async function pngFor(t: Template) {
  const { width, height } = templatePixelSize(t);
  // the proof only needs the right pixel count; a small flat PNG keeps the test fast
  return sharp({ create: { width, height, channels: 4, background: { r: 40, g: 90, b: 140, alpha: 1 } } }).png({ compressionLevel: 1 }).toBuffer();
}

function contentOf(page: PDFPage): string {
  const contents = page.node.Contents();
  const streams = contents instanceof PDFArray ? contents.asArray().map((r) => page.doc.context.lookup(r)) : [contents];
  return streams.map((s) => Buffer.from(decodePDFRawStream(s as PDFRawStream).decode()).toString('latin1')).join('\n');
}

/** Straight lines drawn by the page's own operators: "x1 y1 m x2 y2 l S" with their line width. */
function linesOf(content: string) {
  const out: { x1: number; y1: number; x2: number; y2: number; width: number }[] = [];
  const re = /([\d.]+) w\n(?:[^\n]*\n)*?([-\d.]+) ([-\d.]+) m\n([-\d.]+) ([-\d.]+) l\nS/g;
  for (const m of content.matchAll(re)) out.push({ width: Number(m[1]), x1: Number(m[2]), y1: Number(m[3]), x2: Number(m[4]), y2: Number(m[5]) });
  return out;
}

const textOf = (content: string) => [...content.matchAll(/<([0-9A-Fa-f]+)> Tj/g)].map((m) => Buffer.from(m[1], 'hex').toString('latin1')).join(' ');

describe('proof sheet', () => {
  it('puts the 11 oz mug wrap on one A4 page at 100 % with rulers of true length', async () => {
    const pdf = await PDFDocument.load(await buildProofSheet({ png: await pngFor(mug11oz), template: mug11oz, productName: 'Coastal Spring mug', paper: 'a4' }));
    expect(pdf.getPageCount()).toBe(1);
    const page = pdf.getPage(0);
    // ISO 216 A4 = 210 x 297 mm = 595.28 x 841.89 pt (reference/paper-sizes.csv), here landscape
    expect(page.getWidth()).toBeCloseTo(841.89, 2);
    expect(page.getHeight()).toBeCloseTo(595.28, 2);
    const content = contentOf(page);
    // The image is drawn 8.5 x 3.5 in = 612 x 252 pt (1 pt = 1/72 in, ISO 32000-1): "612 0 0 252 x y cm"
    expect(content).toMatch(/\n612 0 0 252 [-\d.]+ [-\d.]+ cm\n/);
    const baselines = linesOf(content).filter((l) => l.width === 0.75 && l.y1 === l.y2).map((l) => l.x2 - l.x1);
    // 10 cm = 100 / 25.4 * 72 = 283.4646 pt; 4 in = 288 pt
    expect(baselines.some((len) => Math.abs(len - 283.4646) < 0.001)).toBe(true);
    expect(baselines.some((len) => Math.abs(len - 288) < 0.001)).toBe(true);
    expect(textOf(content)).toMatch(/PRINT AT ACTUAL SIZE \(100 %\)/);
  });

  it('tiles a larger print across Letter pages with overlap marks and page numbers', async () => {
    const design = printSizePt(printA3);
    const layout = tileLayout(design, 'letter');
    expect(layout.cols * layout.rows).toBeGreaterThan(1);
    const pdf = await PDFDocument.load(await buildProofSheet({ png: await pngFor(printA3), template: printA3, productName: 'Lantern Walk print', paper: 'letter' }));
    expect(pdf.getPageCount()).toBe(layout.cols * layout.rows);
    const sizes = pdf.getPages().map((p) => [p.getWidth(), p.getHeight()].sort((a, b) => a - b));
    // US Letter: 8.5 x 11 in = 612 x 792 pt
    for (const s of sizes) expect(s).toEqual([612, 792]);
    const first = contentOf(pdf.getPage(0));
    expect(textOf(first)).toMatch(/page 1 of \d/);
    expect(textOf(first)).toMatch(/overlap the next page/);
    // Every tile still carries both rulers.
    const last = contentOf(pdf.getPage(pdf.getPageCount() - 1));
    expect(linesOf(last).filter((l) => l.width === 0.75).length).toBeGreaterThanOrEqual(2);
  });
});
