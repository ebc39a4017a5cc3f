import { describe, expect, it } from 'vitest';
import { dominantColours } from './palette';
import { rgbToOklab } from './oklab';
import { hexToRgb } from './srgb';
import { drawImage, noiseBytes, type Rgba } from './test-support/synthetic-image';

const opaque = (hex: string): Rgba => {
  const { r, g, b } = hexToRgb(hex);
  return [r, g, b, 255];
};
const harbourBlue = opaque('#1f4e79');
const mustard = opaque('#f2c14e');
const puffinRed = opaque('#d1495b');

describe('dominant colours of a motif', () => {
  it('finds three flat colours and their shares of the artwork', () => {
    const image = drawImage(100, 100, (_x, y) => (y < 50 ? harbourBlue : y < 80 ? mustard : puffinRed));
    const swatches = dominantColours(image, 100, 100);
    expect(swatches.map((s) => s.hex)).toEqual(['#1f4e79', '#f2c14e', '#d1495b']);
    [0.5, 0.3, 0.2].forEach((share, i) => expect(Math.abs(swatches[i].share - share)).toBeLessThanOrEqual(0.02));
    const expected = rgbToOklab(hexToRgb('#1f4e79'));
    expect(swatches[0].oklab.l).toBeCloseTo(expected.l, 9);
  });

  it('measures shares on a sampled large motif without locking onto alternate columns', () => {
    // 80 000 pixels → sampled on a stride; 1-pixel stripes would alias with an even stride.
    const image = drawImage(200, 400, (x) => (x % 2 === 0 ? harbourBlue : mustard));
    const swatches = dominantColours(image, 200, 400);
    expect(swatches).toHaveLength(2);
    for (const s of swatches) expect(Math.abs(s.share - 0.5)).toBeLessThanOrEqual(0.02);
  });

  it('counts only pixels at least as opaque as the alpha threshold', () => {
    const image = drawImage(10, 10, (x) => (x < 5 ? [209, 73, 91, 0] : x < 8 ? harbourBlue : [242, 193, 78, 100]));
    const swatches = dominantColours(image, 10, 10);
    expect(swatches.map((s) => [s.hex, s.share])).toEqual([['#1f4e79', 1]]);
    const lenient = dominantColours(image, 10, 10, { alphaThreshold: 50 });
    expect(lenient.map((s) => s.hex)).toEqual(['#1f4e79', '#f2c14e']);
    expect(lenient[0].share).toBeCloseTo(0.6, 9);
  });

  it('returns no colours for an empty or fully transparent motif', () => {
    expect(dominantColours(new Uint8Array(0), 0, 0)).toEqual([]);
    expect(dominantColours(new Uint8ClampedArray(64 * 4), 8, 8)).toEqual([]);
    expect(dominantColours(new Uint8ClampedArray(16), Number.NaN, 2)).toEqual([]);
  });

  it('treats colours a level apart as one swatch', () => {
    const image = drawImage(20, 20, (x) => (x < 10 ? [31, 78, 121, 255] : [32, 78, 121, 255]));
    const swatches = dominantColours(image, 20, 20);
    expect(swatches).toHaveLength(1);
    expect(swatches[0].share).toBe(1);
  });

  it('never returns more than the requested number of swatches, and their shares add up to one', () => {
    const image = drawImage(100, 100, (_x, y) => (y < 50 ? harbourBlue : y < 80 ? mustard : puffinRed));
    const two = dominantColours(image, 100, 100, { max: 2 });
    expect(two).toHaveLength(2);
    const noise = noiseBytes(64 * 64 * 4, 7).map((v, i) => (i % 4 === 3 ? 255 : v));
    const six = dominantColours(noise, 64, 64);
    expect(six.length).toBeLessThanOrEqual(6);
    expect(six.length).toBeGreaterThan(1);
    expect(six.reduce((sum, s) => sum + s.share, 0)).toBeCloseTo(1, 9);
    for (let i = 1; i < six.length; i++) expect(six[i - 1].share).toBeGreaterThanOrEqual(six[i].share);
  });

  it('gives the same swatches every time for the same motif', () => {
    const noise = noiseBytes(300 * 200 * 4, 42).map((v, i) => (i % 4 === 3 ? 255 : v));
    expect(dominantColours(noise, 300, 200)).toEqual(dominantColours(noise, 300, 200));
  });

  it('stays quick on a print-size motif by sampling', () => {
    const width = 3000;
    const height = 2000;
    const noise = noiseBytes(width * height * 4, 3);
    const started = performance.now();
    const swatches = dominantColours(noise, width, height);
    const elapsed = performance.now() - started;
    expect(swatches.length).toBeGreaterThan(0);
    expect(elapsed).toBeLessThan(2000); // generous for CI; about 100 ms on the dev machine
  });
});
