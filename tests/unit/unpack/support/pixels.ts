import sharp from 'sharp';

export type Rgba = { data: Uint8Array; width: number; height: number };

// Deterministic test pixels with opaque, partly transparent and fully transparent areas.
export function patternPixels(width: number, height: number, seed: number): Rgba {
  const data = new Uint8Array(width * height * 4);
  let state = seed >>> 0;
  const next = () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state >>> 24;
  };
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const p = (y * width + x) * 4;
      const ring = (x + y) % 3;
      data[p] = next();
      data[p + 1] = (x * 7 + seed) & 255;
      data[p + 2] = (y * 11) & 255;
      data[p + 3] = ring === 0 ? 255 : ring === 1 ? next() : 0;
      // keep the edges opaque so the trimmed box is the whole layer
      if (x === 0 || y === 0 || x === width - 1 || y === height - 1) data[p + 3] = 255;
    }
  }
  return { data, width, height };
}

export async function readPngRgba(file: string): Promise<Rgba> {
  const { data, info } = await sharp(file).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
  return { data: new Uint8Array(data.buffer, data.byteOffset, data.length), width: info.width, height: info.height };
}

export async function writePng(file: string, image: Rgba): Promise<void> {
  await sharp(image.data, { raw: { width: image.width, height: image.height, channels: 4 } }).png().toFile(file);
}

// Count of bytes that differ; alpha-0 pixels compare only their alpha
export function differingPixels(a: Rgba, b: Rgba, options: { ignoreColourUnderZeroAlpha?: boolean } = {}): number {
  if (a.width !== b.width || a.height !== b.height) return Number.POSITIVE_INFINITY;
  let differ = 0;
  for (let p = 0; p < a.data.length; p += 4) {
    if (a.data[p + 3] !== b.data[p + 3]) differ++;
    else if (!(options.ignoreColourUnderZeroAlpha && a.data[p + 3] === 0)
      && (a.data[p] !== b.data[p] || a.data[p + 1] !== b.data[p + 1] || a.data[p + 2] !== b.data[p + 2])) differ++;
  }
  return differ;
}
