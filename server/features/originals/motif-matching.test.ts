import { describe, expect, it } from 'vitest';
import { matchIncomingMotifs, type KnownMotif } from './motif-matching';

const known = (motifId: string, sourcePath: string, contentHash: string, version = 1): KnownMotif => ({ motifId, name: motifId, sourcePath, contentHash, version });

describe('matching a new version of an original to its motifs', () => {
  it('keeps a layer with the same path and pixels as unchanged', () => {
    const r = matchIncomingMotifs([{ sourcePath: 'Puffins/Left', contentHash: 'a' }], [known('m1', 'Puffins/Left', 'a')], new Map());
    expect(r.decisions[0]).toEqual({ kind: 'unchanged', motifId: 'm1', version: 1 });
    expect(r.removed).toEqual([]);
  });

  it('gives a changed layer at the same path a new version', () => {
    const r = matchIncomingMotifs([{ sourcePath: 'Kite', contentHash: 'b' }], [known('m2', 'Kite', 'a', 3)], new Map());
    expect(r.decisions[0]).toEqual({ kind: 'new-version', motifId: 'm2', version: 4 });
  });

  it('matches a renamed layer by its pixels', () => {
    const r = matchIncomingMotifs([{ sourcePath: 'Kite (red)', contentHash: 'a' }], [known('m2', 'Kite', 'a')], new Map());
    expect(r.decisions[0]).toEqual({ kind: 'unchanged', motifId: 'm2', version: 1 });
  });

  it('reports layers that disappeared and makes new layers new motifs', () => {
    const r = matchIncomingMotifs([{ sourcePath: 'Sandwich', contentHash: 'z' }], [known('m3', 'Basket', 'q')], new Map());
    expect(r.decisions[0]).toEqual({ kind: 'new' });
    expect(r.removed.map((m) => m.motifId)).toEqual(['m3']);
  });

  it('links pixels the studio already has instead of duplicating them', () => {
    const studio = new Map([['h', known('m9', 'Wave band', 'h', 2)]]);
    const r = matchIncomingMotifs([{ sourcePath: 'Waves', contentHash: 'h' }], [], studio);
    expect(r.decisions[0]).toEqual({ kind: 'linked-existing', motifId: 'm9', version: 2, name: 'm9' });
  });
});
