// Test-only: small RGBA images drawn from a per-pixel function.
export type Rgba = [number, number, number, number];

export function drawImage(width: number, height: number, pixel: (x: number, y: number) => Rgba): Uint8ClampedArray {
  const data = new Uint8ClampedArray(width * height * 4);
  for (let y = 0; y < height; y++)
    for (let x = 0; x < width; x++) data.set(pixel(x, y), (y * width + x) * 4);
  return data;
}

/** Deterministic pseudo-random bytes (xorshift32), so noisy test images are the same every run. */
export function noiseBytes(length: number, seed = 1): Uint8ClampedArray {
  const out = new Uint8ClampedArray(length);
  let s = seed >>> 0 || 1;
  for (let i = 0; i < length; i++) {
    s ^= s << 13;
    s >>>= 0;
    s ^= s >>> 17;
    s ^= s << 5;
    s >>>= 0;
    out[i] = s & 0xff;
  }
  return out;
}
