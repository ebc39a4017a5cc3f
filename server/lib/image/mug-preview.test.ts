import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { hexToRgb } from '../../../shared/colour';
import { blankColoursOf, mug11oz, templatePixelSize, printA4 } from '../../../shared/templates';
import { WRAP_VIEWS } from '../../../shared/wrap';
import { renderFlatPreview, renderMugPreview } from './mug-preview';

// A print file whose left half is red and right half blue, full height.
function halves(width: number, height: number) {
  const data = new Uint8Array(width * height * 4);
  for (let y = 0; y < height; y++) for (let x = 0; x < width; x++) data.set(x < width / 2 ? [220, 30, 30, 255] : [30, 30, 220, 255], (y * width + x) * 4);
  return { data, width, height, left: 0, top: 0 };
}

const raw = async (png: Buffer) => sharp(png).raw().toBuffer({ resolveWithObject: true });
const at = (img: { data: Buffer; info: { width: number; channels: number } }, x: number, y: number) => [...img.data.subarray((y * img.info.width + x) * img.info.channels, (y * img.info.width + x) * img.info.channels + 3)];

describe('mug previews', () => {
  const size = templatePixelSize(mug11oz);
  const print = halves(size.width, size.height);

  it('shows the inside colour in the opening, inside the body’s box (review pins keep their places)', async () => {
    const blue = { ...mug11oz.blank, inside: '#2e5e8c', handle: '#2e5e8c' };
    const coloured = await raw(await renderMugPreview(print, mug11oz, 'front', blue, { bodyWidth: 200 }));
    const white = await raw(await renderMugPreview(print, mug11oz, 'front', mug11oz.blank, { bodyWidth: 200 }));
    // a few rows down from the top, at the middle: the far inside wall, shaded
    const inColour = at(coloured, Math.round(coloured.info.width / 2), 5);
    const inWhite = at(white, Math.round(white.info.width / 2), 5);
    expect(inColour[2]).toBeGreaterThan(inColour[0] + 20);
    expect(Math.abs(inWhite[0] - inWhite[2])).toBeLessThan(8);
    // beside the opening, above the body's shoulders, nothing is drawn
    expect(at(coloured, 2, 1)).toEqual([0, 0, 0]);
  });

  it('shows the middle of the wrap on the front and its ends, near the handle, on the back', async () => {
    const front = await raw(await renderMugPreview(print, mug11oz, 'front', mug11oz.blank, { bodyWidth: 200 }));
    const cx = Math.round(front.info.width / 2);
    const cy = Math.round(front.info.height / 2);
    // The front centre is the strip's middle (frontCentreX), where red meets blue: left of it red, right blue.
    const leftOfCentre = at(front, cx - 20, cy);
    const rightOfCentre = at(front, cx + 20, cy);
    expect(leftOfCentre[0]).toBeGreaterThan(leftOfCentre[2]);
    expect(rightOfCentre[2]).toBeGreaterThan(rightOfCentre[0]);
    // Shading (cosine towards the silhouette): the centre is brighter than near the edge.
    const edge = at(front, cx - 90, cy);
    expect(edge[0]).toBeLessThan(leftOfCentre[0]);
  });

  it('draws the handle in the variant’s colour beside the body on the handle views', async () => {
    const blank = blankColoursOf(mug11oz, 'harbour-blue-handle');
    const right = await raw(await renderMugPreview(print, mug11oz, 'handle-right', blank, { bodyWidth: 200 }));
    const handleRgb = hexToRgb(blank.handle!);
    // The loop's outer edge lies just inside the image's right border, at mid height.
    const cy = Math.round(right.info.height / 2);
    const row = Array.from({ length: 40 }, (_, i) => at(right, right.info.width - 1 - i, cy));
    const hit = row.find((p) => Math.abs(p[0] - handleRgb.r * 0.8) < 12 && Math.abs(p[2] - handleRgb.b * 0.8) < 12);
    expect(hit).toBeDefined();
    const left = await raw(await renderMugPreview(print, mug11oz, 'handle-left', blank, { bodyWidth: 200 }));
    const leftRow = Array.from({ length: 40 }, (_, i) => at(left, right.info.width - 1 - i, cy));
    expect(leftRow.some((p) => Math.abs(p[2] - handleRgb.b * 0.8) < 12 && p[0] < 60)).toBe(false);
  });

  it('renders all four sides quickly and hides the print on a cold heat-changing blank', async () => {
    const started = performance.now();
    const pngs = await Promise.all(WRAP_VIEWS.map((v) => renderMugPreview(print, mug11oz, v, mug11oz.blank)));
    expect(pngs).toHaveLength(4);
    expect(performance.now() - started).toBeLessThan(4000);
    const cold = await raw(await renderMugPreview(print, mug11oz, 'front', blankColoursOf(mug11oz, 'heat-changing-cold'), { bodyWidth: 200, printHidden: true }));
    const c = at(cold, Math.round(cold.info.width / 2), Math.round(cold.info.height / 2));
    expect(Math.max(...c)).toBeLessThan(40);
  });
});

describe('flat previews', () => {
  it('shows the trimmed print on the blank colour, reduced to the preview size', async () => {
    const size = templatePixelSize(printA4);
    const print = { data: new Uint8Array(size.width * size.height * 4), width: size.width, height: size.height, left: 0, top: 0 };
    const png = await renderFlatPreview(print, printA4, { body: '#336699' }, 500);
    const img = await raw(png);
    expect(Math.max(img.info.width, img.info.height)).toBe(500);
    expect(at(img, 10, 10)).toEqual([0x33, 0x66, 0x99]);
  });
});
