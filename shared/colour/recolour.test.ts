import { describe, expect, it } from 'vitest';
import { converter, convertOklabToRgb } from 'culori';
import { applyRecolour, colourSwap, hueShift, recolourSchema, solidFill, SWAP_SOFT_EDGE_FRACTION } from './recolour';
import { mapPixelColours } from './pixel-map';
import { oklabDistance, oklabToRgbFloat, rgbToOklab } from './oklab';
import { hexToRgb } from './srgb';
import { noiseBytes } from './test-support/synthetic-image';

/** Every 17th level per channel (16³ colours) with varied alpha. */
function colourCube(): Uint8ClampedArray {
  const out: number[] = [];
  for (let r = 0; r <= 255; r += 17)
    for (let g = 0; g <= 255; g += 17)
      for (let b = 0; b <= 255; b += 17) out.push(r, g, b, (r + g + b) % 256);
  return Uint8ClampedArray.from(out);
}

const pixelAt = (data: Uint8ClampedArray, i: number) => ({ r: data[i * 4], g: data[i * 4 + 1], b: data[i * 4 + 2] });

describe('solid fill', () => {
  it('paints every pixel the chosen colour and keeps the motif’s alpha', () => {
    const input = colourCube();
    const before = input.slice();
    const out = solidFill(input, hexToRgb('#2a9d8f'));
    expect(out).not.toBe(input);
    expect(input).toEqual(before);
    const expected = input.map((v, i) => [0x2a, 0x9d, 0x8f, v][i % 4]);
    expect(out).toEqual(expected);
  });
});

describe('hue shift', () => {
  it('leaves the artwork unchanged after a full turn', () => {
    const input = colourCube();
    const out = hueShift(input, 360);
    let worst = 0;
    for (let i = 0; i < out.length; i++) worst = Math.max(worst, Math.abs(out[i] - input[i]));
    expect(worst).toBeLessThanOrEqual(1);
  });

  it('rotates hue in OKLCh as culori does, keeping greys grey', () => {
    const toOklch = converter('oklch'); // culori 4.0.2 reference
    const colours = ['#d1495b', '#2a9d8f', '#8ab17d', '#6d597a'];
    const input = Uint8ClampedArray.from(colours.flatMap((hex) => [...Object.values(hexToRgb(hex)), 255]));
    const out = hueShift(input, 120);
    colours.forEach((hex, i) => {
      const lch = toOklch(hex)!;
      const rotated = { mode: 'oklch' as const, l: lch.l, c: lch.c, h: (lch.h ?? 0) + 120 };
      const lab = converter('oklab')(rotated);
      const expected = convertOklabToRgb(lab);
      const clip = (v: number) => Math.round(Math.min(1, Math.max(0, v)) * 255);
      const got = pixelAt(out, i);
      expect(Math.abs(got.r - clip(expected.r))).toBeLessThanOrEqual(1);
      expect(Math.abs(got.g - clip(expected.g))).toBeLessThanOrEqual(1);
      expect(Math.abs(got.b - clip(expected.b))).toBeLessThanOrEqual(1);
    });
    const grey = hueShift(Uint8ClampedArray.from([128, 128, 128, 255]), 90);
    expect(Array.from(grey)).toEqual([128, 128, 128, 255]);
  });
});

