export type RgbaPixels = { data: Uint8Array; width: number; height: number };

// 9 x 8 (or any small size) luma of the image composited on white, by area averaging; the input
// of the difference hash. Luma weights are Rec. 601 (0.299, 0.587, 0.114).
export function grayOnWhite(image: RgbaPixels, width: number, height: number): Uint8Array {
  const small = downscaleExact(image, width, height);
  const gray = new Uint8Array(width * height);
  for (let i = 0; i < width * height; i++) {
    const a = small.data[i * 4 + 3] / 255;
    const luma = 0.299 * small.data[i * 4] + 0.587 * small.data[i * 4 + 1] + 0.114 * small.data[i * 4 + 2];
    gray[i] = clampByte(luma * a + 255 * (1 - a));
  }
  return gray;
}

// area average to an exact size (used for tiny hash inputs; stretches like fit 'fill')
function downscaleExact(image: RgbaPixels, width: number, height: number): RgbaPixels {
  const acc = new Float64Array(width * height * 5);
  for (let y = 0; y < image.height; y++) {
    const oy = Math.min(height - 1, Math.floor((y * height) / image.height));
    for (let x = 0; x < image.width; x++) {
      const ox = Math.min(width - 1, Math.floor((x * width) / image.width));
      const p = (y * image.width + x) * 4;
      const o = (oy * width + ox) * 5;
      const a = image.data[p + 3];
      acc[o] += image.data[p] * a;
      acc[o + 1] += image.data[p + 1] * a;
      acc[o + 2] += image.data[p + 2] * a;
      acc[o + 3] += a;
      acc[o + 4] += 1;
    }
  }
  const data = new Uint8Array(width * height * 4);
  for (let i = 0; i < width * height; i++) {
    const a = acc[i * 5 + 3];
    const n = acc[i * 5 + 4];
    if (a > 0) {
      data[i * 4] = clampByte(acc[i * 5] / a);
      data[i * 4 + 1] = clampByte(acc[i * 5 + 1] / a);
      data[i * 4 + 2] = clampByte(acc[i * 5 + 2] / a);
    }
    data[i * 4 + 3] = n > 0 ? clampByte(a / n) : 0;
  }
  return { data, width, height };
}

function clampByte(v: number): number {
  return v <= 0 ? 0 : v >= 255 ? 255 : (v + 0.5) | 0;
}
