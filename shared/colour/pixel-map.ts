export type PixelBuffer = Uint8Array | Uint8ClampedArray;

// A direct-mapped cache of 65 536 packed colours (512 KiB): illustrated motifs reuse few
// colours, so most pixels skip the colour maths while memory stays bounded.
const CACHE_BITS = 16;

/**
 * A new RGBA buffer whose colour channels are `map(0xRRGGBB)` of the input's, alpha unchanged.
 * Trailing bytes of a buffer whose length is not a multiple of 4 are copied as they are.
 */
export function mapPixelColours(rgba: PixelBuffer, map: (packed: number) => number): Uint8ClampedArray {
  const out = new Uint8ClampedArray(rgba.length);
  const keys = new Int32Array(1 << CACHE_BITS).fill(-1);
  const values = new Int32Array(1 << CACHE_BITS);
  const whole = rgba.length - (rgba.length % 4);
  for (let i = 0; i < whole; i += 4) {
    const packed = (rgba[i] << 16) | (rgba[i + 1] << 8) | rgba[i + 2];
    const slot = Math.imul(packed, 0x9e3779b1) >>> (32 - CACHE_BITS);
    let mapped: number;
    if (keys[slot] === packed) mapped = values[slot];
    else {
      mapped = map(packed);
      keys[slot] = packed;
      values[slot] = mapped;
    }
    out[i] = mapped >> 16;
    out[i + 1] = (mapped >> 8) & 0xff;
    out[i + 2] = mapped & 0xff;
    out[i + 3] = rgba[i + 3];
  }
  for (let i = whole; i < rgba.length; i++) out[i] = rgba[i];
  return out;
}
