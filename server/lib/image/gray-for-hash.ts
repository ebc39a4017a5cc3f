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

// area average to an exact size (used for tiny hash inputs; stretches like fit 'fill'). Each
// source pixel falls in cell (floor(x·width / W), floor(y·height / H)); the column of each x is
// worked out once, transparent pixels add nothing but their count (known from the cell's size),
// so the sums, and the bytes, are those of adding every pixel in turn.
function downscaleExact(image: RgbaPixels, width: number, height: number): RgbaPixels {
  const acc = new Float64Array(width * height * 4);
  const cellOfColumn = new Int32Array(image.width);
  const columnsIn = new Float64Array(width);
  for (let x = 0; x < image.width; x++) {
    const ox = Math.min(width - 1, Math.floor((x * width) / image.width));
    cellOfColumn[x] = ox;
    columnsIn[ox]++;
  }
  const rowsIn = new Float64Array(height);
  const src = image.data;
  for (let y = 0; y < image.height; y++) {
    const oy = Math.min(height - 1, Math.floor((y * height) / image.height));
    rowsIn[oy]++;
    const rowCell = oy * width;
    let p = y * image.width * 4;
    for (let x = 0; x < image.width; x++, p += 4) {
      const a = src[p + 3];
      if (a === 0) continue;
      const o = (rowCell + cellOfColumn[x]) * 4;
      acc[o] += src[p] * a;
      acc[o + 1] += src[p + 1] * a;
      acc[o + 2] += src[p + 2] * a;
      acc[o + 3] += a;
    }
  }
  const data = new Uint8Array(width * height * 4);
  for (let i = 0; i < width * height; i++) {
    const a = acc[i * 4 + 3];
    const n = rowsIn[Math.floor(i / width)] * columnsIn[i % width];
    if (a > 0) {
      data[i * 4] = clampByte(acc[i * 4] / a);
      data[i * 4 + 1] = clampByte(acc[i * 4 + 1] / a);
      data[i * 4 + 2] = clampByte(acc[i * 4 + 2] / a);
    }
    data[i * 4 + 3] = n > 0 ? clampByte(a / n) : 0;
  }
  return { data, width, height };
}

function clampByte(v: number): number {
  return v <= 0 ? 0 : v >= 255 ? 255 : (v + 0.5) | 0;
}
