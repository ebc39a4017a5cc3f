/**
 * Box-filtered grayscale thumbnail of an RGBA image, e.g. the 9×8 input of a difference hash.
 * Transparent areas count as white, since motifs are judged on white paper; luma uses the
 * Rec. 601 weights on the encoded values (common practice for perceptual hashes).
 */
export function grayThumbnail(
  rgba: Uint8Array | Uint8ClampedArray,
  width: number,
  height: number,
  outWidth = 9,
  outHeight = 8,
): Uint8ClampedArray {
  if (width < 1 || height < 1 || rgba.length < width * height * 4) {
    throw new RangeError(`Expected ${width}×${height} RGBA pixels, got ${rgba.length} bytes`);
  }
  const out = new Uint8ClampedArray(outWidth * outHeight);
  for (let ty = 0; ty < outHeight; ty++) {
    const [y0, y1] = span(ty, outHeight, height);
    for (let tx = 0; tx < outWidth; tx++) {
      const [x0, x1] = span(tx, outWidth, width);
      let sum = 0;
      for (let y = y0; y < y1; y++) {
        for (let x = x0; x < x1; x++) {
          const i = (y * width + x) * 4;
          const alpha = rgba[i + 3] / 255;
          const luma = 0.299 * rgba[i] + 0.587 * rgba[i + 1] + 0.114 * rgba[i + 2];
          sum += luma * alpha + 255 * (1 - alpha);
        }
      }
      out[ty * outWidth + tx] = Math.round(sum / ((x1 - x0) * (y1 - y0)));
    }
  }
  return out;
}

/** Source pixels [start, end) under target cell `t`; at least one pixel when upscaling. */
function span(t: number, outSize: number, size: number): [number, number] {
  const start = Math.min(size - 1, Math.floor((t * size) / outSize));
  return [start, Math.max(start + 1, Math.floor(((t + 1) * size) / outSize))];
}
