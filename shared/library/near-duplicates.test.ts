import { describe, expect, it } from 'vitest';
import { LOOKS_LIKE_MAX_BITS, nearDuplicates } from './near-duplicates';

describe('motifs that look alike', () => {
  it('finds hashes within 10 bits, nearest first, leaving out the motif itself', () => {
    const target = { id: 'a', dhash: '0000000000000000' };
    const found = nearDuplicates(target, [
      target,
      { id: 'far', dhash: 'ffff000000000000' }, // 16 bits
      { id: 'edge', dhash: '00000000000003ff' }, // 10 bits
      { id: 'near', dhash: '0000000000000007' }, // 3 bits
    ]);
    expect(found.map((f) => [f.motif.id, f.distance])).toEqual([['near', 3], ['edge', 10]]);
    expect(LOOKS_LIKE_MAX_BITS).toBe(10);
  });
});
