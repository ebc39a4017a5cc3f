import type { PixelBox, RgbaImage } from './rgba-image';

// Box of the pixels with alpha > 0, relative to the image; null when nothing is visible.
export function alphaBounds(image: RgbaImage): PixelBox | null {
  const { data, width, height } = image;
  let top = -1;
  let bottom = -1;
  let left = width;
  let right = -1;
  for (let y = 0; y < height; y++) {
    const row = y * width * 4;
    let first = -1;
    for (let x = 0; x < width; x++) {
      if (data[row + x * 4 + 3] !== 0) {
        first = x;
        break;
      }
    }
    if (first < 0) continue;
    if (top < 0) top = y;
    bottom = y;
    if (first < left) left = first;
    for (let x = width - 1; x > right; x--) {
      if (data[row + x * 4 + 3] !== 0) {
        right = x;
        break;
      }
    }
  }
  if (top < 0) return null;
  return { left, top, right: right + 1, bottom: bottom + 1 };
}