describe('colour swap', () => {
  const from = hexToRgb('#d1495b');
  const to = hexToRgb('#2a9d8f');
  const tolerance = 0.12;
  const inner = tolerance * (1 - SWAP_SOFT_EDGE_FRACTION);

  it('moves only pixels within the tolerance and keeps their alpha', () => {
    const input = colourCube();
    const out = colourSwap(input, from, to, tolerance);
    const source = rgbToOklab(from);
    let inside = 0;
    for (let i = 0; i < input.length / 4; i++) {
      const d = oklabDistance(rgbToOklab(pixelAt(input, i)), source);
      expect(out[i * 4 + 3]).toBe(input[i * 4 + 3]);
      if (d > tolerance) expect(pixelAt(out, i)).toEqual(pixelAt(input, i));
      else if (d < inner) {
        inside++;
        expect(pixelAt(out, i)).not.toEqual(pixelAt(input, i));
      }
    }
    expect(inside).toBeGreaterThan(0);
  });

  it('turns the chosen colour into the new one exactly and keeps a shade’s offset', () => {
    const shade = { r: 225, g: 100, b: 112 }; // a lighter red whose swapped shade stays inside sRGB
    const input = Uint8ClampedArray.from([from.r, from.g, from.b, 255, shade.r, shade.g, shade.b, 200]);
    const out = colourSwap(input, from, to, tolerance);
    expect(pixelAt(out, 0)).toEqual(to);
    expect(out[7]).toBe(200);

    const [shadeLab, fromLab, toLab] = [rgbToOklab(shade), rgbToOklab(from), rgbToOklab(to)];
    expect(oklabDistance(shadeLab, fromLab)).toBeLessThan(inner);
    const target = { l: shadeLab.l + toLab.l - fromLab.l, a: shadeLab.a + toLab.a - fromLab.a, b: shadeLab.b + toLab.b - fromLab.b };
    for (const v of Object.values(oklabToRgbFloat(target))) expect(v >= 0 && v <= 255).toBe(true);
    const swappedLab = rgbToOklab(pixelAt(out, 1));
    for (const axis of ['l', 'a', 'b'] as const) {
      // offset from the new colour equals the old offset, up to one 8-bit step of rounding
      expect(Math.abs(swappedLab[axis] - toLab[axis] - (shadeLab[axis] - fromLab[axis]))).toBeLessThan(0.004);
    }
  });

  it('fades the swap out towards the edge of the tolerance', () => {
    const source = rgbToOklab(from);
    const edgePixels: number[] = [];
    const input = colourCube();
    for (let i = 0; i < input.length / 4; i++) {
      const d = oklabDistance(rgbToOklab(pixelAt(input, i)), source);
      if (d > inner + 0.005 && d < tolerance - 0.005) edgePixels.push(i);
    }
    expect(edgePixels.length).toBeGreaterThan(0);
    const out = colourSwap(input, from, to, tolerance);
    const fullShift = oklabDistance(rgbToOklab(from), rgbToOklab(to));
    for (const i of edgePixels) {
      const moved = oklabDistance(rgbToOklab(pixelAt(out, i)), rgbToOklab(pixelAt(input, i)));
      expect(moved).toBeLessThan(fullShift - 0.01);
    }
  });
});

describe('saved recolours', () => {
  it('accepts the four kinds and rejects malformed ones', () => {
    expect(recolourSchema.parse({ kind: 'none' })).toEqual({ kind: 'none' });
    expect(recolourSchema.safeParse({ kind: 'hue', degrees: 45 }).success).toBe(true);
    expect(recolourSchema.safeParse({ kind: 'fill', colour: '#abc' }).success).toBe(true);
    expect(recolourSchema.safeParse({ kind: 'swap', from: '#d1495b', to: '#2a9d8f', tolerance: 0.1 }).success).toBe(true);
    expect(recolourSchema.safeParse({ kind: 'fill', colour: 'red' }).success).toBe(false);
    expect(recolourSchema.safeParse({ kind: 'swap', from: '#d1495b', to: '#2a9d8f', tolerance: -1 }).success).toBe(false);
    expect(recolourSchema.safeParse({ kind: 'hue', degrees: Number.POSITIVE_INFINITY }).success).toBe(false);
    expect(recolourSchema.safeParse({ kind: 'tint' }).success).toBe(false);
  });

  it('applies each kind and always returns a new buffer', () => {
    const input = Uint8ClampedArray.from([209, 73, 91, 255, 10, 20, 30, 0]);
    const none = applyRecolour(input, { kind: 'none' });
    expect(none).not.toBe(input);
    expect(none).toEqual(input);
    expect(Array.from(applyRecolour(input, { kind: 'fill', colour: '#fff' }))).toEqual([255, 255, 255, 255, 255, 255, 255, 0]);
    expect(applyRecolour(input, { kind: 'hue', degrees: 90 })).toEqual(hueShift(input, 90));
    const swapped = applyRecolour(input, { kind: 'swap', from: '#d1495b', to: '#2a9d8f', tolerance: 0.05 });
    expect(Array.from(swapped)).toEqual([0x2a, 0x9d, 0x8f, 255, 10, 20, 30, 0]);
  });
});

describe('pixel colour mapping', () => {
  it('never mixes up colours that share a cache slot', () => {
    const input = noiseBytes(1 << 20, 11);
    const out = mapPixelColours(input, (packed) => packed ^ 0x00ff00);
    for (let i = 0; i < input.length; i += 4) {
      if (out[i] !== input[i] || out[i + 1] !== (input[i + 1] ^ 0xff) || out[i + 2] !== input[i + 2]) {
        throw new Error(`pixel ${i / 4} mapped wrongly`);
      }
    }
    expect(out[3]).toBe(input[3]);
  });

  it('copies the stray bytes of a buffer that is not whole pixels', () => {
    const out = mapPixelColours(Uint8Array.from([1, 2, 3, 4, 5, 6]), () => 0);
    expect(Array.from(out)).toEqual([0, 0, 0, 4, 5, 6]);
  });
});
