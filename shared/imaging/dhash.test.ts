import { describe, expect, it } from 'vitest';
import { differenceHash, hammingDistanceHex } from './dhash';

const fromRows = (rows: number[][]) => Uint8Array.from(rows.flat());
const rampRows = (rising: boolean) =>
  Array.from({ length: 8 }, () => Array.from({ length: 9 }, (_, x) => (rising ? x * 20 : 200 - x * 20)));

describe('difference hash of a motif thumbnail', () => {
  it('is all zeros for an image that brightens to the right', () => {
    expect(differenceHash(fromRows(rampRows(true)))).toBe('0000000000000000');
  });

  it('is all ones for an image that darkens to the right', () => {
    expect(differenceHash(fromRows(rampRows(false)))).toBe('ffffffffffffffff');
  });

  it('writes the first row in the first two hex characters, left pair first', () => {
    // row 0: pairs 1 0 1 0 | 0 0 0 1 → 0xa1; other rows flat (equal neighbours give 0)
    const rows = Array.from({ length: 8 }, () => Array(9).fill(50));
    rows[0] = [9, 1, 5, 0, 0, 1, 2, 3, 9];
    // pairs: 9>1 1, 1>5 0, 5>0 1, 0>0 0, 0>1 0, 1>2 0, 2>3 0, 3>9 0 → 1010 0000
    expect(differenceHash(fromRows(rows))).toBe('a000000000000000');
    rows[7] = [0, 0, 0, 0, 0, 0, 0, 9, 1];
    expect(differenceHash(fromRows(rows))).toBe('a000000000000001');
  });

  it('ignores overall brightness and contrast changes', () => {
    const rows = rampRows(true).map((row, y) => row.map((v, x) => (x + y) % 3 === 0 ? 255 - v : v));
    const brighter = rows.map((row) => row.map((v) => Math.min(255, Math.round(v * 0.5 + 40))));
    expect(differenceHash(fromRows(brighter))).toBe(differenceHash(fromRows(rows)));
  });

  it('supports other sizes and pads the last hex character', () => {
    // 3×2: pairs per row 2 → 4 bits; 4×1: 3 bits padded to one hex digit
    expect(differenceHash(Uint8Array.from([3, 2, 1, 1, 2, 3]), 3, 2)).toBe('c');
    expect(differenceHash(Uint8Array.from([3, 2, 1, 0]), 4, 1)).toBe('e');
  });

  it('refuses a buffer smaller than the stated size', () => {
    expect(() => differenceHash(new Uint8Array(71))).toThrow(RangeError);
    expect(() => differenceHash(new Uint8Array(1), 1, 1)).toThrow(RangeError);
  });
});

describe('hamming distance of hashes', () => {
  it('counts differing bits', () => {
    expect(hammingDistanceHex('0000000000000000', 'ffffffffffffffff')).toBe(64);
    expect(hammingDistanceHex('a000000000000001', 'a000000000000000')).toBe(1);
    expect(hammingDistanceHex('F0', 'f1')).toBe(1);
    expect(hammingDistanceHex('', '')).toBe(0);
  });

  it('refuses hashes of different lengths or with non-hex characters', () => {
    expect(() => hammingDistanceHex('ab', 'abc')).toThrow(RangeError);
    expect(() => hammingDistanceHex('zz', '00')).toThrow(RangeError);
  });
});
