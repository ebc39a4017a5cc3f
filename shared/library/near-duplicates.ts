import { hammingDistanceHex } from '../imaging/dhash';

// Of a 64-bit difference hash, up to 10 differing bits is the usual "same picture" line: a
// rescaled or re-encoded copy lands within a few bits, unrelated artwork near 32 (common
// practice for dHash).
export const LOOKS_LIKE_MAX_BITS = 10;

export type HashedMotif = { id: string; dhash: string };

// Nearest first, without the motif itself; hashes of another length are never near.
export function nearDuplicates<T extends HashedMotif>(target: HashedMotif, candidates: Iterable<T>, maxBits = LOOKS_LIKE_MAX_BITS) {
  const found: { motif: T; distance: number }[] = [];
  for (const motif of candidates) {
    if (motif.id === target.id || motif.dhash.length !== target.dhash.length) continue;
    const distance = hammingDistanceHex(target.dhash, motif.dhash);
    if (distance <= maxBits) found.push({ motif, distance });
  }
  return found.sort((a, b) => a.distance - b.distance || a.motif.id.localeCompare(b.motif.id));
}
