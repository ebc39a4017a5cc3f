import { endianness } from 'node:os';
import type { PixelBox, RgbaImage } from './rgba-image';

const LITTLE_ENDIAN = endianness() === 'LE';

// Box of the pixels with alpha > 0, relative to the image; null when nothing is visible.
export function alphaBounds(image: RgbaImage): PixelBox | null {
  const { width, height } = image;
  // on little-endian machines a pixel read as one uint32 has its alpha in the top byte, so
  // "alpha > 0" is "value > 0x00ffffff"; otherwise alpha is every 4th byte
  const packed = LITTLE_ENDIAN && image.data.byteOffset % 4 === 0;
  const values = packed ? new Uint32Array(image.data.buffer, image.data.byteOffset, width * height) : image.data;
  const stride = packed ? 1 : 4;
  const first = packed ? 0 : 3;
  const limit = packed ? 0x00ffffff : 0;
  let top = -1;
  let bottom = -1;
  let left = width;
  let right = -1;
  for (let y = 0; y < height; y++) {
    const row = y * width * stride + first;
    let x0 = -1;
    for (let x = 0; x < width; x++) {
      if (values[row + x * stride] > limit) {
        x0 = x;
        break;
      }
    }
    if (x0 < 0) continue;
    if (top < 0) top = y;
    bottom = y;
    if (x0 < left) left = x0;
    for (let x = width - 1; x > right; x--) {
      if (values[row + x * stride] > limit) {
        right = x;
        break;
      }
    }
  }
  if (top < 0) return null;
  return { left, top, right: right + 1, bottom: bottom + 1 };
}
