/**
 * Difference hash of a small grayscale image (row-major, one byte per pixel): one bit per
 * horizontal neighbour pair, 1 when the left pixel is brighter than its right neighbour.
 * The default 9×8 input gives 64 bits = 16 hex characters; bits run row by row, the first
 * pair in the most significant bit of the first character.
 */
export function differenceHash(gray: Uint8Array | Uint8ClampedArray, width = 9, height = 8): string {
  if (!Number.isInteger(width) || !Number.isInteger(height) || width < 2 || height < 1) {
    throw new RangeError(`A difference hash needs at least a 2×1 image, got ${width}×${height}`);
  }
  if (gray.length < width * height) {
    throw new RangeError(`Expected ${width * height} grayscale pixels, got ${gray.length}`);
  }
  let hex = '';
  let nibble = 0;
  let bits = 0;
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width - 1; x++) {
      const i = y * width + x;
      nibble = (nibble << 1) | (gray[i] > gray[i + 1] ? 1 : 0);
      if (++bits === 4) {
        hex += nibble.toString(16);
        nibble = 0;
        bits = 0;
      }
    }
  }
  if (bits > 0) hex += (nibble << (4 - bits)).toString(16);
  return hex;
}

const HEX = /^[0-9a-f]*$/i;
const NIBBLE_BITS = [0, 1, 1, 2, 1, 2, 2, 3, 1, 2, 2, 3, 2, 3, 3, 4];

/** Number of differing bits between two hashes of the same length. */
export function hammingDistanceHex(a: string, b: string): number {
  if (a.length !== b.length || !HEX.test(a) || !HEX.test(b)) {
    throw new RangeError('Hashes must be hex strings of the same length');
  }
  let distance = 0;
  for (let i = 0; i < a.length; i++) distance += NIBBLE_BITS[Number.parseInt(a[i], 16) ^ Number.parseInt(b[i], 16)];
  return distance;
}
