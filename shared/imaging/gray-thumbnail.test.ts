import { describe, expect, it } from 'vitest';
import { differenceHash } from './dhash';
import { grayThumbnail } from './gray-thumbnail';

describe('grayscale thumbnail for hashing', () => {
  it('averages each cell and counts transparency as white', () => {
    // 18×8 image: left half black, right half transparent
    const rgba = new Uint8ClampedArray(18 * 8 * 4);
    for (let y = 0; y < 8; y++) for (let x = 0; x < 18; x++) rgba[(y * 18 + x) * 4 + 3] = x < 9 ? 255 : 0;
    const thumb = grayThumbnail(rgba, 18, 8);
    expect(thumb).toHaveLength(72);
    // cells 0–3 and 5–8 pure; cell 4 covers columns 8–9: half black, half white
    expect(Array.from(thumb.slice(0, 9))).toEqual([0, 0, 0, 0, 128, 255, 255, 255, 255]);
    expect(differenceHash(thumb)).toBe('0000000000000000');
  });

  it('weights channels by Rec. 601 luma', () => {
    const red = Uint8ClampedArray.from([255, 0, 0, 255]);
    expect(grayThumbnail(red, 1, 1, 1, 1)[0]).toBe(76); // 0.299·255, common practice weights
  });

  it('stretches an image smaller than the thumbnail', () => {
    const twoPixels = Uint8ClampedArray.from([0, 0, 0, 255, 255, 255, 255, 255]);
    const thumb = grayThumbnail(twoPixels, 2, 1);
    expect(Array.from(thumb.slice(0, 9))).toEqual([0, 0, 0, 0, 0, 255, 255, 255, 255]);
  });
});
